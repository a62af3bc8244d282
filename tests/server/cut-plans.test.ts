/**
 * Cut plans: what a plan holds (parts, groups per material, stock snapshot), its totals checked by plain
 * arithmetic on the layouts, the warnings for parts no stock fits, grain, typed-in stock, and who may
 * read and delete plans. Layouts are checked with the independent validator (shared/nesting/validate.ts).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { planDesign } from '../../shared/cabinet/index.js';
import { DEMO_BOOKSHELF, DEMO_FLOORSTANDER } from '../../shared/demo/designs.js';
import { validateLayout } from '../../shared/nesting/index.js';
import type { CutPlanDto, StockInput } from '../../shared/schemas/api.schema.js';
import { groupJobs } from '../../server/modules/cut-plans/assemble.js';
import { BAFFLE_SHEET, DEMO_ROLL, DEMO_SHEET, demoPlanSetup, makeCutPlan } from './cut-plans.helpers.js';
import { signUp, type Agent, type TestApp } from './helpers.js';

let t: TestApp;
let maker: Agent;
let viewer: Agent;
let workshopId: number;
let buildId: number;
let stockIds: number[];
let plan: CutPlanDto;

beforeAll(async () => {
  ({ t, maker, viewer, workshopId, buildId, stockIds } = await demoPlanSetup());
  const id = await makeCutPlan(t, workshopId, buildId, { stockIds, timeLimitMs: 600 });
  plan = (await maker.get(`/api/workshops/${workshopId}/cut-plans/${id}`).expect(200)).body;
});
afterAll(async () => t.close());

const plansPath = (id?: number) => `/api/workshops/${workshopId}/cut-plans${id ? `/${id}` : ''}`;

function validAll(p: CutPlanDto): void {
  const jobs = groupJobs(p.parts, p.stock, p.settings);
  p.groups.forEach((g, i) => {
    if (jobs[i]!.job) expect(validateLayout(jobs[i]!.job!, g.layout), g.label).toEqual([]);
    else expect(g.layout.sheets).toEqual([]);
  });
}

describe('the demo build planned on the demo stock', () => {
  it('lists every panel and lining piece of the six cabinets, with quantities for the whole build', () => {
    const shelf = planDesign(DEMO_BOOKSHELF);
    const floor = planDesign(DEMO_FLOORSTANDER);
    if (!shelf.ok || !floor.ok) throw new Error('demo designs must plan');
    const count = (ps: { quantity: number }[]) => ps.reduce((n, p) => n + p.quantity, 0);
    const expected = 2 * count(shelf.plan.panels) + 4 * count(floor.plan.panels) + 2 * count(shelf.plan.liningPieces) + 4 * count(floor.plan.liningPieces);
    expect(count(plan.parts)).toBe(expected);
    expect(plan.parts.find((p) => p.name === 'Left side' && p.cabinet === 'Harbour slim floorstander')).toMatchObject({ widthMm: 257, heightMm: 1000, thicknessMm: 18, quantity: 4, grain: 'height', material: 'MDF' });
    expect(plan.cabinets.map((c) => [c.name, c.count, c.mirrored])).toEqual([
      ['Harbour bookshelf (two-way, rear port)', 2, true],
      ['Harbour slim floorstander', 4, false],
    ]);
  });

  it('nests each material and thickness on its own stock, lining on the roll, all valid', () => {
    expect(plan.groups.map((g) => [g.label, g.kind])).toEqual([
      ['MDF 18 mm', 'panels'],
      ['MDF 25 mm', 'panels'],
      ['Polyester batt 50 mm', 'lining'],
    ]);
    const stockOf = (id: string) => plan.stock.find((s) => s.id === id)!;
    for (const g of plan.groups) {
      for (const sheet of g.layout.sheets) {
        expect(g.stockIds).toContain(sheet.stockId);
        expect(stockOf(sheet.stockId).thicknessMm).toBe(g.thicknessMm);
      }
    }
    expect(plan.groups[2]!.layout.sheets.every((s) => s.kind === 'roll' && s.width === 1200)).toBe(true);
    validAll(plan);
    expect(plan.warnings).toEqual([]);
  });

  it('keeps the stock as it was (a snapshot with the stock room ids) and the settings with their defaults', () => {
    expect(plan.stock.map((s) => s.stockItemId)).toEqual(stockIds);
    expect(plan.stock[0]).toMatchObject({ id: `#${stockIds[0]}`, kind: 'sheet', material: 'MDF', thicknessMm: 18, widthMm: 2440, heightMm: 1220, trimMm: 10 });
    expect(plan.stock[2]).toMatchObject({ kind: 'roll', trimMm: 0 });
    // Kerf 3.2 mm: a common panel-saw blade (common practice); trim 10 mm; guillotine cuts.
    expect(plan.settings).toMatchObject({ kerfMm: 3.2, trimMm: 10, mode: 'guillotine', minOffcutMm: 200 });
    // Guillotine mode lists the numbered cut order on every sheet.
    for (const s of plan.groups[0]!.layout.sheets) {
      expect(s.cuts.length).toBeGreaterThan(0);
      expect(s.cuts.map((c) => c.order)).toEqual(s.cuts.map((_, i) => i + 1));
    }
  });

  it('totals add up from the layouts: sheets, roll length, cost, lining weight, utilisation', () => {
    const sheets = plan.groups.flatMap((g) => g.layout.sheets);
    const boards = sheets.filter((s) => s.kind !== 'roll');
    const rolls = sheets.filter((s) => s.kind === 'roll');
    expect(plan.totals.sheetsUsed).toBe(boards.length);
    const rollMm = rolls.reduce((a, s) => a + s.height, 0);
    expect(plan.totals.rollLengthMm).toBeCloseTo(rollMm, 6);
    const sheetCost = boards.reduce((a, s) => a + (s.stockId === `#${stockIds[0]}` ? 42 : 58), 0);
    expect(plan.totals.cost!).toBeCloseTo(sheetCost + (rollMm / 1000) * 6.5, 2);
    // Lining mass per cabinet from the cabinet engine, × cabinets.
    const shelf = planDesign(DEMO_BOOKSHELF);
    const floor = planDesign(DEMO_FLOORSTANDER);
    if (!shelf.ok || !floor.ok) throw new Error('demo designs must plan');
    // To 10 mg, so the page's 2-decimal figure rounds once, like the printout.
    expect(plan.totals.liningMassKg!).toBeCloseTo(2 * shelf.plan.lining!.massKg + 4 * floor.plan.lining!.massKg, 5);
    const partArea = sheets.reduce((a, s) => a + s.placements.reduce((b, p) => b + p.width * p.height, 0), 0);
    const stockArea = sheets.reduce((a, s) => a + s.width * s.height, 0);
    expect(plan.totals.utilisation).toBeCloseTo(partArea / stockArea, 9);
    const offcutArea = sheets.reduce((a, s) => a + (s.offcuts ?? []).reduce((b, o) => b + o.width * o.height, 0), 0);
    expect(plan.totals.wasteM2).toBeCloseTo((stockArea - partArea - offcutArea) / 1e6, 2);
  });

  it('records the fewest sheets any layout could use: at least the continuous bound, at most what it used', () => {
    // Continuous bound L0 = ⌈Σ part area / sheet area⌉ per material group (Martello & Vigo 1998, REFERENCES §10),
    // with parts and the usable sheet grown by one kerf as the engine cuts them (kerf 3.2, trim 10).
    const k = plan.settings.kerfMm;
    let l0 = 0;
    for (const g of plan.groups.filter((x) => x.kind === 'panels')) {
      const stock = plan.stock.find((s) => g.stockIds.includes(s.id))!;
      const usable = (stock.widthMm - 2 * stock.trimMm + k) * ((stock.heightMm ?? 0) - 2 * stock.trimMm + k);
      const area = g.layout.sheets.reduce((a, s) => a + s.placements.reduce((b, p) => b + (p.width + k) * (p.height + k), 0), 0);
      l0 += Math.ceil(area / usable - 1e-9);
    }
    expect(plan.totals.sheetsLowerBound).toBeGreaterThanOrEqual(l0);
    expect(plan.totals.sheetsLowerBound).toBeLessThanOrEqual(plan.totals.sheetsUsed);
  });

  it('is listed for its build, newest first, without the heavy parts', async () => {
    const second = await makeCutPlan(t, workshopId, buildId, { stockIds, timeLimitMs: 200, mode: 'free' });
    const list = await maker.get(`${plansPath()}?buildId=${buildId}`).expect(200);
    expect(list.body.items.map((p: { id: number }) => p.id).slice(0, 2)).toEqual([second, plan.id]);
    expect(list.body.items[0]).toMatchObject({ buildId, mode: 'free', buildName: 'Harbour Lane pair + floorstanders' });
    expect(list.body.items[0].groups).toBeUndefined();
    const build = await maker.get(`/api/workshops/${workshopId}/builds/${buildId}`).expect(200);
    expect(build.body.latestCutPlanId).toBe(second);
    await maker.get(`${plansPath()}?buildId=abc`).expect(400);
  });
});

describe('warnings', () => {
  it('a panel larger than every sheet in stock is not placed and named in a warning', async () => {
    const small: StockInput = { ...DEMO_SHEET, widthMm: 900, heightMm: 600 };
    const id = await makeCutPlan(t, workshopId, buildId, { typedStock: [small, BAFFLE_SHEET, DEMO_ROLL], timeLimitMs: 300 });
    const p = (await maker.get(plansPath(id)).expect(200)).body as CutPlanDto;
    const big = p.warnings.filter((w) => w.code === 'panel_larger_than_stock');
    // Floorstander sides, back are 1000 mm long: no 900 × 600 sheet (less 2 × 10 mm trim) holds them.
    expect(big.map((w) => w.message)).toEqual(expect.arrayContaining([expect.stringMatching(/^Left side \(Harbour slim floorstander, 257 × 1000 mm\) is larger than every sheet in stock/)]));
    expect(p.totals.partsUnplaced).toBeGreaterThan(0);
    expect(p.stock.every((s) => s.stockItemId === null && s.id.startsWith('typed '))).toBe(true);
    validAll(p);
  });

  it('parts with no stock of their material and thickness get one warning per group', async () => {
    const id = await makeCutPlan(t, workshopId, buildId, { typedStock: [DEMO_SHEET], timeLimitMs: 300 });
    const p = (await maker.get(plansPath(id)).expect(200)).body as CutPlanDto;
    expect(p.warnings.filter((w) => w.code === 'no_stock').map((w) => w.field)).toEqual(['mdf|25', 'lining|50']);
    expect(p.warnings.find((w) => w.field === 'lining|50')!.message).toMatch(/^No lining roll 50 mm thick in the stock chosen: \d+ lining pieces not placed/);
    expect(p.warnings.find((w) => w.field === 'mdf|25')!.message).toBe('No sheets of MDF 25 mm in the stock chosen: 4 panels not placed. Add sheets of this material and thickness.');
    expect(p.groups[2]!.layout.sheets).toEqual([]);
  });

  it('grain along the sheet length: every panel with grain lies along it', async () => {
    const grained: StockInput = { ...DEMO_SHEET, grain: 'length' };
    const id = await makeCutPlan(t, workshopId, buildId, { typedStock: [grained, { ...BAFFLE_SHEET, grain: 'length' }, DEMO_ROLL], timeLimitMs: 300 });
    const p = (await maker.get(plansPath(id)).expect(200)).body as CutPlanDto;
    validAll(p);
    const byId = new Map(p.parts.map((x) => [x.id, x]));
    for (const sheet of p.groups[0]!.layout.sheets) {
      // The 2440 mm length runs along x here: a part with grain along its height must be turned.
      for (const pl of sheet.placements) {
        const part = byId.get(pl.partId)!;
        if (part.grain === 'height') expect(pl.rotated).toBe(true);
        if (part.grain === 'width') expect(pl.rotated).toBe(false);
      }
    }
  });
});

describe('stock choice', () => {
  it('an empty stock room asks for typed-in stock', async () => {
    const other = await signUp(t.app, 'empty@otherbench.test', 'Empty Bench');
    const d = await other.agent.post(`/api/workshops/${other.workshopId}/designs`).send(DEMO_BOOKSHELF).expect(201);
    const b = await other.agent.post(`/api/workshops/${other.workshopId}/builds`).send({ name: 'Pair', items: [{ designId: d.body.id, quantity: 2 }] }).expect(201);
    const res = await other.agent.post(`/api/workshops/${other.workshopId}/nest-jobs`).send({ buildId: b.body.id, settings: {} }).expect(400);
    expect(res.body.error.fields['settings.typedStock']).toMatch(/stock room is empty/);
    const typed = await other.agent.post(`/api/workshops/${other.workshopId}/nest-jobs`).send({ buildId: b.body.id, settings: { typedStock: [{ ...DEMO_SHEET, widthMm: -1 }] } }).expect(400);
    expect(typed.body.error.fields['settings.typedStock[0].widthMm']).toMatch(/greater than 0/);
  });
});

describe('who may read and delete', () => {
  it('viewers read plans; another workshop gets 403; makers delete', async () => {
    await viewer.get(plansPath(plan.id)).expect(200);
    await viewer.get(plansPath()).expect(200);
    const other = await signUp(t.app, 'nosy@otherbench.test', 'Nosy Bench');
    await other.agent.get(plansPath(plan.id)).expect(403);
    await other.agent.get(`/api/workshops/${other.workshopId}/cut-plans/${plan.id}`).expect(404);
    const id = await makeCutPlan(t, workshopId, buildId, { stockIds, timeLimitMs: 200 });
    await viewer.delete(plansPath(id)).expect(403);
    // A plan with a share link and ticks on its checklist is deleted with them.
    await maker.post(`${plansPath(id)}/share-links`).send({}).expect(201);
    const checklist = await maker.get(`${plansPath(id)}/checklist`).expect(200);
    await maker.post(`${plansPath(id)}/checklist/ticks`).send({ item: 'part', key: checklist.body.parts[0].key, cut: true }).expect(200);
    await maker.delete(plansPath(id)).expect(204);
    await maker.get(plansPath(id)).expect(404);
  });
});
