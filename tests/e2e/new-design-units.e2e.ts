/**
 * "New design" in the user's unit: an inch user sees the dialog's size in inches, types inches (and, once,
 * millimetres), gets the design form's message naming the field for text that is not a length, and the
 * design is saved in millimetres. 1 in = 25.4 mm exactly (NIST SP 811, 2008 edition, Appendix B: inch =
 * 2.54 × 10⁻² m exactly; REFERENCES.md §8).
 */
import { DEMO, expect, type E2ETest } from './harness';

const NAME = 'Inch-sized test cabinet';

const tests: E2ETest[] = [
  {
    name: 'an inch user creates a design in inches and it is saved in millimetres',
    async run(ctx) {
      const designer = await ctx.api(DEMO.designer);
      const me = await designer.patch('/api/auth/me', { data: { units: 'in' } });
      expect(me.ok(), `the unit preference should save, the server answered ${me.status()}`);
      try {
        const page = await ctx.page();
        await ctx.signIn(page, DEMO.designer);
        await page.getByRole('button', { name: 'New design' }).click();
        const dialog = page.getByRole('dialog');
        const width = dialog.getByLabel('Width', { exact: true });
        const height = dialog.getByLabel('Height', { exact: true });
        const depth = dialog.getByLabel('Depth', { exact: true });
        await width.waitFor();
        // The starting size is round in inches: 10 × 16 × 12 in.
        const start = [await width.inputValue(), await height.inputValue(), await depth.inputValue()];
        expect(start.join(' × ') === '10 × 16 × 12', `an inch user should start from 10 × 16 × 12 in, the dialog shows ${start.join(' × ')}`);
        await dialog.getByText('Lengths in inches').waitFor();

        await dialog.getByLabel('Name').fill(NAME);
        await width.fill('12 3/8');
        await height.fill('twelve');
        await depth.fill('300 mm');
        // Text that is not a length: the design form's message, naming the field; nothing is created.
        await dialog.getByText('height: "twelve" is not a length').waitFor();
        await ctx.screenshot('new-design-inches-error', page);
        await dialog.getByRole('button', { name: 'Create design' }).click();
        await page.waitForTimeout(300);
        expect(await dialog.isVisible(), 'a size that is not a length must keep the dialog open');
        expect(/\/designs$/.test(new URL(page.url()).pathname), `nothing should be created yet, the page is ${page.url()}`);

        await height.fill('15.5 in');
        await height.blur();
        expect((await height.inputValue()) === '15 1/2', `a length left in the box reads back in inches, it shows ${await height.inputValue()}`);
        await ctx.screenshot('new-design-inches', page);
        await dialog.getByRole('button', { name: 'Create design' }).click();
        await page.waitForURL(/\/designs\/\d+$/);
        await page.getByTestId('design-title').getByText(NAME).waitFor();
        const shown = await page.getByLabel('Width (W)').inputValue();
        expect(shown === '12 3/8', `the design should open 12 3/8 in wide, it shows ${shown}`);

        const [, workshopId, designId] = new URL(page.url()).pathname.match(/^\/w\/(\d+)\/designs\/(\d+)$/) ?? [];
        const saved = await designer.get(`/api/workshops/${workshopId}/designs/${designId}`);
        expect(saved.ok(), `GET the new design answered ${saved.status()}`);
        const outer = ((await saved.json()) as { design: { outer: { width: number; height: number; depth: number } } }).design.outer;
        // NIST SP 811 (Appendix B): 1 in = 25.4 mm exactly, so 12 3/8 in = 12.375 × 25.4 = 314.325 mm and
        // 15.5 in = 393.7 mm; the depth was typed in millimetres and stays 300 mm.
        const expected = { width: 12.375 * 25.4, height: 15.5 * 25.4, depth: 300 };
        for (const key of ['width', 'height', 'depth'] as const) {
          expect(Math.abs(outer[key] - expected[key]) < 1e-9, `saved ${key} should be ${expected[key]} mm, it is ${outer[key]} mm`);
        }
      } finally {
        // Later tests expect the demo designer in millimetres.
        await designer.patch('/api/auth/me', { data: { units: 'mm' } });
      }
    },
  },
  {
    name: 'a metric user still starts from 250 × 400 × 300 mm and types millimetres or inches',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.owner);
      await page.getByRole('button', { name: 'New design' }).click();
      const dialog = page.getByRole('dialog');
      const width = dialog.getByLabel('Width', { exact: true });
      await width.waitFor();
      const start = [await width.inputValue(), await dialog.getByLabel('Height', { exact: true }).inputValue(), await dialog.getByLabel('Depth', { exact: true }).inputValue()];
      expect(start.join(' × ') === '250 × 400 × 300', `a metric user should start from 250 × 400 × 300 mm, the dialog shows ${start.join(' × ')}`);
      // 10" = 254 mm (NIST SP 811: 1 in = 25.4 mm exactly).
      await width.fill('10"');
      await width.blur();
      expect((await width.inputValue()) === '254', `10" should read back as 254 mm, it shows ${await width.inputValue()}`);
      // Cancel leaves nothing behind; opening again starts afresh.
      await dialog.getByRole('button', { name: 'Cancel' }).click();
      await page.getByRole('button', { name: 'New design' }).click();
      await width.waitFor();
      expect((await width.inputValue()) === '250', `a new dialog starts from 250 mm again, it shows ${await width.inputValue()}`);
    },
  },
];

export default tests;
