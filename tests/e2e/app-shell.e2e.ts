/**
 * The app around the design page: sign-in with a return address, sign-up, sign-out, the designs table
 * (sort, filter, duplicate, delete) and the members page for an owner and for others.
 */
import { DEMO, expect, type E2ETest } from './harness';

const tests: E2ETest[] = [
  {
    name: 'a signed-out visitor is sent to sign in and comes back to the page asked for',
    async run(ctx) {
      const page = await ctx.page();
      await page.goto(`${ctx.baseUrl}/w/1/members`);
      await page.waitForURL(/\/sign-in\?redirectTo=%2Fw%2F1%2Fmembers$/);
      await page.getByLabel('Password').waitFor();

      // A wrong password is refused with a message, not a crash.
      await page.getByLabel('E-mail').fill(DEMO.owner);
      await page.getByLabel('Password').fill('not-the-password');
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByText('That e-mail and password do not match an account.').waitFor();
      await ctx.screenshot('sign-in-refused');

      await page.getByLabel('Password').fill('boxwright-demo');
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.waitForURL(/\/w\/1\/members$/);
      await page.getByRole('heading', { name: 'Members' }).waitFor();
    },
  },
  {
    name: 'when the session ends, the next request leads to sign-in and back',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.maker);
      await page.getByTestId('designs-table').waitFor();
      // The session ends on the server side (as when it expires): the browser loses its cookie.
      await page.context().clearCookies();
      await page.getByRole('link', { name: 'Members' }).click();
      await page.waitForURL(/\/sign-in\?redirectTo=%2Fw%2F\d+%2Fmembers$/);
      await page.getByLabel('E-mail').fill(DEMO.maker);
      await page.getByLabel('Password').fill('boxwright-demo');
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.waitForURL(/\/w\/\d+\/members$/);
    },
  },
  {
    name: 'sign-up creates a workshop with the new user as owner; sign-out ends the session',
    async run(ctx) {
      const page = await ctx.page();
      await page.goto(`${ctx.baseUrl}/sign-up`);
      await page.getByLabel('Workshop name').fill('Quayside Test Bench');
      await page.getByLabel('E-mail').fill('new.owner@quayside.test');
      await page.getByLabel('Password').fill('short');
      await page.getByRole('button', { name: 'Create workshop' }).click();
      // The shared schema's message (shared/schemas/api.schema.ts passwordSchema), shown under the field.
      await page.getByText('password must be at least 10 characters').waitFor();
      await page.getByLabel('Password').fill('a-long-enough-password');
      await page.getByRole('button', { name: 'Create workshop' }).click();
      await page.waitForURL(/\/w\/\d+\/designs$/);
      const name = await page.getByTestId('workshop-name').textContent();
      expect(name === 'Quayside Test Bench', `the header should name the new workshop, it says "${name}"`);
      await page.getByText('No designs yet.').waitFor();
      await page.getByRole('button', { name: 'New design' }).waitFor();

      await page.getByRole('button', { name: 'Sign out' }).click();
      await page.waitForURL(/\/sign-in$/);
      await page.goto(`${ctx.baseUrl}/`);
      await page.waitForURL(/\/sign-in/);
    },
  },
  {
    name: 'the designs table sorts, filters, duplicates and deletes with confirmation',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.designer);
      const rows = page.getByTestId('design-row');
      await rows.first().waitFor();
      const names = async () => rows.locator('td:first-child').allTextContents();

      await page.getByRole('button', { name: 'Name' }).click();
      const ascending = await names();
      expect(
        JSON.stringify(ascending) === JSON.stringify([...ascending].sort((a, b) => a.localeCompare(b))),
        `sorted by name A→Z: ${ascending.join(' | ')}`,
      );
      await page.getByRole('button', { name: 'Name' }).click();
      const descending = await names();
      expect(JSON.stringify(descending) === JSON.stringify([...ascending].reverse()), `sorted by name Z→A: ${descending.join(' | ')}`);

      await page.getByLabel('Filter designs').fill('slim');
      await page.getByText('1 of 2 designs').waitFor();
      expect((await rows.count()) === 1, 'the filter "slim" should leave one row');
      await page.getByLabel('Filter designs').fill('');

      const original = rows.filter({ hasText: 'Harbour bookshelf' });
      await original.getByRole('button', { name: 'Duplicate' }).click();
      await page.getByText('3 designs').waitFor();
      const copy = rows.filter({ hasText: /Harbour bookshelf.*\(copy\)|copy/i });
      await copy.first().waitFor();
      await ctx.screenshot('designs-list-after-duplicate');

      await copy.first().getByRole('button', { name: 'Delete' }).click();
      const dialog = page.getByRole('alertdialog');
      await dialog.getByText('Delete this design?').waitFor();
      await ctx.screenshot('designs-list-delete-confirm');
      await dialog.getByRole('button', { name: 'Cancel' }).click();
      await page.getByText('3 designs').waitFor();
      await copy.first().getByRole('button', { name: 'Delete' }).click();
      await dialog.getByRole('button', { name: 'Delete design' }).click();
      await page.getByText('2 designs').waitFor();
    },
  },
  {
    name: 'a new design starts from its size and opens in the form',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.designer);
      await page.getByRole('button', { name: 'New design' }).click();
      const dialog = page.getByRole('dialog');
      await dialog.getByLabel('Name').fill('Test sub cabinet');
      await dialog.getByLabel('Width').fill('400');
      await dialog.getByLabel('Height').fill('420');
      await dialog.getByLabel('Depth').fill('380');
      await dialog.getByRole('button', { name: 'Create design' }).click();
      await page.waitForURL(/\/designs\/\d+$/);
      const width = await page.getByLabel('Width (W)').inputValue();
      expect(width === '400', `the new design should open 400 mm wide, it shows ${width}`);
      await page.getByTestId('design-title').getByText('Test sub cabinet').waitFor();
    },
  },
  {
    name: 'an owner can change roles on the members page; a designer only sees the list',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.owner);
      await page.getByRole('link', { name: 'Members' }).click();
      const select = page.getByLabel(`Role of ${DEMO.maker}`);
      await select.selectOption('viewer');
      await page.waitForResponse((r) => r.url().includes('/members/') && r.request().method() === 'PATCH');
      await select.selectOption('maker');
      await page.waitForResponse((r) => r.url().includes('/members/') && r.request().method() === 'PATCH');
      await ctx.screenshot('members-owner');

      const other = await ctx.newSession();
      const designerPage = await other.page();
      await ctx.signIn(designerPage, DEMO.designer);
      await designerPage.getByRole('link', { name: 'Members' }).click();
      await designerPage.getByTestId('member-row').first().waitFor();
      expect((await designerPage.getByTestId('member-row').count()) === 4, 'the demo workshop has four members');
      expect((await designerPage.getByRole('combobox').count()) === 0, 'a designer sees no role selects');
      expect((await designerPage.getByRole('button', { name: 'Remove' }).count()) === 0, 'a designer sees no remove buttons');
    },
  },
];

export default tests;
