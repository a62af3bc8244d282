/**
 * Screenshots of the design page for people to look at (1280×800 and 1920×1080): the designer, the viewer, a design
 * with warnings, one that cannot be planned, and inches. Each shot also checks the one thing it is about. Demo data:
 * PRODUCT.md §9 (invented); the designs are arranged over the API because what is looked at here is the page.
 */
import type { Page } from 'playwright-core';
import { DEMO_BOOKSHELF } from '../../shared/demo/designs';
import { DEMO, expect, type E2EContext, type E2ETest } from './harness';

type Size = { width: number; height: number };
const SIZES: readonly Size[] = [
  { width: 1280, height: 800 },
  { width: 1920, height: 1080 },
];

async function arrange(ctx: E2EContext, name: string, change: (d: typeof DEMO_BOOKSHELF) => typeof DEMO_BOOKSHELF): Promise<string> {
  const api = await ctx.api(DEMO.designer);
  const me = (await (await api.get('/api/auth/me')).json()) as { memberships: { workshopId: number }[] };
  const wid = me.memberships[0]!.workshopId;
  const res = await api.post(`/api/workshops/${wid}/designs`, { data: change({ ...DEMO_BOOKSHELF, name }) });
  expect(res.status() === 201, `arranging "${name}" should be created, got HTTP ${res.status()}`);
  const { id } = (await res.json()) as { id: number };
  return `/w/${wid}/designs/${id}`;
}

/** Opens a design page in a tab of `session` (signed in as `email` the first time). */
async function open(
  ctx: E2EContext,
  session: { page(): Promise<Page>; email: string; signedIn: boolean },
  path: string,
  size: Size,
): Promise<Page> {
  const page = await session.page();
  await page.setViewportSize(size);
  if (!session.signedIn) {
    await ctx.signIn(page, session.email);
    session.signedIn = true;
  }
  await page.goto(`${ctx.baseUrl}${path}`);
  await page.locator('[data-testid=studio-canvas] canvas').first().waitFor({ timeout: 20_000 });
  await page.getByTestId('fig-net').waitFor();
  await page.getByTestId('plan-volumes').waitFor();
  await page.waitForTimeout(150);
  return page;
}

const shot = (ctx: E2EContext, page: Page, name: string, size: Size) => ctx.screenshot(`look-${name}-${size.width}`, page);

const tests: E2ETest[] = [
  {
    name: 'screenshots: designer, viewer, warnings, an error and inches at 1280×800 and 1920×1080',
    timeoutMs: 150_000,
    async run(ctx) {
      const plain = await arrange(ctx, 'Screens: bookshelf', (d) => d);
      const warned = await arrange(ctx, 'Screens: brace too low', (d) => ({
        ...d,
        braces: d.braces!.map((b) => (b.type === 'shelf' ? { ...b, position: 120 } : b)),
      }));
      const designer = { page: () => ctx.page(), email: DEMO.designer, signedIn: false };
      const other = await ctx.newSession();
      const viewer = { page: () => other.page(), email: DEMO.viewer, signedIn: false };
      for (const size of SIZES) {
        const page = await open(ctx, designer, plain, size);
        await shot(ctx, page, 'designer', size);
        await page.screenshot({ path: `.tmp/screens/look-designer-full-${size.width}.png`, fullPage: true });
        // A selected driver: its inspector and its distances on the drawing.
        await page.getByTestId('inspector-items').getByRole('button', { name: /Driver 1/ }).click();
        await page.getByTestId('field-openings.0.diameter').waitFor();
        await shot(ctx, page, 'driver-selected', size);
        await page.getByRole('tab', { name: 'Lining' }).click();
        await page.getByTestId('lining-piece').first().waitFor();
        await shot(ctx, page, 'lining', size);
        await page.getByRole('tab', { name: 'Drawing' }).click();

        // Something the engine refuses: the brace above the box. The message shows, the figures grey out.
        await page.keyboard.press('Escape');
        await page.getByTestId('inspector-items').getByRole('button', { name: /Shelf brace 1/ }).click();
        const pos = page.getByTestId('field-braces.0.position');
        await pos.click();
        await page.keyboard.press('Control+A');
        await page.keyboard.type('500');
        await page.keyboard.press('Enter');
        await page.getByTestId('studio-figures').getByRole('alert').waitFor();
        await shot(ctx, page, 'error', size);
        // Ctrl+Z in the box just committed undoes in the studio (nothing typed since Enter).
        await page.keyboard.press('Control+z');
        await page.getByTestId('studio-figures').getByRole('alert').waitFor({ state: 'detached' });
        expect((await pos.inputValue()) === '215 mm', `undo should put the brace back at 215 mm, it shows ${await pos.inputValue()}`);

        // Inches, on the whole page.
        await page.getByRole('radio', { name: 'in' }).click();
        await page.getByLabel('Width (W)').waitFor();
        expect((await page.getByLabel('Width (W)').inputValue()) === '8.661', 'the form should show 220 mm as 8.661 in');
        await shot(ctx, page, 'inches', size);
        await page.screenshot({ path: `.tmp/screens/look-inches-full-${size.width}.png`, fullPage: true });
        await page.getByRole('radio', { name: 'mm' }).click();
        await page.close();

        const w = await open(ctx, designer, warned, size);
        await w.getByTestId('fig-warnings').waitFor();
        await w.getByTestId('fig-warnings').getByRole('button').first().click();
        await shot(ctx, w, 'warnings', size);
        await w.close();

        const v = await open(ctx, viewer, warned, size);
        await v.getByTestId('studio-readonly').waitFor();
        await shot(ctx, v, 'viewer', size);
        await v.screenshot({ path: `.tmp/screens/look-viewer-full-${size.width}.png`, fullPage: true });
        await v.close();
      }
      // A tablet held upright (820 × 1180): the bar, the toolbar and the studio still fit.
      const tablet: Size = { width: 820, height: 1180 };
      const t = await open(ctx, designer, plain, tablet);
      await shot(ctx, t, 'designer', tablet);
      const overflow = await t.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow <= 0, `the design page should not scroll sideways at 820 px, it is ${overflow} px too wide`);
      await t.close();
    },
  },
];

export default tests;
