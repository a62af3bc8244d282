/**
 * Helpers for tests of builds, cut plans, nest jobs and exports: demo ids, stock added through the stock
 * service, a cut plan made in-process (prepare → the engine on this thread → save, as the worker would),
 * and polling a nest job.
 */
import { performance } from 'node:perf_hooks';
import { nest } from '../../shared/nesting/index.js';
import type { CutPlanSettingsInput, NestJobDto, StockInput } from '../../shared/schemas/api.schema.js';
import { Build } from '../../server/modules/builds/build.entity.js';
import { CutPlansService } from '../../server/modules/cut-plans/cut-plans.service.js';
import { StockService } from '../../server/modules/stock/stock.service.js';
import { DEMO_BUILD_NAME } from '../../server/seed.js';
import { buildTestApp, DEMO, signIn, type Agent, type TestApp } from './helpers.js';

/** The stock of PRODUCT.md §9: 18 mm MDF sheets 2440 × 1220 and a 1200 mm roll of 50 mm polyester batt. */
export const DEMO_SHEET: StockInput = { kind: 'sheet', material: 'MDF', thicknessMm: 18, widthMm: 2440, heightMm: 1220, quantity: null, cost: 42, grain: 'none' };
/** The floorstander's 25 mm baffle needs its own sheet. */
export const BAFFLE_SHEET: StockInput = { kind: 'sheet', material: 'MDF', thicknessMm: 25, widthMm: 2440, heightMm: 1220, quantity: null, cost: 58, grain: 'none' };
export const DEMO_ROLL: StockInput = { kind: 'roll', material: 'Polyester batt', thicknessMm: 50, widthMm: 1200, lengthMm: null, quantity: null, cost: 6.5, grain: 'none' };

/** A small raw nest job (30 parts of 300 × 200 on 1000 × 1000 sheets) that finishes within its 300 ms. */
export const SMALL_RAW_JOB = {
  kerf: 3,
  mode: 'guillotine',
  timeLimitMs: 300,
  stock: [{ id: 'board', kind: 'sheet', width: 1000, height: 1000 }],
  parts: [{ id: 'shelf', width: 300, height: 200, quantity: 30 }],
};

export async function demoWorkshopId(agent: Agent): Promise<number> {
  const me = await agent.get('/api/auth/me').expect(200);
  return me.body.memberships[0].workshopId as number;
}

export async function demoBuildId(t: TestApp, workshopId: number): Promise<number> {
  const build = await t.orm.em.fork().findOneOrFail(Build, { workshop: workshopId, name: DEMO_BUILD_NAME });
  return build.id;
}

/** Adds stock items through the stock service; returns their ids. */
export async function addStock(t: TestApp, workshopId: number, items: StockInput[]): Promise<number[]> {
  const service = new StockService(t.orm.em.fork());
  const ids: number[] = [];
  for (const item of items) ids.push((await service.create(workshopId, item, DEMO.owner)).id);
  return ids;
}

/** Makes and saves a cut plan without the worker pool (same steps as a nest job). */
export async function makeCutPlan(t: TestApp, workshopId: number, buildId: number, settings: CutPlanSettingsInput, byEmail: string = DEMO.maker): Promise<number> {
  const service = new CutPlansService(t.orm.em.fork());
  const prepared = await service.prepare(workshopId, buildId, settings);
  const layouts = prepared.groups.flatMap((g) => (g.job ? [nest(g.job, { now: () => performance.now() })] : []));
  return (await service.save(t.orm.em.fork(), prepared, layouts, byEmail)).id;
}

/** Polls a nest job until `until` holds (every 40 ms); returns every state seen. */
export async function pollJob(agent: Agent, workshopId: number, id: string, until: (d: NestJobDto) => boolean, timeoutMs = 45_000): Promise<NestJobDto[]> {
  const seen: NestJobDto[] = [];
  const end = Date.now() + timeoutMs;
  for (;;) {
    const res = await agent.get(`/api/workshops/${workshopId}/nest-jobs/${id}`);
    if (res.status !== 200) throw new Error(`GET nest job: ${res.status} ${JSON.stringify(res.body)}`);
    seen.push(res.body as NestJobDto);
    if (until(res.body as NestJobDto)) return seen;
    if (Date.now() > end) throw new Error(`nest job ${id} still ${(res.body as NestJobDto).status} after ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 40));
  }
}

export const finished = (d: NestJobDto) => d.status === 'done' || d.status === 'failed' || d.status === 'cancelled';

export interface DemoPlanSetup {
  t: TestApp;
  maker: Agent;
  viewer: Agent;
  workshopId: number;
  buildId: number;
  /** The demo stock added to the room: 18 mm sheet, 25 mm sheet, lining roll. */
  stockIds: number[];
}

/** A test app with the maker and viewer signed in, the demo build, and the demo stock added (ids known). */
export async function demoPlanSetup(): Promise<DemoPlanSetup> {
  const t = await buildTestApp();
  const maker = await signIn(t.app, DEMO.maker);
  const viewer = await signIn(t.app, DEMO.viewer);
  const workshopId = await demoWorkshopId(maker);
  const buildId = await demoBuildId(t, workshopId);
  const stockIds = await addStock(t, workshopId, [DEMO_SHEET, BAFFLE_SHEET, DEMO_ROLL]);
  return { t, maker, viewer, workshopId, buildId, stockIds };
}
