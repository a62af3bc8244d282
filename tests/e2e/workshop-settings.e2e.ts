/**
 * Workshop settings (PRODUCT.md §2: the owner's "workshop settings, deleting the workshop"; a person may belong to
 * several workshops): the owner sets the currency and a default kerf, "Make cut plan" starts from that kerf and the
 * cut plan shows its cost in that currency; a maker has no Settings tab; the owner starts a new workshop from the
 * picker and deletes it by typing its name.
 */
import type { Page } from 'playwright-core';
import { DEMO, expect, type E2ETest } from './harness';

const BUILD = 'Harbour Lane pair + floorstanders';

async function openSettings(page: Page): Promise<void> {
  await page.getByRole('navigation', { name: 'Workshop' }).getByRole('link', { name: 'Settings' }).click();
  await page.getByRole('heading', { name: 'Workshop settings' }).waitFor();
}

const tests: E2ETest[] = [
  {
    name: 'the owner sets the currency and the default kerf; Make cut plan starts from that kerf and the cut plan shows the currency',
    timeoutMs: 90_000,
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.owner);
      await openSettings(page);
      const wid = Number(/\/w\/(\d+)\//.exec(page.url())?.[1]);
      await page.getByTestId('settings-status').getByText('All changes saved').waitFor();
      await ctx.screenshot('workshop-settings');

      await page.getByLabel('Currency').selectOption('EUR');
      await page.getByLabel('Kerf (blade width)').fill('2.4');
      await page.getByLabel('Search time').fill('1');
      await page.getByTestId('settings-status').getByText('Unsaved changes').waitFor();
      await page.getByRole('button', { name: 'Save settings' }).click();
      await page.getByTestId('settings-status').getByText('All changes saved').waitFor();
      await ctx.screenshot('workshop-settings-saved');

      // A bad value is refused next to its input, with the cut plan settings' words.
      await page.getByLabel('Kerf (blade width)').fill('-1');
      await page.getByRole('button', { name: 'Save settings' }).click();
      await page.getByText('kerf must be 0 or more').waitFor();
      await page.getByRole('button', { name: 'Discard' }).click();
      expect((await page.getByLabel('Kerf (blade width)').inputValue()) === '2.4', 'Discard puts the saved kerf back');

      await page.getByRole('navigation', { name: 'Workshop' }).getByRole('link', { name: 'Builds' }).click();
      await page.getByRole('link', { name: BUILD }).click();
      await page.getByRole('heading', { name: 'Make cut plan' }).waitFor();
      const kerf = await page.getByLabel('Kerf (blade width)').inputValue();
      expect(kerf === '2.4', `Make cut plan starts from the workshop's kerf: ${kerf}`);
      const time = await page.getByLabel('Search time').inputValue();
      expect(time === '1', `Make cut plan starts from the workshop's search time: ${time}`);
      // Stock room prices carry the code too.
      await page.getByRole('list', { name: 'Stock room' }).getByText(/38\.50 EUR each/).waitFor();

      await page.getByRole('button', { name: 'Make cut plan' }).click();
      await page.waitForURL(/\/cut-plans\/\d+$/, { timeout: 60_000 });
      const cost = (await page.getByTestId('total-cost').innerText()).replace(/\s+/g, ' ');
      expect(/\d+\.\d\d EUR/.test(cost), `the material cost shows the currency: ${cost}`);
      const settingsLine = await page.locator('main').getByText(/kerf 2\.4 mm/).count();
      expect(settingsLine > 0, 'the cut plan was made with the 2.4 mm kerf');
      await ctx.screenshot('cut-plan-currency');

      // Someone without an account opening a shared link sees the same amount, code included.
      const planId = Number(/\/cut-plans\/(\d+)$/.exec(page.url())?.[1]);
      const ownerApi = await ctx.api(DEMO.owner);
      const link = await (await ownerApi.post(`/api/workshops/${wid}/cut-plans/${planId}/share-links`, { data: { days: 1 } })).json();
      const visitor = await (await ctx.newSession()).page();
      await visitor.goto(link.url.replace(/^https?:\/\/[^/]+/, ctx.baseUrl));
      const sharedCost = (await visitor.getByTestId('total-cost').innerText()).replace(/\s+/g, ' ');
      expect(sharedCost === cost, `the shared page shows the cost as members see it: ${sharedCost} vs ${cost}`);
      await ctx.screenshot('shared-plan-currency', visitor);

      // The stock room shows the code after its prices.
      await page.getByRole('navigation', { name: 'Workshop' }).getByRole('link', { name: 'Stock room' }).click();
      await page.getByText('38.50 EUR').first().waitFor();

      // Later browser tests share this database: back to plain numbers and the usual settings.
      const owner = await ctx.api(DEMO.owner);
      const current = await (await owner.get(`/api/workshops/${wid}`)).json();
      const reset = await owner.patch(`/api/workshops/${wid}`, { data: { version: current.version, currency: null, cutDefaults: {} } });
      expect(reset.status() === 200, `settings reset: ${reset.status()}`);
    },
  },
  {
    name: 'a maker has no Settings tab; the page says No access and the server refuses the change',
    async run(ctx) {
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.maker);
      const nav = page.getByRole('navigation', { name: 'Workshop' });
      await nav.getByRole('link', { name: 'Members' }).waitFor();
      expect((await nav.getByRole('link', { name: 'Settings' }).count()) === 0, 'a maker sees no Settings tab');
      const wid = Number(/\/w\/(\d+)\//.exec(page.url())?.[1]);
      await page.goto(`${ctx.baseUrl}/w/${wid}/settings`);
      await page.getByRole('heading', { name: 'No access' }).waitFor();
      expect((await page.getByRole('button', { name: /Save settings|Delete workshop/ }).count()) === 0, 'no settings controls for a maker');
      const maker = await ctx.api(DEMO.maker);
      const answer = await maker.patch(`/api/workshops/${wid}`, { data: { version: 1, name: 'Taken over' } });
      expect(answer.status() === 403, `the server answers ${answer.status()} to a maker's change`);
    },
  },
  {
    name: 'the owner starts a new workshop from the picker, then deletes it by typing its name',
    timeoutMs: 60_000,
    async run(ctx) {
      const name = 'Offcut Corner Joinery';
      const page = await ctx.page();
      await ctx.signIn(page, DEMO.owner);
      await page.getByRole('link', { name: 'Switch workshop' }).click();
      await page.getByRole('heading', { name: 'Choose a workshop' }).waitFor();
      await page.getByRole('button', { name: 'New workshop' }).click();
      // An empty name is refused in place.
      await page.getByRole('button', { name: 'Create workshop' }).click();
      await page.getByText('name is required').waitFor();
      await page.getByLabel('Workshop name').fill(name);
      await ctx.screenshot('new-workshop');
      await page.getByRole('button', { name: 'Create workshop' }).click();
      await page.waitForURL(/\/w\/\d+\/designs$/);
      const header = await page.getByTestId('workshop-name').innerText();
      expect(header === name, `the header names the new workshop: ${header}`);
      expect((await page.getByTestId('role-label').innerText()) === 'Owner', 'the person who starts it is its owner');

      await openSettings(page);
      const del = page.getByRole('button', { name: 'Delete workshop' });
      await page.getByText('This cannot be undone. Download the cut plans and stock CSV you need first.').waitFor();
      await del.scrollIntoViewIfNeeded();
      await ctx.screenshot('workshop-settings-danger');
      expect(await del.isDisabled(), 'Delete stays off until the name is typed');
      await page.getByLabel(/to confirm$/).fill('offcut corner');
      expect(await del.isDisabled(), 'a name that does not match keeps Delete off');
      await page.getByLabel(/to confirm$/).fill(name);
      expect(await del.isEnabled(), 'the exact name turns Delete on');
      await del.click();

      await page.waitForURL(/\/workshops$/);
      await page.getByRole('heading', { name: 'Choose a workshop' }).waitFor();
      await page.getByRole('link', { name: /Harbour Lane Audio/ }).waitFor();
      expect((await page.getByRole('link', { name: new RegExp(name) }).count()) === 0, 'the deleted workshop is gone from the picker');
      await ctx.screenshot('workshop-deleted');
    },
  },
];

export default tests;
