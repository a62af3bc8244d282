/**
 * Workshops themselves (PRODUCT.md §2 "workshop settings, deleting the workshop"; a person in several workshops):
 * starting one, reading and changing its settings with optimistic locking, and deleting it with everything it holds.
 * Statuses per RFC 9110 (201 §15.3.2, 204 §15.3.5, 400 §15.5.1, 403 §15.5.4, 409 §15.5.10).
 */
import * as pdfjs from 'pdfjs-dist/legacy/build/pdf.mjs';
import type request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_BOOKSHELF } from '../../shared/demo/designs.js';
import { CURRENCIES, cutPlanSettingsInput, DEFAULT_KERF_MM } from '../../shared/schemas/api.schema.js';
import { AuditEvent } from '../../server/modules/audit/audit.entity.js';
import { User } from '../../server/modules/auth/user.entity.js';
import { WORKSHOP_TABLES } from '../../server/modules/workshops/workshop-settings.service.js';
import { Membership } from '../../server/modules/workshops/membership.entity.js';
import { Workshop } from '../../server/modules/workshops/workshop.entity.js';
import { MemoryStorage } from '../../server/storage/storage.js';
import { closeNestPool } from '../../server/workers/pool.js';
import { DEMO_ROLL, DEMO_SHEET, makeCutPlan } from './cut-plans.helpers.js';
import { buildTestApp, DEMO, signIn, signUp, type Agent, type TestApp } from './helpers.js';

const DRIVERS_CSV = 'name,cutout_diameter_mm,displacement_litres,cone_area_cm2,excursion_mm\nWoofer 6.5,142,0.4,132,5.5\n';

let t: TestApp;
let storage: MemoryStorage;
let owner: Agent;
let maker: Agent;
let demoId: number;

beforeAll(async () => {
  storage = new MemoryStorage();
  t = await buildTestApp({ deps: { storage } });
  owner = await signIn(t.app, DEMO.owner);
  maker = await signIn(t.app, DEMO.maker);
  demoId = (await owner.get('/api/auth/me').expect(200)).body.memberships[0].workshopId;
});
afterAll(async () => {
  await closeNestPool();
  await t.close();
});

async function newWorkshop(agent: Agent, name: string): Promise<{ id: number; version: number }> {
  const res = await agent.post('/api/workshops').send({ name }).expect(201);
  return { id: res.body.id, version: res.body.version };
}

describe('POST /api/workshops', () => {
  it('starts a workshop owned by the signed-in person, beside the ones they already belong to', async () => {
    const res = await maker.post('/api/workshops').send({ name: '  Maker’s Own Bench  ' }).expect(201);
    expect(res.body).toEqual({
      id: expect.any(Number),
      name: 'Maker’s Own Bench',
      currency: null,
      // The cut plan schema's own defaults (kerf 3.2 mm: common practice for a panel-saw blade).
      cutDefaults: { kerfMm: DEFAULT_KERF_MM, trimMm: 10, minOffcutMm: 200, mode: 'guillotine', timeLimitMs: 3000 },
      version: 1,
    });
    const me = await maker.get('/api/auth/me').expect(200);
    expect(me.body.memberships).toEqual(
      expect.arrayContaining([
        { workshopId: res.body.id, workshopName: 'Maker’s Own Bench', role: 'owner' },
        { workshopId: demoId, workshopName: expect.any(String), role: 'maker' },
      ]),
    );
    const events = await t.orm.em.fork().find(AuditEvent, { workshop: res.body.id, subjectType: 'workshop' });
    expect(events.map((e) => e.action)).toEqual(['create']);
  });

  it('needs a name of 1–120 characters (trimmed), and a signed-in person', async () => {
    const blank = await owner.post('/api/workshops').send({ name: '   ' }).expect(400);
    expect(blank.body.error.fields).toEqual({ name: 'name is required' });
    const long = await owner.post('/api/workshops').send({ name: 'x'.repeat(121) }).expect(400);
    expect(long.body.error.fields).toEqual({ name: 'name must be at most 120 characters' });
    await owner.post('/api/workshops').send({ name: 'x'.repeat(120) }).expect(201);
    const missing = await owner.post('/api/workshops').send({}).expect(400);
    expect(Object.keys(missing.body.error.fields)).toEqual(['name']);
    const { default: request } = await import('supertest');
    await request(t.app).post('/api/workshops').send({ name: 'Nobody' }).expect(401);
  });
});

describe('GET and PATCH /api/workshops/:wid', () => {
  it('every member reads the settings; outsiders get 403', async () => {
    const res = await maker.get(`/api/workshops/${demoId}`).expect(200);
    expect(res.body).toMatchObject({ id: demoId, currency: null, version: expect.any(Number) });
    const outsider = (await signUp(t.app, 'reader@elsewhere.test', 'Elsewhere')).agent;
    expect((await outsider.get(`/api/workshops/${demoId}`).expect(403)).body.error.code).toBe('forbidden');
  });

  it('the owner renames, sets the currency and the default cut settings; each change is one version and one history line', async () => {
    const ws = await newWorkshop(owner, 'Settings Bench');
    const renamed = await owner.patch(`/api/workshops/${ws.id}`).send({ version: ws.version, name: ' Lathe & Saw ' }).expect(200);
    expect(renamed.body).toMatchObject({ name: 'Lathe & Saw', currency: null, version: ws.version + 1 });
    const priced = await owner
      .patch(`/api/workshops/${ws.id}`)
      .send({ version: renamed.body.version, currency: 'GBP', cutDefaults: { kerfMm: 2.4, trimMm: 5, minOffcutMm: 150, mode: 'free', timeLimitMs: 5000 } })
      .expect(200);
    expect(priced.body).toMatchObject({
      name: 'Lathe & Saw',
      currency: 'GBP',
      cutDefaults: { kerfMm: 2.4, trimMm: 5, minOffcutMm: 150, mode: 'free', timeLimitMs: 5000 },
      version: ws.version + 2,
    });
    // Back to plain numbers.
    const plain = await owner.patch(`/api/workshops/${ws.id}`).send({ version: priced.body.version, currency: null }).expect(200);
    expect(plain.body.currency).toBeNull();
    expect((await owner.get(`/api/workshops/${ws.id}`).expect(200)).body).toEqual(plain.body);

    const events = await t.orm.em.fork().find(AuditEvent, { workshop: ws.id, subjectType: 'workshop', action: 'update' }, { orderBy: { id: 'asc' } });
    expect(events.map((e) => e.summary)).toEqual([
      'Renamed the workshop "Settings Bench" to "Lathe & Saw"',
      'Currency none → GBP; Default cut settings: kerf 2.4 mm, edge trim 5 mm, offcuts from 150 mm, free, 5 s',
      'Currency GBP → none',
    ]);
    expect(events.every((e) => e.actorEmail === DEMO.owner)).toBe(true);
    // The header and the picker read the new name.
    const me = await owner.get('/api/auth/me').expect(200);
    expect(me.body.memberships).toEqual(expect.arrayContaining([{ workshopId: ws.id, workshopName: 'Lathe & Saw', role: 'owner' }]));
  });

  it('a stale version is 409 with the usual conflict message, and changes nothing', async () => {
    const ws = await newWorkshop(owner, 'Conflict Bench');
    await owner.patch(`/api/workshops/${ws.id}`).send({ version: ws.version, name: 'First save' }).expect(200);
    const stale = await owner.patch(`/api/workshops/${ws.id}`).send({ version: ws.version, name: 'Second save' }).expect(409);
    expect(stale.body.error).toEqual({ code: 'edited_elsewhere', message: 'Someone else saved this since you loaded it. Reload their version or keep yours.' });
    expect((await owner.get(`/api/workshops/${ws.id}`).expect(200)).body.name).toBe('First save');
  });

  it('validation errors name the field; the cut defaults use the cut plan settings’ own rules and words', async () => {
    const ws = await newWorkshop(owner, 'Rules Bench');
    const url = `/api/workshops/${ws.id}`;
    expect((await owner.patch(url).send({ name: 'x' }).expect(400)).body.error.fields).toEqual({ version: 'version is required' });
    expect(Object.keys((await owner.patch(url).send({ version: 1, name: '' }).expect(400)).body.error.fields)).toEqual(['name']);
    const currency = await owner.patch(url).send({ version: 1, currency: 'XYZ' }).expect(400);
    expect(currency.body.error.fields.currency).toMatch(/^currency must be one of EUR, GBP, USD/);
    // The same message the cut plan form gets for the same value (one schema, not a copy).
    const planKerf = cutPlanSettingsInput.safeParse({ kerfMm: -1 });
    const planTime = cutPlanSettingsInput.safeParse({ timeLimitMs: 100 });
    const planMode = cutPlanSettingsInput.safeParse({ mode: 'laser' });
    const bad = await owner.patch(url).send({ version: 1, cutDefaults: { kerfMm: -1, timeLimitMs: 100, mode: 'laser' } }).expect(400);
    expect(bad.body.error.fields).toEqual({
      'cutDefaults.kerfMm': planKerf.error?.issues[0]?.message,
      'cutDefaults.timeLimitMs': planTime.error?.issues[0]?.message,
      'cutDefaults.mode': planMode.error?.issues[0]?.message,
    });
    expect(bad.body.error.fields['cutDefaults.kerfMm']).toBe('kerf must be 0 or more');
    expect((await owner.get(url).expect(200)).body.version).toBe(1);
  });

  it('offers only ISO 4217 codes, each known to the ICU currency list of Node’s Intl', () => {
    // Intl.supportedValuesOf('currency') lists the ISO 4217 codes ICU knows (ECMA-402, 2022 edition §8.3.2).
    const known = new Set(Intl.supportedValuesOf('currency'));
    for (const code of CURRENCIES) expect(known.has(code), code).toBe(true);
  });

  it('designers, makers and viewers may not change the settings (403)', async () => {
    for (const role of ['designer', 'maker', 'viewer'] as const) {
      const agent = await signIn(t.app, DEMO[role]);
      const res = await agent.patch(`/api/workshops/${demoId}`).send({ version: 1, name: 'Taken over' }).expect(403);
      expect(res.body.error.code).toBe('forbidden');
    }
  });
});

/** supertest: collect a binary body as a Buffer. */
function binary(res: request.Response, cb: (err: Error | null, body: Buffer) => void): void {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
}

/** Text of every page, read back with pdfjs-dist (a general-purpose PDF parser). */
async function pdfText(bytes: Buffer): Promise<string> {
  const doc = await pdfjs.getDocument({ data: new Uint8Array(bytes), disableFontFace: true, isEvalSupported: false, useSystemFonts: false, verbosity: 0 }).promise;
  const pages: string[] = [];
  for (let i = 1; i <= doc.numPages; i++) pages.push((await (await doc.getPage(i)).getTextContent()).items.map((it) => ('str' in it ? it.str : '')).join(' '));
  return pages.join('\n');
}

describe('currency on the cut diagrams', () => {
  it('the PDF totals carry the workshop’s currency code after the amounts once it is set', async () => {
    const ws = await newWorkshop(owner, 'Priced Bench');
    const base = `/api/workshops/${ws.id}`;
    const design = await owner.post(`${base}/designs`).send({ ...DEMO_BOOKSHELF, name: 'Priced pair' }).expect(201);
    const build = await owner.post(`${base}/builds`).send({ name: 'Priced build', items: [{ designId: design.body.id, quantity: 2 }] }).expect(201);
    // Stock priced 42 per sheet and 6.50 per metre (cut-plans.helpers' demo stock).
    const planId = await makeCutPlan(t, ws.id, build.body.id, { typedStock: [DEMO_SHEET, DEMO_ROLL], timeLimitMs: 200 }, DEMO.owner);
    const pdf = async () => pdfText((await owner.get(`${base}/cut-plans/${planId}/exports/cut-diagrams.pdf`).buffer(true).parse(binary).expect(200)).body as Buffer);
    const plain = await pdf();
    expect(plain).toMatch(/Material cost: \d+\.\d\d(?! [A-Z]{3})/);
    await owner.patch(base).send({ version: ws.version, currency: 'EUR' }).expect(200);
    const priced = await pdf();
    expect(priced).toMatch(/Material cost: \d+\.\d\d EUR/);
  });
});

// ─── Deleting a workshop ───────────────────────────────────────────────────────────────────────
type Counts = Record<string, number>;

/** Rows per table that belong to the workshop (every table with a workshop column, and the workshop row). */
async function countRows(workshopId: number): Promise<Counts> {
  const em = t.orm.em.fork();
  const counts: Counts = { workshops: await em.count(Workshop, { id: workshopId }) };
  for (const table of WORKSHOP_TABLES) counts[table.meta.tableName] = await em.count(table.meta.className, { workshop: workshopId });
  return counts;
}

/** Puts a row in every table a workshop owns: design, build, stock, cut plan, tick, share link, upload, invitation (+ mail), history. */
async function fillWorkshop(agent: Agent, workshopId: number): Promise<void> {
  const base = `/api/workshops/${workshopId}`;
  const design = await agent.post(`${base}/designs`).send({ ...DEMO_BOOKSHELF, name: `Fill ${workshopId}` }).expect(201);
  const build = await agent.post(`${base}/builds`).send({ name: `Fill build ${workshopId}`, items: [{ designId: design.body.id, quantity: 2 }] }).expect(201);
  await agent.post(`${base}/stock`).send(DEMO_SHEET).expect(201);
  await agent.post(`${base}/stock`).send(DEMO_ROLL).expect(201);
  const planId = await makeCutPlan(t, workshopId, build.body.id, { timeLimitMs: 200 }, DEMO.owner);
  const list = await agent.get(`${base}/cut-plans/${planId}/checklist`).expect(200);
  await agent.post(`${base}/cut-plans/${planId}/checklist/ticks`).send({ item: 'part', key: list.body.parts[0].key, cut: true }).expect(200);
  await agent.post(`${base}/cut-plans/${planId}/share-links`).send({ email: 'client@elsewhere.test' }).expect(201);
  await agent.post(`${base}/uploads/drivers-csv?buildId=${build.body.id}`).attach('file', Buffer.from(DRIVERS_CSV), 'drivers.csv').expect(201);
  await agent.post(`${base}/invitations`).send({ email: `invitee-${workshopId}@elsewhere.test`, role: 'viewer' }).expect(201);
}

describe('DELETE /api/workshops/:wid', () => {
  it('a wrong or missing name is 400 naming confirmName, and nothing is deleted', async () => {
    const ws = await newWorkshop(owner, 'Keep Me');
    const before = await countRows(ws.id);
    const wrong = await owner.delete(`/api/workshops/${ws.id}`).send({ confirmName: 'keep me' }).expect(400);
    expect(wrong.body.error.code).toBe('invalid_input');
    expect(Object.keys(wrong.body.error.fields)).toEqual(['confirmName']);
    expect(wrong.body.error.message).toContain('"Keep Me"');
    const missing = await owner.delete(`/api/workshops/${ws.id}`).expect(400);
    expect(Object.keys(missing.body.error.fields)).toEqual(['confirmName']);
    expect(await countRows(ws.id)).toEqual(before);
  });

  it('removes every row of that workshop and its stored files in one go, and nothing of another workshop', async () => {
    const doomed = await newWorkshop(owner, 'Closing Down Workshop');
    // The demo maker belongs to it too: they simply lose it from their list.
    const em = t.orm.em.fork();
    const makerUser = await em.findOneOrFail(User, { email: DEMO.maker });
    em.create(Membership, { user: makerUser, workshop: doomed.id, role: 'maker' });
    await em.flush();
    await fillWorkshop(owner, doomed.id);
    await fillWorkshop(owner, demoId);

    const doomedBefore = await countRows(doomed.id);
    const keptBefore = await countRows(demoId);
    // Every table holds rows of both, so "nothing else" is a real check.
    for (const [table, n] of Object.entries(doomedBefore)) expect(n, `${table} of the doomed workshop`).toBeGreaterThan(0);
    for (const [table, n] of Object.entries(keptBefore)) expect(n, `${table} of the demo workshop`).toBeGreaterThan(0);
    const users = await t.orm.em.fork().count(User, {});
    const filesBefore = storage.size;
    const doomedKeys = (await t.orm.em.fork().getConnection().execute<{ storage_key: string }[]>('select storage_key from uploads where workshop_id = ?', [doomed.id])).map((r) => r.storage_key);
    expect(doomedKeys.length).toBe(1);
    expect(await storage.get(doomedKeys[0]!)).not.toBeNull();

    await owner.delete(`/api/workshops/${doomed.id}`).send({ confirmName: 'Closing Down Workshop' }).expect(204);

    const doomedAfter = await countRows(doomed.id);
    expect(doomedAfter).toEqual(Object.fromEntries(Object.keys(doomedBefore).map((k) => [k, 0])));
    expect(await countRows(demoId)).toEqual(keptBefore);
    expect(await t.orm.em.fork().count(User, {})).toBe(users);
    expect(await storage.get(doomedKeys[0]!)).toBeNull();
    expect(storage.size).toBe(filesBefore - 1);

    const me = await maker.get('/api/auth/me').expect(200);
    expect(me.body.memberships.map((m: { workshopId: number }) => m.workshopId)).not.toContain(doomed.id);
    expect(me.body.memberships.map((m: { workshopId: number }) => m.workshopId)).toContain(demoId);
    await maker.get(`/api/workshops/${doomed.id}`).expect(403);
    await owner.get(`/api/workshops/${doomed.id}/designs`).expect(403);
  });

  it('only an owner may delete it (403 for the other roles, the workshop stays)', async () => {
    for (const role of ['designer', 'maker', 'viewer'] as const) {
      const agent = await signIn(t.app, DEMO[role]);
      await agent.delete(`/api/workshops/${demoId}`).send({ confirmName: 'Harbour Lane Audio' }).expect(403);
    }
    expect((await countRows(demoId)).workshops).toBe(1);
  });
});

describe('DELETE /api/workshops/:wid when the file storage fails', () => {
  it('the rows are gone all the same (the commit came first); the file left behind is logged, not a 500', async () => {
    class StuckStorage extends MemoryStorage {
      override async delete(): Promise<void> {
        throw new Error('disk is read-only');
      }
    }
    const stuck = new StuckStorage();
    const t2 = await buildTestApp({ deps: { storage: stuck } });
    try {
      const { agent, workshopId } = await signUp(t2.app, 'closing@elsewhere.test', 'Short Lived');
      await agent.post(`/api/workshops/${workshopId}/uploads/drivers-csv`).attach('file', Buffer.from(DRIVERS_CSV), 'drivers.csv').expect(201);
      expect(stuck.size).toBe(1);
      await agent.delete(`/api/workshops/${workshopId}`).send({ confirmName: 'Short Lived' }).expect(204);
      expect(await t2.orm.em.fork().count(Workshop, { id: workshopId })).toBe(0);
      expect(t2.logged.some((line) => line.includes('could not remove the stored file') && line.includes('disk is read-only'))).toBe(true);
    } finally {
      await t2.close();
    }
  });
});
