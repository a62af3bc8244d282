/**
 * The build checklist in the browser: a maker ticks pieces (big touch targets, also at tablet size) and
 * marks a sheet cut, which takes it out of the stock room; a viewer sees the progress without controls.
 */
import type { APIRequestContext, Page } from 'playwright-core';
import { DEMO, expect, type E2EContext, type E2ETest } from './harness';

const BUILD = 'Harbour Lane pair + floorstanders';

/** A cut plan of the demo build from the demo stock room, made through the nest-job API as the app does. */
async function makePlan(maker: APIRequestContext): Promise<{ workshopId: number; planId: number }> {
  const me = await (await maker.get('/api/auth/me')).json();
  const workshopId = me.memberships[0].workshopId as number;
  const builds = await (await maker.get(`/api/workshops/${workshopId}/builds`)).json();
  const build = builds.items.find((b: { name: string }) => b.name === BUILD);
  expect(build, 'the demo build exists');
  const job = await (await maker.post(`/api/workshops/${workshopId}/nest-jobs`, { data: { buildId: build.id, settings: { timeLimitMs: 500 } } })).json();
  for (let i = 0; i < 300; i++) {
    const state = await (await maker.get(`/api/workshops/${workshopId}/nest-jobs/${job.id}`)).json();
    if (state.status === 'done') return { workshopId, planId: state.result.cutPlanId as number };
    if (state.status === 'failed') throw new Error(`nest job failed: ${JSON.stringify(state.error)}`);
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('the nest job did not finish');
}

/** A maker signed in, and a new cut plan of the demo build to work on. */
async function makerAtNewPlan(ctx: E2EContext): Promise<{ workshopId: number; planId: number; page: Page }> {
  const { workshopId, planId } = await makePlan(await ctx.api(DEMO.maker));
  const page = await ctx.page();
  await ctx.signIn(page, DEMO.maker);
  return { workshopId, planId, page };
}

const tests: E2ETest[] = [
  {
    name: 'a maker ticks pieces and marks a sheet cut; the stock room follows',
    timeoutMs: 90_000,
    async run(ctx) {
      const maker = await ctx.api(DEMO.maker);
      const { workshopId, planId } = await makePlan(maker);
      type Item = { kind: string; thicknessMm: number; quantity: number | null; fromPlanId: number | null };
      /** 18 mm sheets and remnants in the room, not counting offcuts kept from this plan. */
      const pieces18 = async () =>
        ((await (await maker.get(`/api/workshops/${workshopId}/stock`)).json()).items as Item[])
          .filter((s) => s.kind !== 'roll' && s.thicknessMm === 18 && s.fromPlanId !== planId)
          .reduce((n, s) => n + (s.quantity ?? 0), 0);
      const before18 = await pieces18();

      const page = await ctx.page();
      await ctx.signIn(page, DEMO.maker);
      await page.getByRole('link', { name: 'Checklists' }).click();
      await page.getByRole('link', { name: new RegExp(BUILD.replace('+', '\\+')) }).first().click();
      await page.getByRole('heading', { name: `Checklist: ${BUILD}` }).waitFor();
      expect(page.url().endsWith(`/w/${workshopId}/cut-plans/${planId}/checklist`), `opened the checklist of plan ${planId}: ${page.url()}`);

      const total = page.getByRole('progressbar', { name: 'All pieces' });
      const pieces = page.getByTestId('piece');
      const count = await pieces.count();
      expect(count > 20, `the demo build has many pieces, saw ${count}`);
      expect((await total.getAttribute('aria-valuenow')) === '0', 'nothing is cut yet');
      // Big touch targets: every piece row is at least 48 px high (WCAG 2.5.5 target size is 44 × 44 CSS px).
      const box = await pieces.first().boundingBox();
      expect(box && box.height >= 48, `a piece row is ${box?.height} px high`);

      const first = pieces.first();
      const name = (await first.textContent()) ?? '';
      await first.click();
      await page.getByRole('button', { name: 'All', exact: true }).click();
      const ticked = page.getByTestId('piece').filter({ hasText: name.split('·')[0]!.trim() }).filter({ hasText: `cut by ${DEMO.maker}` });
      await ticked.first().waitFor();
      await page.waitForFunction(() => document.querySelector('[role="progressbar"][aria-label="All pieces"]')?.getAttribute('aria-valuenow') === '1');
      await pieces.nth(1).click();
      await pieces.nth(2).click();
      await page.waitForFunction(() => document.querySelector('[role="progressbar"][aria-label="All pieces"]')?.getAttribute('aria-valuenow') === '3');

      // Mark the first 18 mm sheet cut: it leaves the stock room.
      const sheet = page.getByTestId('sheet').filter({ hasText: 'MDF 18' }).first();
      await sheet.getByRole('button', { name: 'Mark cut' }).click();
      await page.getByRole('alertdialog').getByRole('button', { name: 'Mark cut' }).click();
      await sheet.getByRole('button', { name: 'Undo' }).waitFor();
      // The plan may use the kept remnant first; either way one 18 mm sheet or remnant left the room.
      const after18 = await pieces18();
      expect(after18 === before18 - 1, `one 18 mm sheet or remnant left the stock room: ${before18} → ${after18}`);
      await ctx.screenshot('checklist-maker');

      await page.setViewportSize({ width: 820, height: 1180 });
      await page.getByRole('button', { name: 'To cut' }).click();
      await page.waitForTimeout(200);
      await ctx.screenshot('checklist-tablet');
      await page.getByRole('heading', { name: 'History' }).scrollIntoViewIfNeeded();
      await page.getByText(/Marked MDF 18/).first().waitFor();

      // A photo of the build (a real PNG: a screenshot of this page), checked by its content on the server.
      const photo = await page.screenshot({ clip: { x: 0, y: 0, width: 400, height: 300 } });
      await page.getByLabel('File', { exact: true }).setInputFiles({ name: 'bench.png', mimeType: 'image/png', buffer: photo });
      await page.getByRole('img', { name: 'bench.png' }).waitFor();
      // An SVG is refused whatever it is called.
      await page.getByLabel('File', { exact: true }).setInputFiles({ name: 'sneaky.png', mimeType: 'image/png', buffer: Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"></svg>') });
      await page.getByText(/SVG or other markup/).waitFor();
      await page.getByRole('img', { name: 'bench.png' }).scrollIntoViewIfNeeded();
      await ctx.screenshot('checklist-files');

      // The build's page shows the photo in the build's history, with who added it.
      const builds = (await (await maker.get(`/api/workshops/${workshopId}/builds`)).json()).items as { id: number; name: string }[];
      await page.goto(`${ctx.baseUrl}/w/${workshopId}/builds/${builds.find((b) => b.name === BUILD)!.id}`);
      const added = page.getByRole('list', { name: 'History' }).getByRole('listitem').filter({ hasText: 'Added photo "bench.png"' }).first();
      await added.waitFor();
      expect((await added.innerText()).includes(DEMO.maker), `the history line names who added the photo: ${await added.innerText()}`);
    },
  },
  {
    name: 'the checklist names the sheets as the cut plan page does; on a tablet the sheets and cautions come before the pieces',
    timeoutMs: 90_000,
    async run(ctx) {
      const { workshopId, planId, page } = await makerAtNewPlan(ctx);

      // The cut plan page: "Sheet 2 · MDF 18 mm · 2440 × 1220 mm" → "Sheet 2" (the name printed on the cut diagrams).
      await page.goto(`${ctx.baseUrl}/w/${workshopId}/cut-plans/${planId}`);
      await page.getByTestId('sheet-card').first().waitFor();
      const onPlan = (await page.getByTestId('sheet-card').locator('h3').allTextContents()).map((t) => t.split(' · ')[0]!.trim());
      expect(onPlan.length >= 3, `the plan has several sheets and a roll: ${onPlan.join(', ')}`);
      expect(new Set(onPlan).size === onPlan.length, `every sheet has its own name: ${onPlan.join(', ')}`);

      await page.getByRole('link', { name: 'Checklist', exact: true }).click();
      await page.getByRole('heading', { name: `Checklist: ${BUILD}` }).waitFor();
      const onChecklist = (await page.getByTestId('sheet').locator('span.font-bold').allTextContents()).map((t) => t.trim());
      expect(JSON.stringify(onChecklist) === JSON.stringify(onPlan), `checklist sheets ${onChecklist.join(', ')} vs cut plan ${onPlan.join(', ')}`);
      // The same cautions as the cut plan page and the printed diagrams.
      const cautions = await page.getByTestId('cautions').innerText();
      expect(/dust/i.test(cautions) && /local/i.test(cautions) && /tool maker/i.test(cautions) && /lifting/i.test(cautions), `cautions: ${cautions}`);

      await page.setViewportSize({ width: 820, height: 1180 });
      const sheetsTop = (await page.getByRole('heading', { name: 'Sheets', exact: true }).boundingBox())!.y;
      const cautionsTop = (await page.getByTestId('cautions').boundingBox())!.y;
      const piecesTop = (await page.getByRole('heading', { name: 'Pieces', exact: true }).boundingBox())!.y;
      expect(sheetsTop < piecesTop && cautionsTop < piecesTop, `on a tablet: sheets at ${sheetsTop}, cautions at ${cautionsTop}, pieces at ${piecesTop}`);
      await ctx.screenshot('checklist-tablet-sheets-first');
    },
  },
  {
    name: 'a viewer sees the progress but cannot tick',
    timeoutMs: 90_000,
    async run(ctx) {
      const maker = await ctx.api(DEMO.maker);
      const { workshopId, planId } = await makePlan(maker);
      const list = await (await maker.get(`/api/workshops/${workshopId}/cut-plans/${planId}/checklist`)).json();
      await maker.post(`/api/workshops/${workshopId}/cut-plans/${planId}/checklist/ticks`, { data: { item: 'part', key: list.parts[0].key, cut: true } });

      const page = await ctx.page();
      await ctx.signIn(page, DEMO.viewer);
      await page.goto(`${ctx.baseUrl}/w/${workshopId}/cut-plans/${planId}/checklist`);
      await page.getByRole('heading', { name: `Checklist: ${BUILD}` }).waitFor();
      await page.waitForFunction(() => document.querySelector('[role="progressbar"][aria-label="All pieces"]')?.getAttribute('aria-valuenow') === '1');
      expect(await page.getByTestId('piece').first().isDisabled(), 'pieces are not tappable for a viewer');
      expect((await page.getByRole('button', { name: 'Mark cut' }).count()) === 0, 'a viewer has no Mark cut button');
      expect((await page.getByRole('link', { name: 'Stock room' }).count()) === 0, 'a viewer has no stock room in the menu');
    },
  },
  {
    name: 'the stock room imports a CSV all or nothing and shows the row-by-row report',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.maker);
      await page.getByRole('link', { name: 'Stock room' }).click();
      await page.getByTestId('stock-table').waitFor();
      // Other tests share this database (a sheet marked cut changes the remnants), so count first.
      await page.getByRole('button', { name: 'Remnants' }).click();
      const remnantsBefore = await page.getByTestId('stock-row').count();
      await page.getByRole('button', { name: 'All', exact: true }).click();
      const rowsBefore = await page.getByTestId('stock-row').count();
      await page.getByRole('button', { name: 'Import CSV' }).click();
      const bad = 'kind,material,thickness_mm,width_mm,height_mm,quantity\nsheet,Birch plywood,18,2500,1250,4\nsheet,Birch plywood,18,wide,1250,4\n';
      await page.getByLabel('CSV file', { exact: true }).setInputFiles({ name: 'birch.csv', mimeType: 'text/csv', buffer: Buffer.from(bad) });
      await page.getByRole('button', { name: 'Import', exact: true }).click();
      const report = page.getByTestId('csv-report');
      await report.waitFor();
      const text = (await report.textContent()) ?? '';
      expect(text.includes('3') && text.includes('width_mm') && text.includes('"wide" is not a number'), `the report names row 3, width_mm: ${text}`);
      await ctx.screenshot('stock-import-report');
      const good = bad.replace('wide', '2500');
      await page.getByLabel('CSV file', { exact: true }).setInputFiles({ name: 'birch.csv', mimeType: 'text/csv', buffer: Buffer.from(good) });
      await page.getByRole('button', { name: 'Import', exact: true }).click();
      await page.getByRole('alertdialog').or(page.getByRole('dialog')).first().waitFor({ state: 'hidden' }).catch(() => undefined);
      await page.waitForFunction((n) => document.querySelectorAll('[data-testid="stock-row"]').length === n + 2, rowsBefore);
      // The imported rows are sheets: the remnants stay as they were.
      await page.getByRole('button', { name: 'Remnants' }).click();
      await page.waitForFunction((n) => document.querySelectorAll('[data-testid="stock-row"]').length === n, remnantsBefore);
      await page.getByRole('button', { name: 'All', exact: true }).click();
      await page.getByRole('button', { name: 'History' }).first().click();
      await page.getByRole('list', { name: 'History' }).waitFor();
      await ctx.screenshot('stock-room');
    },
  },
  {
    name: 'an owner invites by e-mail; the link from Sent mail makes the account with that role',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.owner);
      await page.getByRole('link', { name: 'Invitations' }).click();
      await page.getByLabel('E-mail').fill('apprentice@harbourlane.test');
      await page.getByLabel('Role').selectOption('viewer');
      await page.getByRole('button', { name: 'Send invitation' }).click();
      await page.getByTestId('invitations').getByText('apprentice@harbourlane.test').waitFor();
      await ctx.screenshot('invitations');
      await page.getByRole('link', { name: 'Sent mail' }).click();
      await page.getByText('You are invited to Harbour Lane Audio on Boxwright').first().click();
      const link = page.getByRole('link', { name: /\/invite\// }).first();
      const href = (await link.getAttribute('href')) ?? '';
      expect(/\/invite\/[A-Za-z0-9_-]{43}$/.test(href), `the mail carries an invitation link: ${href}`);
      await ctx.screenshot('sent-mail');

      const newcomer = await (await ctx.newSession()).page();
      await newcomer.goto(href.replace(/^https?:\/\/[^/]+/, ctx.baseUrl));
      await newcomer.getByText('You are invited to').waitFor();
      await newcomer.getByLabel('Choose a password').fill('apprentice-password');
      await newcomer.getByLabel('Repeat the password').fill('apprentice-password');
      await ctx.screenshot('invite-accept', newcomer);
      await newcomer.getByRole('button', { name: 'Make my account and join' }).click();
      await newcomer.waitForURL(/\/w\/\d+\/designs$/);
      await newcomer.getByTestId('role-label').filter({ hasText: 'Viewer' }).waitFor();
      expect((await newcomer.getByRole('link', { name: 'Stock room' }).count()) === 0, 'a viewer has no stock room');
      // The link worked once.
      await newcomer.goto(href.replace(/^https?:\/\/[^/]+/, ctx.baseUrl));
      await newcomer.getByText('This invitation has already been used.').waitFor();
    },
  },
  {
    name: 'a share link shows one cut plan without an account, until it is withdrawn',
    timeoutMs: 90_000,
    async run(ctx) {
      const { workshopId, planId, page } = await makerAtNewPlan(ctx);
      await page.goto(`${ctx.baseUrl}/w/${workshopId}/cut-plans/${planId}/share`);
      await page.getByLabel('Send it to (optional)').fill('client@outside.test');
      await page.getByLabel('Note in the e-mail (optional)').fill('The panels for your pair.');
      await page.getByRole('button', { name: 'Send this cut plan' }).click();
      const url = await page.getByLabel('Share link').inputValue();
      expect(/\/share\/[A-Za-z0-9_-]{43}$/.test(url), `a share link: ${url}`);
      await ctx.screenshot('share-panel');

      const stranger = await (await ctx.newSession()).page();
      await stranger.goto(url.replace(/^https?:\/\/[^/]+/, ctx.baseUrl));
      await stranger.getByRole('heading', { name: BUILD }).waitFor();
      await stranger.getByRole('link', { name: 'Cut list (CSV)' }).waitFor();
      expect((await stranger.getByRole('link', { name: 'Designs' }).count()) === 0, 'no workshop menu for a stranger');
      await ctx.screenshot('shared-plan', stranger);

      await page.getByRole('button', { name: 'Withdraw' }).first().click();
      await page.getByText('Withdrawn').first().waitFor();
      await stranger.reload();
      await stranger.getByText('This link was withdrawn by the workshop.').waitFor();
    },
  },
  {
    name: 'forgot password answers the same for any e-mail',
    async run(ctx) {
      const page = await ctx.page();
      await page.goto(`${ctx.baseUrl}/sign-in`);
      await page.getByRole('link', { name: 'Forgot your password?' }).click();
      await page.getByLabel('E-mail of your account').fill('nobody@nowhere.test');
      await page.getByRole('button', { name: 'Send me a link' }).click();
      await page.getByText('If an account exists for that e-mail').waitFor();
      await ctx.screenshot('forgot-password');
    },
  },
];

export default tests;
