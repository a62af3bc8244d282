/**
 * Share links: read-only, expiring, revocable; one cut plan and its exports without an account, and
 * nothing else (PRODUCT.md §2). 410 Gone (RFC 9110 §15.5.11) once withdrawn or expired.
 * "Send this cut plan" goes over SMTP to the local catcher.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ShareLink } from '../../server/modules/share-links/share-link.entity.js';
import { addStock, demoBuildId, demoWorkshopId, makeCutPlan } from './cut-plans.helpers.js';
import { DEMO, signIn, type Agent } from './helpers.js';
import { buildMailTestApp, linkToken, PUBLIC_URL, type MailTestApp } from './mail-fixture.js';

let t: MailTestApp;
let maker: Agent;
let wid: number;
let planId: number;
let otherPlanId: number;

beforeAll(async () => {
  t = await buildMailTestApp();
  maker = await signIn(t.app, DEMO.maker);
  wid = await demoWorkshopId(maker);
  const ids = await addStock(t, wid, [
    { kind: 'sheet', material: 'MDF', thicknessMm: 18, widthMm: 2440, heightMm: 1220, quantity: null, cost: 40, grain: 'none' },
    { kind: 'sheet', material: 'MDF', thicknessMm: 25, widthMm: 2440, heightMm: 1220, quantity: null, cost: 55, grain: 'none' },
    { kind: 'roll', material: 'Polyester batt', thicknessMm: 50, widthMm: 1200, lengthMm: null, quantity: null, cost: 6, grain: 'none' },
  ]);
  const buildId = await demoBuildId(t, wid);
  planId = await makeCutPlan(t, wid, buildId, { stockIds: ids, timeLimitMs: 300 });
  otherPlanId = await makeCutPlan(t, wid, buildId, { stockIds: ids, timeLimitMs: 300, mode: 'free' });
});
afterAll(async () => t.close());

const links = (id = planId) => `/api/workshops/${wid}/cut-plans/${id}/share-links`;

describe('share links', () => {
  it('"send this cut plan" e-mails a link that opens the plan and its exports without an account', async () => {
    const res = await maker.post(links()).send({ email: 'client@outside.test', days: 7, message: 'Here are the panels for the pair.' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ planId, status: 'active', sentTo: 'client@outside.test', mailSent: true });
    const mail = await t.catcher.waitFor((m) => m.to.includes('client@outside.test'));
    expect(mail.headers['x-boxwright-kind']).toBe('share-link');
    expect(mail.text).toContain('Here are the panels for the pair.');
    const token = linkToken(mail, '/share/');
    expect(res.body.url).toBe(`${PUBLIC_URL}/share/${token}`);
    expect(Date.parse(res.body.expiresAt) - Date.now()).toBeGreaterThan(6.9 * 86_400_000);

    const stranger = request.agent(t.app);
    const open = await stranger.get(`/api/share/${token}`).expect(200);
    expect(open.headers['cache-control']).toBe('no-store');
    expect(open.headers['referrer-policy']).toBe('no-referrer');
    expect(open.headers['set-cookie']).toBeUndefined();
    const plan = (await maker.get(`/api/workshops/${wid}/cut-plans/${planId}`).expect(200)).body;
    expect(open.body.buildName).toBe(plan.buildName);
    expect(open.body.parts).toEqual(plan.parts);
    expect(open.body.groups).toEqual(plan.groups);
    // Read-only view: nobody's e-mail, no workshop or design ids.
    const text = JSON.stringify(open.body);
    expect(text).not.toMatch(/@harbourlane\.test/);
    expect(text).not.toMatch(/"(workshopId|buildId|stockItemId)"/);

    const csv = await stranger.get(`/api/share/${token}/exports/cut-list.csv`).expect(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    expect(csv.headers['content-disposition']).toMatch(/^attachment; filename=/);
    const own = await maker.get(`/api/workshops/${wid}/cut-plans/${planId}/exports/cut-list.csv`).expect(200);
    expect(csv.text).toBe(own.text);
  });

  it('opens nothing else: no other plan, no workshop route, no other path', async () => {
    const made = await maker.post(links()).send({});
    const token = made.body.url.split('/share/')[1];
    const stranger = request.agent(t.app);
    await stranger.get(`/api/share/${token}`).expect(200);
    expect((await stranger.get(`/api/workshops/${wid}/cut-plans/${planId}`)).status).toBe(401);
    expect((await stranger.get(`/api/workshops/${wid}/cut-plans/${otherPlanId}`)).status).toBe(401);
    expect((await stranger.get(`/api/workshops/${wid}/designs`)).status).toBe(401);
    expect((await stranger.get(`/api/workshops/${wid}/cut-plans/${planId}/checklist`)).status).toBe(401);
    expect((await stranger.get(`/api/share/${token}/checklist`)).status).toBe(404);
    expect((await stranger.get(`/api/share/${token}/exports/../../workshops/${wid}/designs`)).status).not.toBe(200);
    expect((await stranger.get(`/api/share/${token}/${otherPlanId}`)).status).toBe(404);
    // A link to one plan is listed on that plan only.
    const other = (await maker.get(links(otherPlanId)).expect(200)).body.items;
    expect(other).toEqual([]);
  });

  it('stops working when withdrawn or expired; an unknown token is 404', async () => {
    const made = await maker.post(links()).send({ days: 1 });
    const token = made.body.url.split('/share/')[1];
    await request(t.app).get(`/api/share/${token}/exports/cut-list.csv`).expect(200);
    await maker.delete(`${links()}/${made.body.id}`).expect(204);
    const gone = await request(t.app).get(`/api/share/${token}`);
    expect(gone.status).toBe(410);
    expect(gone.body.error.message).toMatch(/withdrawn/);
    expect((await request(t.app).get(`/api/share/${token}/exports/cut-list.csv`)).status).toBe(410);

    const late = await maker.post(links()).send({ days: 1 });
    await t.orm.em.fork().nativeUpdate(ShareLink, { id: late.body.id }, { expiresAt: new Date(Date.now() - 1) });
    expect((await request(t.app).get(`/api/share/${late.body.url.split('/share/')[1]}`)).status).toBe(410);
    expect((await request(t.app).get(`/api/share/${'B'.repeat(43)}`)).status).toBe(404);

    const list = (await maker.get(links()).expect(200)).body.items as { id: number; status: string; url?: string }[];
    expect(list.find((l) => l.id === made.body.id)!.status).toBe('revoked');
    expect(list.find((l) => l.id === late.body.id)!.status).toBe('expired');
    expect(list.every((l) => l.url === undefined)).toBe(true);
  });

  it('carries the workshop’s currency code (as members see it after amounts), null when none is set, and still no people', async () => {
    const owner = await signIn(t.app, DEMO.owner);
    const made = await maker.post(links()).send({});
    const token = made.body.url.split('/share/')[1];
    const stranger = request.agent(t.app);
    const plain = await stranger.get(`/api/share/${token}`).expect(200);
    expect(plain.body.currency).toBeNull();

    const settings = (await owner.get(`/api/workshops/${wid}`).expect(200)).body;
    await owner.patch(`/api/workshops/${wid}`).send({ version: settings.version, currency: 'EUR' }).expect(200);
    const priced = await stranger.get(`/api/share/${token}`).expect(200);
    expect(priced.body.currency).toBe('EUR');
    // The currency is read when the link is opened, like the members' page (not copied into the plan).
    expect((await owner.get(`/api/workshops/${wid}`).expect(200)).body.currency).toBe(priced.body.currency);
    const text = JSON.stringify(priced.body);
    expect(text).not.toContain(settings.name);
    expect(text).not.toMatch(/@harbourlane\.test/);
    expect(Object.keys(priced.body).sort()).toEqual(
      ['buildName', 'cabinets', 'createdAt', 'currency', 'expiresAt', 'exports', 'groups', 'mode', 'parts', 'settings', 'totals', 'warnings'],
    );

    const latest = (await owner.get(`/api/workshops/${wid}`).expect(200)).body;
    await owner.patch(`/api/workshops/${wid}`).send({ version: latest.version, currency: null }).expect(200);
  });

  it('viewers cannot make links; days out of range is a field error', async () => {
    const viewer = await signIn(t.app, DEMO.viewer);
    expect((await viewer.post(links()).send({})).status).toBe(403);
    const bad = await maker.post(links()).send({ days: 365, email: 'nope' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ days: 'at most 90 days', email: 'enter a valid e-mail address' });
  });
});
