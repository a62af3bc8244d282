/**
 * The app around the design page: sign-in with a return address, sign-up, sign-out, the designs table
 * (sort, filter, duplicate, delete) and the members page for an owner and for others; what each role
 * sees (PRODUCT.md §2) and the server refusing the rest; page titles; the header at tablet size; what the
 * user sees when the server cannot be reached.
 */
import type { Page } from 'playwright-core';
import { DEMO, expect, type E2ETest } from './harness';

const WORKSHOP = 'Harbour Lane Audio';

/** The workshop's page tabs as the user sees them. */
async function navLabels(page: Page): Promise<string[]> {
  await page.getByRole('navigation', { name: 'Workshop' }).waitFor();
  return (await page.getByRole('navigation', { name: 'Workshop' }).getByRole('link').allTextContents()).map((t) => t.trim());
}

/** Nothing a person should never see: a stack trace, a raw JSON answer, a bare status line. */
async function expectCalmText(page: Page, where: string): Promise<void> {
  const text = await page.locator('body').innerText();
  for (const bad of ['{"error"', 'TypeError', 'ReferenceError', '    at ', 'Failed to fetch', 'Unexpected token', 'HTTP 5']) {
    expect(!text.includes(bad), `${where}: the page shows "${bad}": ${text.slice(0, 300)}`);
  }
}

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
  {
    name: 'each role sees only its pages; the pages it may not open say No access, and the server refuses them (403)',
    timeoutMs: 90_000,
    async run(ctx) {
      // PRODUCT.md §2 with can() of shared/schemas/api.schema.ts: viewers do not see the stock room; only owners
      // manage invitations and read the sent mail.
      const expected: Record<string, string[]> = {
        [DEMO.owner]: ['Designs', 'Builds', 'Stock room', 'Checklists', 'Members', 'Settings', 'Invitations', 'Sent mail'],
        [DEMO.designer]: ['Designs', 'Builds', 'Stock room', 'Checklists', 'Members'],
        [DEMO.maker]: ['Designs', 'Builds', 'Stock room', 'Checklists', 'Members'],
        [DEMO.viewer]: ['Designs', 'Builds', 'Checklists', 'Members'],
      };
      const refused: Record<string, string[]> = {
        [DEMO.designer]: ['invitations', 'sent-mail', 'settings'],
        [DEMO.maker]: ['invitations', 'sent-mail', 'settings'],
        [DEMO.viewer]: ['stock', 'invitations', 'sent-mail', 'settings', 'cut-plans/1/share'],
      };
      for (const [email, labels] of Object.entries(expected)) {
        const session = await ctx.newSession();
        const page = await session.page();
        await ctx.signIn(page, email);
        const seen = await navLabels(page);
        expect(JSON.stringify(seen) === JSON.stringify(labels), `${email} sees the tabs ${seen.join(', ')}; expected ${labels.join(', ')}`);
        const workshopId = Number(/\/w\/(\d+)\//.exec(page.url())?.[1]);
        for (const path of refused[email] ?? []) {
          await page.goto(`${ctx.baseUrl}/w/${workshopId}/${path}`);
          await page.getByRole('heading', { name: 'No access' }).waitFor();
          expect((await page.title()) === 'No access · Boxwright', `${email} at ${path}: title "${await page.title()}"`);
          // Nothing of the page itself was drawn: no form to fill in that the server would refuse.
          expect((await page.getByRole('button', { name: /Send invitation|Add item|Make a link|Save settings|Delete workshop/ }).count()) === 0, `${email} at ${path} sees a control`);
          await expectCalmText(page, `${email} at ${path}`);
        }
        if (email === DEMO.viewer) await ctx.screenshot('no-access-viewer-stock', page);
      }

      // The server refuses the same things whatever the client shows (RFC 9110 §15.5.4 403 Forbidden).
      const viewer = await ctx.api(DEMO.viewer);
      const designer = await ctx.api(DEMO.designer);
      const maker = await ctx.api(DEMO.maker);
      const wid = ((await (await viewer.get('/api/auth/me')).json()).memberships[0].workshopId) as number;
      const checks: Array<[string, Promise<{ status(): number }>]> = [
        ['viewer reads the stock room', viewer.get(`/api/workshops/${wid}/stock`)],
        ['viewer adds a share link', viewer.post(`/api/workshops/${wid}/cut-plans/1/share-links`, { data: {} })],
        ['viewer starts a cut plan', viewer.post(`/api/workshops/${wid}/nest-jobs`, { data: { buildId: 1, settings: {} } })],
        ['designer lists invitations', designer.get(`/api/workshops/${wid}/invitations`)],
        ['designer invites', designer.post(`/api/workshops/${wid}/invitations`, { data: { email: 'someone@example.test', role: 'maker' } })],
        ['maker reads the sent mail', maker.get(`/api/workshops/${wid}/mail`)],
        ['maker changes a role', maker.patch(`/api/workshops/${wid}/members/1`, { data: { role: 'viewer' } })],
      ];
      for (const [what, answer] of checks) {
        const status = (await answer).status();
        expect(status === 403, `${what}: the server answers ${status}, expected 403`);
      }
    },
  },
  {
    name: 'every workshop page is titled "page · workshop · Boxwright"; unknown addresses are titled too',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.owner);
      for (const label of ['Designs', 'Builds', 'Stock room', 'Checklists', 'Members', 'Settings', 'Invitations', 'Sent mail']) {
        await page.getByRole('navigation', { name: 'Workshop' }).getByRole('link', { name: label }).click();
        await page.waitForFunction((t) => document.title === t, `${label} · ${WORKSHOP} · Boxwright`, { timeout: 10_000 });
        const current = page.getByRole('navigation', { name: 'Workshop' }).locator('[aria-current="page"]');
        expect((await current.textContent()) === label, `the ${label} tab is marked as the current page`);
      }
      await page.getByRole('navigation', { name: 'Workshop' }).getByRole('link', { name: 'Builds' }).click();
      await page.getByRole('link', { name: 'Harbour Lane pair + floorstanders' }).click();
      await page.waitForFunction((t) => document.title === t, `Harbour Lane pair + floorstanders · ${WORKSHOP} · Boxwright`);
      await page.goto(`${ctx.baseUrl}/no/such/page`);
      await page.getByRole('heading', { name: 'Page not found' }).waitFor();
      expect((await page.title()) === 'Page not found · Boxwright', `404 title: ${await page.title()}`);
    },
  },
  {
    name: 'at tablet size (820 × 1180) the header shows the workshop, every tab and sign-out in full; the skip link reaches the page',
    async run(ctx) {
      const page = await ctx.page();
      await page.setViewportSize({ width: 820, height: 1180 });
      await ctx.signIn(page, DEMO.owner);
      const name = page.getByTestId('workshop-name');
      const cut = await name.evaluate((el) => el.scrollWidth > el.clientWidth);
      expect(!cut, 'the workshop name is not cut off');
      for (const link of await page.getByRole('navigation', { name: 'Workshop' }).getByRole('link').all()) {
        const box = await link.boundingBox();
        expect(box && box.x >= 0 && box.x + box.width <= 820, `the tab "${await link.textContent()}" is fully in view: ${JSON.stringify(box)}`);
      }
      const signOut = await page.getByRole('button', { name: 'Sign out' }).boundingBox();
      expect(signOut && signOut.x + signOut.width <= 820, 'Sign out is in view');
      await ctx.screenshot('header-tablet', page);

      // Keyboard: the first Tab lands on "Skip to the page", Enter moves focus into the page.
      await page.keyboard.press('Tab');
      const first = await page.evaluate(() => document.activeElement?.textContent?.trim());
      expect(first === 'Skip to the page', `the first Tab stop is "${first}"`);
      await page.keyboard.press('Enter');
      await page.waitForFunction(() => document.activeElement?.id === 'main');
    },
  },
  {
    name: 'the only owner can be neither demoted nor removed in the members table',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.owner);
      await page.getByRole('navigation', { name: 'Workshop' }).getByRole('link', { name: 'Members' }).click();
      const ownerRow = page.getByTestId('member-row').filter({ hasText: DEMO.owner });
      await ownerRow.waitFor();
      expect(await page.getByLabel(`Role of ${DEMO.owner}`).isDisabled(), "the only owner's role select is disabled");
      expect((await ownerRow.getByRole('button', { name: 'Remove' }).count()) === 0, 'no Remove for the only owner');
      expect(await page.getByLabel(`Role of ${DEMO.maker}`).isEnabled(), "other members' roles can change");
      await page.getByText('make someone else an owner first').waitFor();
      // The server says the same (400, the last owner; tests/server/members.test.ts covers the details).
      const owner = await ctx.api(DEMO.owner);
      const me = await (await owner.get('/api/auth/me')).json();
      const answer = await owner.patch(`/api/workshops/${me.memberships[0].workshopId}/members/${me.user.id}`, { data: { role: 'maker' } });
      expect(answer.status() === 400, `demoting the only owner answers ${answer.status()}`);
    },
  },
  {
    name: 'when the server cannot be reached the user sees a calm message, never a stack trace or raw JSON, and the app recovers',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.maker);
      await page.getByRole('navigation', { name: 'Workshop' }).waitFor();
      // The network goes away: every request of the app and of its page code fails.
      const drop = (route: { abort(): Promise<void> }) => route.abort();
      await page.route('**/api/**', drop);
      await page.route('**/assets/**', drop);

      await page.getByRole('navigation', { name: 'Workshop' }).getByRole('link', { name: 'Builds' }).click();
      await page.getByRole('heading', { name: 'Could not reach the server' }).waitFor();
      await expectCalmText(page, 'builds page while offline');
      expect((await page.getByRole('button', { name: 'Reload' }).count()) === 1, 'the page offers Reload');
      await ctx.screenshot('offline-page', page);

      await page.getByRole('navigation', { name: 'Workshop' }).getByRole('link', { name: 'Stock room' }).click();
      await page.getByRole('heading', { name: 'Could not reach the server' }).waitFor();
      await expectCalmText(page, 'stock room while offline');

      // The network comes back: Reload brings the page.
      await page.unroute('**/api/**', drop);
      await page.unroute('**/assets/**', drop);
      await page.getByRole('button', { name: 'Reload' }).click();
      await page.getByTestId('stock-table').waitFor();

      // A change while offline: the dialog says so once, in plain words, and nothing else does.
      await page.route('**/api/**', drop);
      await page.getByTestId('stock-row').first().getByRole('button', { name: 'Delete' }).click();
      const dialog = page.getByRole('alertdialog');
      await dialog.getByRole('button', { name: 'Remove' }).click();
      await dialog.getByText('Could not reach the server').waitFor();
      await page.waitForTimeout(300);
      const mentions = await page.getByText('Could not reach the server').count();
      expect(mentions === 1, `the failure is reported once, saw ${mentions}`);
      await expectCalmText(page, 'stock delete while offline');
      await dialog.getByRole('button', { name: 'Cancel' }).click();
      await page.unroute('**/api/**', drop);
    },
  },
];

export default tests;
