/**
 * The build checklist of a cut plan: one row per piece (panel or lining piece) of every cabinet; makers and
 * owners tick (PRODUCT.md §2: "maker … tick parts cut"), designers and viewers may not (403, RFC 9110 §15.5.4).
 * Marking a sheet cut takes it from the stock room and keeps the plan's offcuts as remnants (PRODUCT.md §6).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ChecklistDto, CutPlanDto, StockItemDto } from '../../shared/schemas/api.schema.js';
import { addStock, demoBuildId, demoWorkshopId, makeCutPlan } from './cut-plans.helpers.js';
import { buildTestApp, DEMO, signIn, type Agent, type TestApp } from './helpers.js';

let t: TestApp;
let maker: Agent;
let wid: number;
let planId: number;
let sheetStockId: number;
let rollStockId: number;

beforeAll(async () => {
  t = await buildTestApp();
  maker = await signIn(t.app, DEMO.maker);
  wid = await demoWorkshopId(maker);
  const ids = await addStock(t, wid, [
    { kind: 'sheet', material: 'MDF', thicknessMm: 18, widthMm: 2440, heightMm: 1220, quantity: 10, cost: 40, grain: 'none' },
    { kind: 'sheet', material: 'MDF', thicknessMm: 25, widthMm: 2440, heightMm: 1220, quantity: 4, cost: 55, grain: 'none' },
    { kind: 'roll', material: 'Polyester batt', thicknessMm: 50, widthMm: 1200, lengthMm: 30_000, quantity: 1, cost: 6, grain: 'none' },
  ]);
  [sheetStockId, , rollStockId] = ids as [number, number, number];
  planId = await makeCutPlan(t, wid, await demoBuildId(t, wid), { stockIds: ids, timeLimitMs: 400, minOffcutMm: 150 });
});
afterAll(async () => t.close());

const checklist = async (agent: Agent = maker): Promise<ChecklistDto> => (await agent.get(`/api/workshops/${wid}/cut-plans/${planId}/checklist`).expect(200)).body;
const tick = (agent: Agent, body: object) => agent.post(`/api/workshops/${wid}/cut-plans/${planId}/checklist/ticks`).send(body);
const stockItem = async (id: number): Promise<StockItemDto | undefined> =>
  ((await maker.get(`/api/workshops/${wid}/stock`).expect(200)).body.items as StockItemDto[]).find((s) => s.id === id);

describe('build checklist', () => {
  it('lists one row per piece of every panel and lining piece of the build', async () => {
    const list = await checklist();
    const plan: CutPlanDto = (await maker.get(`/api/workshops/${wid}/cut-plans/${planId}`).expect(200)).body;
    // Pieces per design from the cabinet engine's own plan JSON (PRODUCT.md §8: quantities count one cabinet) × cabinets built.
    let expected = 0;
    for (const cabinet of plan.cabinets) {
      const one = (await maker.get(`/api/workshops/${wid}/designs/${cabinet.designId}/plan`).expect(200)).body;
      const perCabinet = one.panels.reduce((n: number, p: { quantity: number }) => n + p.quantity, 0) + one.liningPieces.reduce((n: number, p: { quantity: number }) => n + p.quantity, 0);
      expected += perCabinet * cabinet.count;
    }
    expect(list.parts.length).toBe(expected);
    expect(list.total).toEqual({ label: 'All pieces', done: 0, total: expected });
    expect(new Set(list.parts.map((p) => p.key)).size).toBe(expected);
    expect(list.parts.some((p) => p.kind === 'lining')).toBe(true);
    expect(list.cabinets.reduce((n, c) => n + c.total, 0)).toBe(expected);
    expect(list.sheets.length).toBe(plan.groups.reduce((n, g) => n + g.layout.sheets.length, 0));
  });

  it('names every sheet as the cut plan and its printed diagrams do: sheets and remnants 1, 2… across materials, rolls 1…', async () => {
    const list = await checklist();
    const plan: CutPlanDto = (await maker.get(`/api/workshops/${wid}/cut-plans/${planId}`).expect(200)).body;
    // The numbering of the cut-diagram PDF (DEVELOPERS.md "Drawing and exports": sheets and remnants are numbered
    // 1, 2…, rolls roll 1…), counted here from the plan's own layouts in order.
    const expected: string[] = [];
    let boards = 0;
    let rolls = 0;
    for (const group of plan.groups) {
      for (const sheet of group.layout.sheets) {
        const kind = plan.stock.find((s) => s.id === sheet.stockId)?.kind ?? 'sheet';
        expected.push(kind === 'roll' ? `Roll ${++rolls}` : `${kind === 'remnant' ? 'Remnant' : 'Sheet'} ${++boards}`);
      }
    }
    expect(list.sheets.map((s) => s.label)).toEqual(expected);
    // The 25 mm baffles' sheet comes after the 18 mm sheets, so it is not "Sheet 1" a second time.
    const boardsLabels = list.sheets.filter((s) => s.stockKind !== 'roll').map((s) => s.label);
    expect(new Set(boardsLabels).size).toBe(boardsLabels.length);
    // Ticks keep their per-material keys, so marks made before this naming stay on the same sheet.
    expect(list.sheets.every((s) => s.key.endsWith(`/${s.index}`))).toBe(true);
  });

  it('a maker ticks a piece (200, who and when recorded); a viewer or designer may not (403)', async () => {
    const before = await checklist();
    const piece = before.parts[0]!;
    const viewer = await signIn(t.app, DEMO.viewer);
    expect((await tick(viewer, { item: 'part', key: piece.key, cut: true })).status).toBe(403);
    const designer = await signIn(t.app, DEMO.designer);
    expect((await tick(designer, { item: 'part', key: piece.key, cut: true })).status).toBe(403);
    // The viewer still reads the checklist.
    expect((await checklist(viewer)).total.done).toBe(0);

    const t0 = Date.now();
    const res = await tick(maker, { item: 'part', key: piece.key, cut: true });
    expect(res.status).toBe(200);
    const after: ChecklistDto = res.body;
    const row = after.parts.find((p) => p.key === piece.key)!;
    expect(row.cut?.by).toBe(DEMO.maker);
    expect(Date.parse(row.cut!.at)).toBeGreaterThanOrEqual(t0 - 1000);
    expect(after.total.done).toBe(1);
    expect(after.cabinets.find((c) => c.label === piece.cabinet)!.done).toBe(1);
    // Ticking again changes nothing; un-ticking clears it.
    expect((await tick(maker, { item: 'part', key: piece.key, cut: true })).body.total.done).toBe(1);
    expect((await tick(maker, { item: 'part', key: piece.key, cut: false })).body.total.done).toBe(0);
    const owner = await signIn(t.app, DEMO.owner);
    expect((await tick(owner, { item: 'part', key: piece.key, cut: true })).body.parts.find((p: { key: string }) => p.key === piece.key).cut.by).toBe(DEMO.owner);

    const history = await maker.get(`/api/workshops/${wid}/history/plan/${planId}`).expect(200);
    expect(history.body.items.map((e: { action: string; actorEmail: string }) => [e.action, e.actorEmail]).slice(0, 3)).toEqual([
      ['cut', DEMO.owner],
      ['uncut', DEMO.maker],
      ['cut', DEMO.maker],
    ]);
  });

  it('marking a sheet cut takes it from stock and keeps its offcuts as remnants; un-ticking puts it back', async () => {
    const list = await checklist();
    const sheet = list.sheets.find((s) => s.stockKind === 'sheet' && s.offcuts.length > 0 && s.groupLabel.includes('18'))!;
    expect(sheet).toBeDefined();
    expect((await stockItem(sheetStockId))!.quantity).toBe(10);
    const roomBefore = (await maker.get(`/api/workshops/${wid}/stock`).expect(200)).body.items as StockItemDto[];

    await tick(maker, { item: 'sheet', key: sheet.key, cut: true }).expect(200);
    expect((await stockItem(sheetStockId))!.quantity).toBe(9);
    const roomAfter = (await maker.get(`/api/workshops/${wid}/stock`).expect(200)).body.items as StockItemDto[];
    const added = roomAfter.filter((s) => !roomBefore.some((b) => b.id === s.id));
    expect(added.map((r) => [r.kind, r.material, r.thicknessMm, r.widthMm, r.heightMm, r.quantity, r.fromPlanId]).sort()).toEqual(
      sheet.offcuts.map((o) => ['remnant', 'MDF', 18, o.widthMm, o.heightMm, 1, planId]).sort(),
    );

    await tick(maker, { item: 'sheet', key: sheet.key, cut: false }).expect(200);
    expect((await stockItem(sheetStockId))!.quantity).toBe(10);
    const roomBack = (await maker.get(`/api/workshops/${wid}/stock`).expect(200)).body.items as StockItemDto[];
    expect(roomBack.map((s) => s.id).sort()).toEqual(roomBefore.map((s) => s.id).sort());
  });

  it('marking a roll length cut shortens the roll by the length used', async () => {
    const list = await checklist();
    const roll = list.sheets.find((s) => s.stockKind === 'roll')!;
    await tick(maker, { item: 'sheet', key: roll.key, cut: true }).expect(200);
    expect((await stockItem(rollStockId))!.lengthMm).toBeCloseTo(30_000 - roll.heightMm, 6);
  });

  it('an unknown piece or a bad body is a field error', async () => {
    const res = await tick(maker, { item: 'part', key: 'part:nothing#1', cut: true });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ key: 'no such piece in this cut plan' });
    const bad = await tick(maker, { item: 'board', key: '', cut: 'yes' });
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['cut', 'item', 'key']);
  });
});
