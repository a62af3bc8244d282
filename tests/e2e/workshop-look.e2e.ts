/**
 * Screenshots for people to look at, at 1280×800 and at tablet width 820×1180, of the pages that changed with the
 * workshop settings: settings (owner), the workshop picker with "New workshop", a build's History card, the designs
 * and stock tables, the New design dialog in inches, and the password pages. Each shot also checks that the page
 * does not scroll sideways and the one thing it is about. Saved as .tmp/screens/look-ws-<page>-<width>.png.
 */
import type { Page } from 'playwright-core';
import { DEMO, expect, type E2EContext, type E2ETest } from './harness';

type Size = { width: number; height: number };
const SIZES: readonly Size[] = [
  { width: 1280, height: 800 },
  { width: 820, height: 1180 },
];
const BUILD = 'Harbour Lane pair + floorstanders';
const DRIVERS_CSV = 'name,cutout_diameter_mm,displacement_litres,cone_area_cm2,excursion_mm\nHarbour woofer 6.5,142,0.4,132,5.5\n';

/** The page is as wide as the window: nothing pushes it sideways. */
async function noSideways(page: Page, what: string): Promise<void> {
  const { scroll, inner } = await page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, inner: window.innerWidth }));
  expect(scroll <= inner, `${what}: the page is ${scroll} px wide in a ${inner} px window`);
}

/**
 * The right edge of a numeric column's header words and of its first figure, in px (they should line up).
 * The page script is a string: tsx would wrap named functions inside it in a helper the page does not have.
 */
async function numericEdges(page: Page, testId: string, header: string): Promise<{ head: number; cell: number }> {
  return page.evaluate(`(() => {
    const table = document.querySelector('[data-testid="${testId}"]');
    const ths = [...table.querySelectorAll('thead th')];
    const index = ths.findIndex((th) => th.textContent.replace(/[▲▼]/g, '').trim() === ${JSON.stringify(header)});
    const walker = document.createTreeWalker(ths[index], NodeFilter.SHOW_TEXT);
    let words = walker.nextNode();
    while (words && words.textContent.trim() !== ${JSON.stringify(header)}) words = walker.nextNode();
    const head = document.createRange();
    head.selectNodeContents(words);
    const cell = document.createRange();
    cell.selectNodeContents(table.querySelectorAll('tbody tr')[0].querySelectorAll('td')[index]);
    return { head: head.getBoundingClientRect().right, cell: cell.getBoundingClientRect().right };
  })()`);
}

async function shoot(ctx: E2EContext, page: Page, name: string, size: Size): Promise<void> {
  await page.waitForTimeout(150);
  await noSideways(page, `${name} at ${size.width}`);
  await ctx.screenshot(`look-ws-${name}-${size.width}`, page);
}

const tests: E2ETest[] = [
  {
    name: 'screenshots: workshop settings, picker, build History, designs and stock tables, New design in inches, password pages (1280 and 820 wide)',
    timeoutMs: 150_000,
    async run(ctx) {
      const owner = await ctx.api(DEMO.owner);
      const me = (await (await owner.get('/api/auth/me')).json()) as { memberships: { workshopId: number }[] };
      const wid = me.memberships[0]!.workshopId;
      const builds = (await (await owner.get(`/api/workshops/${wid}/builds`)).json()) as { items: { id: number; name: string }[] };
      const build = builds.items.find((b) => b.name === BUILD);
      expect(build, `the demo build "${BUILD}" exists`);
      // One upload so the build's History card has an entry to show.
      const upload = await owner.post(`/api/workshops/${wid}/uploads/drivers-csv?buildId=${build.id}`, {
        multipart: { file: { name: 'harbour-drivers.csv', mimeType: 'text/csv', buffer: Buffer.from(DRIVERS_CSV) } },
      });
      expect(upload.status() === 201, `the drivers' CSV upload answered ${upload.status()}`);

      const designer = await ctx.api(DEMO.designer);
      const unit = await designer.patch('/api/auth/me', { data: { units: 'in' } });
      expect(unit.ok(), `the inch preference should save, the server answered ${unit.status()}`);

      const ownerPage = await ctx.page();
      await ctx.signIn(ownerPage, DEMO.owner);
      const other = await ctx.newSession();
      const designerPage = await other.page();
      await ctx.signIn(designerPage, DEMO.designer);
      const visitor = await (await ctx.newSession()).page();
      try {
        for (const size of SIZES) {
          await ownerPage.setViewportSize(size);
          await ownerPage.goto(`${ctx.baseUrl}/w/${wid}/settings`);
          await ownerPage.getByTestId('settings-status').getByText('All changes saved').waitFor();
          await shoot(ctx, ownerPage, 'settings', size);
          await ownerPage.getByRole('button', { name: 'Delete workshop' }).scrollIntoViewIfNeeded();
          await shoot(ctx, ownerPage, 'settings-danger', size);

          await ownerPage.goto(`${ctx.baseUrl}/workshops`);
          await ownerPage.getByRole('heading', { name: 'Choose a workshop' }).waitFor();
          await ownerPage.getByRole('button', { name: 'New workshop' }).click();
          await ownerPage.getByLabel('Workshop name').waitFor();
          await shoot(ctx, ownerPage, 'picker-new', size);

          await ownerPage.goto(`${ctx.baseUrl}/w/${wid}/builds/${build.id}`);
          await ownerPage.getByText('harbour-drivers.csv').first().waitFor();
          await ownerPage.getByRole('heading', { name: 'History' }).scrollIntoViewIfNeeded();
          await shoot(ctx, ownerPage, 'build-history', size);

          await ownerPage.goto(`${ctx.baseUrl}/w/${wid}/stock`);
          await ownerPage.getByRole('heading', { name: 'Stock room' }).first().waitFor();
          await shoot(ctx, ownerPage, 'stock', size);
          const edges = await numericEdges(ownerPage, 'stock-table', 'Quantity');
          expect(Math.abs(edges.head - edges.cell) <= 1, `"Quantity" ends at ${edges.head} px, its figures at ${edges.cell} px`);
          // Sorted by it, the arrow sits left of the words and the words stay in line with the figures.
          await ownerPage.getByRole('button', { name: 'Quantity' }).click();
          await ownerPage.locator('th[aria-sort]', { hasText: 'Quantity' }).waitFor();
          const sortedEdges = await numericEdges(ownerPage, 'stock-table', 'Quantity');
          expect(Math.abs(sortedEdges.head - sortedEdges.cell) <= 1, `sorted: "Quantity" ends at ${sortedEdges.head} px, its figures at ${sortedEdges.cell} px`);
          await shoot(ctx, ownerPage, 'stock-sorted', size);

          await designerPage.setViewportSize(size);
          await designerPage.goto(`${ctx.baseUrl}/w/${wid}/designs`);
          await designerPage.getByRole('button', { name: 'New design' }).waitFor();
          // An inch user sees the sizes in inches, as on the design page and in the New design dialog.
          await designerPage.getByTestId('designs-table').getByText(/^[\d /]+ × [\d /]+ × [\d /]+ in$/).first().waitFor();
          await shoot(ctx, designerPage, 'designs', size);
          await designerPage.getByRole('button', { name: 'New design' }).click();
          await designerPage.getByRole('dialog').getByText('Lengths in inches').waitFor();
          await designerPage.getByRole('dialog').getByLabel('Width', { exact: true }).focus();
          await shoot(ctx, designerPage, 'new-design-inches', size);
          await designerPage.keyboard.press('Escape');

          await visitor.setViewportSize(size);
          await visitor.goto(`${ctx.baseUrl}/forgot-password`);
          await visitor.getByRole('heading', { name: 'Forgot your password?' }).waitFor();
          await shoot(ctx, visitor, 'forgot-password', size);
          await visitor.goto(`${ctx.baseUrl}/reset-password/${'A'.repeat(43)}`);
          await visitor.getByRole('heading', { name: 'Choose a new password' }).waitFor();
          await visitor.waitForLoadState('networkidle');
          await shoot(ctx, visitor, 'reset-password', size);
        }
      } finally {
        await designer.patch('/api/auth/me', { data: { units: 'mm' } });
      }
    },
  },
];

export default tests;
