/**
 * Builds over HTTP: the demo build of PRODUCT.md §9, create/update/delete with errors naming the field,
 * optimistic locking (409, RFC 9110 §15.5.10), and the mirrored pair: the mirror image across the box's
 * vertical centre plane (x → W − x, left ↔ right), checked on a design with a side terminal and an
 * off-centre tweeter.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { planDesign } from '../../shared/cabinet/index.js';
import { DEMO_BOOKSHELF } from '../../shared/demo/designs.js';
import type { BuildDto, CutPlanDto } from '../../shared/schemas/api.schema.js';
import type { DesignInput } from '../../shared/schemas/design.schema.js';
import { mirrorDesign } from '../../server/modules/builds/mirror.js';
import { CutPlan } from '../../server/modules/cut-plans/cut-plan.entity.js';
import { DEMO_BUILD_NAME } from '../../server/seed.js';
import { addStock, BAFFLE_SHEET, DEMO_ROLL, DEMO_SHEET, demoWorkshopId, makeCutPlan } from './cut-plans.helpers.js';
import { buildTestApp, DEMO, signIn, type Agent, type TestApp } from './helpers.js';

let t: TestApp;
let designer: Agent;
let workshopId: number;
let designIds: number[];

beforeAll(async () => {
  t = await buildTestApp();
  designer = await signIn(t.app, DEMO.designer);
  workshopId = await demoWorkshopId(designer);
  const designs = await designer.get(`/api/workshops/${workshopId}/designs`).expect(200);
  designIds = (designs.body.items as { id: number; name: string }[]).sort((a, b) => a.id - b.id).map((d) => d.id);
});
afterAll(async () => t.close());

const path = (id?: number) => `/api/workshops/${workshopId}/builds${id ? `/${id}` : ''}`;

/** The bookshelf with a terminal on the left side and the tweeter 30 mm left of centre: not symmetric. */
const ASYMMETRIC: DesignInput = {
  ...DEMO_BOOKSHELF,
  name: 'Asymmetric bookshelf',
  openings: [
    ...DEMO_BOOKSHELF.openings!.filter((o) => o.type !== 'terminal').map((o) => (o.type === 'driver' && o.y === 285 ? { ...o, x: 80 } : o)),
    { type: 'terminal', face: 'left', z: 200, y: 80, width: 50, height: 50 },
  ],
};

describe('demo build', () => {
  it('is seeded: the bookshelf pair as mirror images and four floorstanders', async () => {
    const res = await designer.get(path()).expect(200);
    const demo = (res.body.items as BuildDto[]).find((b) => b.name === DEMO_BUILD_NAME)!;
    expect(demo.items).toEqual([
      { designId: designIds[0], designName: 'Harbour bookshelf (two-way, rear port)', quantity: 2, mirroredPair: true },
      { designId: designIds[1], designName: 'Harbour slim floorstander', quantity: 4, mirroredPair: false },
    ]);
    expect(demo.cabinetCount).toBe(6);
    expect(demo.cutPlanCount).toBe(0);
    expect(demo.latestCutPlanId).toBeNull();
  });
});

describe('create, update, delete', () => {
  it('creates a build, reads it back and saves a new version', async () => {
    const created = await designer.post(path()).send({ name: ' Workshop pair ', items: [{ designId: designIds[0], quantity: 2 }] }).expect(201);
    expect(created.body).toMatchObject({ name: 'Workshop pair', notes: '', cabinetCount: 2, version: 1, updatedBy: DEMO.designer });
    expect(created.body.items[0].mirroredPair).toBe(false);
    const id = created.body.id as number;
    await designer.get(path(id)).expect(200);
    const saved = await designer
      .put(path(id))
      .send({ version: 1, build: { name: 'Workshop pair', notes: 'for the fair', items: [{ designId: designIds[0], quantity: 4, mirroredPair: true }] } })
      .expect(200);
    expect(saved.body).toMatchObject({ version: 2, notes: 'for the fair', cabinetCount: 4 });
    // A second save with the version first loaded was edited elsewhere: 409.
    const stale = await designer.put(path(id)).send({ version: 1, build: { name: 'Old', items: [{ designId: designIds[0], quantity: 2 }] } }).expect(409);
    expect(stale.body.error.code).toBe('edited_elsewhere');
  });

  it('names the field of every mistake', async () => {
    const odd = await designer.post(path()).send({ name: 'Odd', items: [{ designId: designIds[0], quantity: 3, mirroredPair: true }] }).expect(400);
    expect(odd.body.error.fields['items[0].quantity']).toBe('a mirrored pair needs an even quantity (a pair is 2)');
    const empty = await designer.post(path()).send({ name: '', items: [] }).expect(400);
    expect(empty.body.error.fields.name).toBe('name is required');
    expect(empty.body.error.fields.items).toBe('add at least one design');
    const twice = await designer.post(path()).send({ name: 'Twice', items: [{ designId: designIds[0], quantity: 1 }, { designId: designIds[0], quantity: 2 }] }).expect(400);
    expect(twice.body.error.fields['items[1].designId']).toBe('this design is already in the build');
    const unknown = await designer.post(path()).send({ name: 'Unknown', items: [{ designId: 999999, quantity: 1 }] }).expect(400);
    expect(unknown.body.error.fields['items[0].designId']).toBe('no such design in this workshop');
    const zero = await designer.post(path()).send({ name: 'Zero', items: [{ designId: designIds[0], quantity: 0 }] }).expect(400);
    expect(zero.body.error.fields['items[0].quantity']).toBe('quantity must be at least 1');
    // Update errors use the same paths as create.
    const created = await designer.post(path()).send({ name: 'To edit', items: [{ designId: designIds[0], quantity: 1 }] }).expect(201);
    const bad = await designer.put(path(created.body.id)).send({ version: 1, build: { name: 'To edit', items: [{ designId: designIds[0], quantity: -1 }] } }).expect(400);
    expect(bad.body.error.fields['items[0].quantity']).toBeDefined();
  });

  it('deletes a build with its cut plans; unknown ids are 404', async () => {
    const created = await designer.post(path()).send({ name: 'Short-lived', items: [{ designId: designIds[0], quantity: 2 }] }).expect(201);
    const id = created.body.id as number;
    await makeCutPlan(t, workshopId, id, { typedStock: [DEMO_SHEET, DEMO_ROLL], timeLimitMs: 200 });
    expect(await t.orm.em.fork().count(CutPlan, { build: id })).toBe(1);
    await designer.delete(path(id)).expect(204);
    expect(await t.orm.em.fork().count(CutPlan, { build: id })).toBe(0);
    await designer.get(path(id)).expect(404);
    await designer.get(path(999999)).expect(404);
    await designer.get(`/api/workshops/${workshopId}/builds/abc`).expect(404);
  });

  it('a build whose design was deleted shows it and cannot be planned until edited', async () => {
    const d = await designer.post(`/api/workshops/${workshopId}/designs`).send({ ...DEMO_BOOKSHELF, name: 'Soon gone' }).expect(201);
    const b = await designer.post(path()).send({ name: 'Orphan', items: [{ designId: d.body.id, quantity: 1 }] }).expect(201);
    await designer.delete(`/api/workshops/${workshopId}/designs/${d.body.id}`).expect(204);
    const read = await designer.get(path(b.body.id)).expect(200);
    expect(read.body.items[0].designName).toBeNull();
    const job = await designer.post(`/api/workshops/${workshopId}/nest-jobs`).send({ buildId: b.body.id, settings: { typedStock: [DEMO_SHEET] } }).expect(400);
    expect(job.body.error.fields['items[0].designId']).toBe('this design was deleted; edit the build');
  });
});

describe('mirrored pair', () => {
  it('mirrors openings across the vertical centre plane: left ↔ right, x → W − x', () => {
    const planned = planDesign(ASYMMETRIC);
    if (!planned.ok) throw new Error(planned.message);
    const m = mirrorDesign(planned.design);
    const W = planned.design.outer.width;
    const terminal = m.openings.find((o) => o.type === 'terminal')!;
    expect(terminal.face).toBe('right');
    expect(terminal.z).toBe(200);
    const tweeter = m.openings.find((o) => o.type === 'driver' && o.y === 285)!;
    expect(tweeter.x).toBe(W - 80);
    const port = m.openings.find((o) => o.type === 'port')!;
    expect(port.x).toBe(W - 110);
    const brace = m.braces[0]!;
    if (brace.type !== 'shelf') throw new Error('shelf brace expected');
    expect(brace.windows[0]!.u).toBe(W - 110);
    // Mirroring twice gives the design back.
    expect(mirrorDesign(m)).toEqual(planned.design);
  });

  it('lists parts that differ once per side ("… (mirrored)") and shared parts once for both cabinets', async () => {
    const d = await designer.post(`/api/workshops/${workshopId}/designs`).send(ASYMMETRIC).expect(201);
    const b = await designer.post(path()).send({ name: 'Asymmetric pair', items: [{ designId: d.body.id, quantity: 2, mirroredPair: true }] }).expect(201);
    const stockIds = await addStock(t, workshopId, [DEMO_SHEET, BAFFLE_SHEET, DEMO_ROLL]);
    const planId = await makeCutPlan(t, workshopId, b.body.id, { stockIds, timeLimitMs: 300 });
    const plan = (await designer.get(`/api/workshops/${workshopId}/cut-plans/${planId}`).expect(200)).body as CutPlanDto;
    const panels = plan.parts.filter((p) => p.kind === 'panel').map((p) => `${p.name} ×${p.quantity}`);
    // Same size and holes on both cabinets: once for 2. Different holes: once per side.
    expect(panels).toEqual(expect.arrayContaining(['Back ×2', 'Top ×2', 'Bottom ×2', 'Shelf brace 1 ×2', 'Front (baffle) ×1', 'Front (baffle) (mirrored) ×1', 'Left side ×1', 'Right side ×1', 'Left side (mirrored) ×1', 'Right side (mirrored) ×1']));
    expect(panels).toHaveLength(10);
    expect(plan.cabinets).toEqual([{ name: 'Asymmetric bookshelf', designId: d.body.id, count: 2, mirrored: true }]);
    // The lining of the side with the terminal has a hole; the mirror image has it on the other side.
    const lining = plan.parts.filter((p) => p.kind === 'lining').map((p) => p.name);
    expect(lining.some((n) => n.startsWith('Left side lining') && !n.endsWith('(mirrored)'))).toBe(true);
    expect(lining.some((n) => n.startsWith('Right side lining') && n.endsWith('(mirrored)'))).toBe(true);
    expect(plan.totals.partsUnplaced).toBe(0);
  });
});
