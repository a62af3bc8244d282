/**
 * The design page: edit, save, reload; read-only roles; field errors from the server; a save conflict.
 * Demo data: PRODUCT.md §9 (shared/demo/designs.ts), seeded into a new database by the server.
 */
import type { Page } from 'playwright-core';
import { DEMO, expect, type E2EContext, type E2ETest } from './harness';

const BOOKSHELF = 'Harbour bookshelf (two-way, rear port)';

async function openDesign(ctx: E2EContext, page: Page, name: string): Promise<void> {
  await page.getByRole('link', { name, exact: true }).click();
  await page.waitForURL(/\/designs\/\d+$/);
  await page.getByLabel('Width (W)').waitFor();
}

/** The workshop and design ids from a design page's URL `/w/:workshopId/designs/:designId`. */
function idsFrom(page: Page): { workshopId: number; designId: number } {
  const match = new URL(page.url()).pathname.match(/^\/w\/(\d+)\/designs\/(\d+)$/);
  expect(match, `not on a design page: ${page.url()}`);
  return { workshopId: Number(match[1]), designId: Number(match[2]) };
}

const tests: E2ETest[] = [
  {
    name: 'a designer changes the width, saves, reloads and sees the change',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.designer);
      await page.getByTestId('designs-table').waitFor();
      await ctx.screenshot('designs-list-designer');
      await openDesign(ctx, page, BOOKSHELF);
      await page.getByTestId('plan-volumes').waitFor();
      await page.waitForLoadState('networkidle');
      await ctx.screenshot('design-page-designer');

      const title = await page.title();
      expect(title === `${BOOKSHELF} · Boxwright`, `the tab should name the design, it says "${title}"`);
      const width = page.getByLabel('Width (W)');
      const before = Number(await width.inputValue());
      expect(before === 220, `the demo bookshelf starts 220 mm wide, the form shows ${before}`);
      await width.fill('240');
      await page.getByTestId('save-status').getByText('Unsaved changes').waitFor();
      await page.getByRole('button', { name: 'Save design' }).click();
      await page.getByTestId('save-status').getByText('All changes saved').waitFor();

      // The plan beside the form is the saved version's. Gross internal volume by PRODUCT.md §3:
      // (W − 2t)(H − 2t)(D − tf − t) = (240 − 36)(360 − 36)(260 − 18 − 18) mm³ = 204 × 324 × 224 mm³ = 14.81 L [derived].
      await page.getByTestId('plan-volumes').getByText('14.81 L').first().waitFor();
      await ctx.screenshot('design-page-saved');

      await page.reload();
      await page.getByLabel('Width (W)').waitFor();
      const after = await page.getByLabel('Width (W)').inputValue();
      expect(after === '240', `after a reload the width should be 240, it is ${after}`);

      await page.getByRole('link', { name: '← All designs' }).click();
      const row = page.getByTestId('design-row').filter({ hasText: BOOKSHELF });
      await row.getByText('240 × 360 × 260 mm').waitFor();
    },
  },
  {
    name: 'a viewer gets the design read-only, with no save control',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.viewer);
      await page.getByTestId('designs-table').waitFor();
      expect((await page.getByRole('button', { name: 'New design' }).count()) === 0, 'a viewer must not see "New design"');
      expect((await page.getByRole('button', { name: 'Delete' }).count()) === 0, 'a viewer must not see "Delete"');
      expect((await page.getByRole('button', { name: 'Duplicate' }).count()) === 0, 'a viewer must not see "Duplicate"');
      await openDesign(ctx, page, BOOKSHELF);
      await page.getByText('Read only').waitFor();
      expect((await page.getByRole('button', { name: 'Save design' }).count()) === 0, 'a viewer must not see a save button');
      expect(await page.getByLabel('Width (W)').isDisabled(), 'a viewer must not be able to type in the width');
      expect((await page.getByRole('button', { name: /^Add / }).count()) === 0, 'a viewer must not see add buttons');
      await page.waitForLoadState('networkidle');
      await ctx.screenshot('design-page-viewer');
    },
  },
  {
    name: 'a maker also reads the design without a save control',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.maker);
      await openDesign(ctx, page, BOOKSHELF);
      await page.getByText('Read only').waitFor();
      expect((await page.getByRole('button', { name: 'Save design' }).count()) === 0, 'a maker must not see a save button');
    },
  },
  {
    name: 'field errors appear next to the field: from the form and from the server',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.designer);
      await openDesign(ctx, page, BOOKSHELF);

      // Checked in the browser by the shared schema: an empty size.
      await page.getByLabel('Depth (D)').fill('');
      await page.getByRole('button', { name: 'Save design' }).click();
      await page.getByText('depth must be a number (mm)').waitFor();
      await page.getByLabel('Depth (D)').fill('260');

      // Checked by the server's cabinet rules: a shelf brace above the box (PRODUCT.md §3 "a brace outside the cavity").
      const position = page.getByTestId('brace').first().getByLabel(/Centre plane/);
      await position.fill('5000');
      await page.getByRole('button', { name: 'Save design' }).click();
      await page.getByText('Not saved').waitFor();
      const braceCard = page.getByTestId('brace').first();
      const message = braceCard.getByRole('alert').first();
      await message.waitFor();
      const text = (await message.textContent()) ?? '';
      expect(text.length > 0, 'the brace position should have a message next to it');
      expect(
        (await position.getAttribute('aria-invalid')) === 'true',
        'the brace position input should be marked invalid (server field braces[0].position → form field braces.0.position)',
      );
      await ctx.screenshot('design-page-server-field-error');
    },
  },
  {
    name: 'someone else saved meanwhile: the conflict offers reload or overwrite',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.designer);
      await openDesign(ctx, page, 'Harbour slim floorstander');
      const { workshopId, designId } = idsFrom(page);

      // The owner saves a new version from elsewhere.
      const owner = await ctx.api(DEMO.owner);
      const url = `/api/workshops/${workshopId}/designs/${designId}`;
      const current = (await (await owner.get(url)).json()) as { version: number; design: { name: string } };
      const put = await owner.put(url, {
        data: { version: current.version, design: { ...current.design, name: 'Harbour slim floorstander (owner)' } },
      });
      expect(put.ok(), `the owner's save should pass, got HTTP ${put.status()}`);

      await page.getByLabel('Height (H)').fill('980');
      await page.getByRole('button', { name: 'Save design' }).click();
      const dialog = page.getByRole('alertdialog');
      await dialog.getByText('Someone else saved this design').waitFor();
      await dialog.getByText('owner@harbourlane.test').waitFor();
      await ctx.screenshot('design-page-conflict');

      await dialog.getByRole('button', { name: 'Keep mine (overwrite)' }).click();
      await page.getByTestId('save-status').getByText('All changes saved').waitFor();
      const saved = (await (await owner.get(url)).json()) as { version: number; design: { outer: { height: number }; name: string } };
      expect(saved.design.outer.height === 980, `overwrite should save my height 980, server has ${saved.design.outer.height}`);
      expect(saved.version === current.version + 2, `two saves after version ${current.version}, server has ${saved.version}`);
    },
  },
  {
    name: 'leaving with unsaved changes asks first',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.designer);
      await openDesign(ctx, page, BOOKSHELF);
      await page.getByLabel('Depth (D)').fill('270');
      await page.getByRole('link', { name: '← All designs' }).click();
      const dialog = page.getByRole('alertdialog');
      await dialog.getByText('Leave without saving?').waitFor();
      await ctx.screenshot('design-page-leave-guard');
      await dialog.getByRole('button', { name: 'Stay on this page' }).click();
      expect(/\/designs\/\d+$/.test(new URL(page.url()).pathname), 'staying keeps the design page open');
      expect((await page.getByLabel('Depth (D)').inputValue()) === '270', 'staying keeps the unsaved value');

      await page.getByRole('link', { name: '← All designs' }).click();
      await dialog.getByRole('button', { name: 'Leave and discard' }).click();
      await page.getByTestId('designs-table').waitFor();
    },
  },
];

export default tests;
