/**
 * Nest jobs over HTTP: 202 and a job id, progress read back while the worker thread searches, the result
 * checked with the independent layout validator (shared/nesting/validate.ts), cancelling (queued and
 * running), errors naming the field, and the API answering while a job runs.
 * HTTP semantics: 202 Accepted (RFC 9110 §15.3.3), 404 (§15.5.5).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseNestJob, validateLayout } from '../../shared/nesting/index.js';
import type { CutPlanDto, NestJobDto } from '../../shared/schemas/api.schema.js';
import { groupJobs } from '../../server/modules/cut-plans/assemble.js';
import { CutPlan } from '../../server/modules/cut-plans/cut-plan.entity.js';
import { closeNestPool } from '../../server/workers/pool.js';
import { demoPlanSetup, finished, pollJob, SMALL_RAW_JOB } from './cut-plans.helpers.js';
import { DEMO, signUp, type Agent, type TestApp } from './helpers.js';

let t: TestApp;
let maker: Agent;
let viewer: Agent;
let workshopId: number;
let buildId: number;
let stockIds: number[];

beforeAll(async () => {
  ({ t, maker, viewer, workshopId, buildId, stockIds } = await demoPlanSetup());
});
afterAll(async () => {
  await closeNestPool();
  await t.close();
});

const jobsPath = () => `/api/workshops/${workshopId}/nest-jobs`;


describe('nest job for a build', () => {
  let seen: NestJobDto[];
  let plan: CutPlanDto;

  beforeAll(async () => {
    const res = await maker.post(jobsPath()).send({ buildId, settings: { stockIds, timeLimitMs: 2500 } });
    expect(res.status, JSON.stringify(res.body)).toBe(202);
    expect(res.headers.location).toBe(`${jobsPath()}/${res.body.id}`);
    expect(res.body.status).toBe('queued');
    seen = [res.body, ...(await pollJob(maker, workshopId, res.body.id, finished))];
    const last = seen.at(-1)!;
    expect(last.status, JSON.stringify(last.error)).toBe('done');
    plan = (await maker.get(`/api/workshops/${workshopId}/cut-plans/${last.result!.cutPlanId}`).expect(200)).body;
  });

  it('reports progress that only moves forward, with states in order queued → running → done', () => {
    const fractions = seen.map((s) => s.progress);
    for (let i = 1; i < fractions.length; i++) expect(fractions[i]!).toBeGreaterThanOrEqual(fractions[i - 1]!);
    expect(seen.some((s) => s.status === 'running' && s.progress > 0 && s.progress < 1), 'a reading between 0 and 1 while running').toBe(true);
    expect(seen.at(-1)!.progress).toBe(1);
    const order = ['queued', 'running', 'done'];
    const ranks = seen.map((s) => order.indexOf(s.status));
    expect(ranks.every((r, i) => r >= 0 && (i === 0 || r >= ranks[i - 1]!))).toBe(true);
  });

  it('returns layouts that the independent validator accepts, one per material group', () => {
    const result = seen.at(-1)!.result!;
    expect(result.layouts).toHaveLength(plan.groups.length);
    const jobs = groupJobs(plan.parts, plan.stock, plan.settings);
    expect(plan.groups.map((g) => g.label)).toEqual(['MDF 18 mm', 'MDF 25 mm', 'Polyester batt 50 mm']);
    plan.groups.forEach((g, i) => {
      expect(jobs[i]!.meta.key).toBe(g.key);
      expect(validateLayout(jobs[i]!.job!, g.layout)).toEqual([]);
      expect(result.layouts[i]).toEqual(g.layout);
    });
  });

  it('places every part of the build and never uses fewer sheets than the continuous lower bound', () => {
    // Continuous bound L0 = ceil(total part area / sheet area) (Martello & Vigo 1998, REFERENCES.md §10).
    const panels = plan.groups.find((g) => g.key === 'mdf|18')!;
    const partArea = plan.parts.filter((p) => p.kind === 'panel' && p.thicknessMm === 18).reduce((a, p) => a + p.widthMm * p.heightMm * p.quantity, 0);
    const usable = (2440 - 20) * (1220 - 20);
    expect(panels.layout.sheets.length).toBeGreaterThanOrEqual(Math.ceil(partArea / usable));
    expect(plan.totals.partsUnplaced).toBe(0);
    expect(plan.totals.partsPlaced).toBe(plan.parts.reduce((n, p) => n + p.quantity, 0));
    expect(seen.at(-1)!.bestSheets).toBe(plan.groups.reduce((n, g) => n + g.layout.sheets.length, 0));
  });

  it('saves the plan with who made it', async () => {
    expect(plan.createdBy).toBe(DEMO.maker);
    expect(plan.buildId).toBe(buildId);
    expect(await t.orm.em.fork().count(CutPlan, { build: buildId })).toBeGreaterThanOrEqual(1);
  });
});

describe('raw nest job', () => {
  it('returns the layout of PRODUCT.md §8 without saving a cut plan', async () => {
    const before = await t.orm.em.fork().count(CutPlan, {});
    const res = await maker.post(jobsPath()).send({ job: SMALL_RAW_JOB }).expect(202);
    const last = (await pollJob(maker, workshopId, res.body.id, finished)).at(-1)!;
    expect(last.status).toBe('done');
    expect(last.result!.cutPlanId).toBeNull();
    const parsed = parseNestJob(SMALL_RAW_JOB);
    if (!parsed.ok) throw new Error(parsed.message);
    expect(validateLayout(parsed.job, last.result!.layouts[0]!)).toEqual([]);
    // 30 parts of 0.06 m² on 1 m² sheets: at least 2 sheets (continuous bound), and the layout says how many it used.
    expect(last.result!.layouts[0]!.stats.sheetsUsed).toBeGreaterThanOrEqual(2);
    expect(await t.orm.em.fork().count(CutPlan, {})).toBe(before);
  });

  it('rejects an invalid job with the field named under job.', async () => {
    const res = await maker.post(jobsPath()).send({ job: { ...SMALL_RAW_JOB, stock: [{ id: 'board', kind: 'sheet', width: -5, height: 1000 }] } }).expect(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(res.body.error.fields['job.stock[0].width']).toMatch(/greater than 0/);
  });

  it('needs either a build or a job', async () => {
    const res = await maker.post(jobsPath()).send({ settings: {} }).expect(400);
    expect(res.body.error.fields.buildId).toMatch(/either a buildId or a nest job/);
  });

  it('names bad settings under settings.', async () => {
    const res = await maker.post(jobsPath()).send({ buildId, settings: { kerfMm: -1, mode: 'laser', stockIds: [999999] } }).expect(400);
    expect(res.body.error.fields['settings.kerfMm']).toMatch(/0 or more/);
    expect(res.body.error.fields['settings.mode']).toMatch(/guillotine or free/);
  });

  it('names stock ids that are not in the stock room', async () => {
    const res = await maker.post(jobsPath()).send({ buildId, settings: { stockIds: [stockIds[0]!, 999999] } }).expect(400);
    expect(res.body.error.fields['settings.stockIds[1]']).toBe('no such item in the stock room');
  });

  it('an unknown build is named, not a 500', async () => {
    const res = await maker.post(jobsPath()).send({ buildId: 999999, settings: { stockIds } }).expect(400);
    expect(res.body.error.fields.buildId).toBe('no such build in this workshop');
  });
});

describe('cancelling', () => {
  it('stops a running job: it ends cancelled, saves no plan, and the API answers while it runs', async () => {
    const before = await t.orm.em.fork().count(CutPlan, { build: buildId });
    const res = await maker.post(jobsPath()).send({ buildId, settings: { stockIds, timeLimitMs: 30_000 } }).expect(202);
    const running = await pollJob(maker, workshopId, res.body.id, (d) => d.status === 'running' || finished(d));
    expect(running.at(-1)!.status).toBe('running');
    // The worker thread has the engine; the main thread still answers.
    await maker.get('/api/health').expect(200);
    await maker.get(`/api/workshops/${workshopId}/builds`).expect(200);
    const cancelled = await maker.post(`${jobsPath()}/${res.body.id}/cancel`).expect(200);
    expect(cancelled.body.status).toBe('cancelled');
    expect(cancelled.body.result).toBeNull();
    // Give the worker time to stop, then check nothing was saved and the state stayed cancelled.
    await new Promise((r) => setTimeout(r, 600));
    const after = await maker.get(`${jobsPath()}/${res.body.id}`).expect(200);
    expect(after.body.status).toBe('cancelled');
    expect(await t.orm.em.fork().count(CutPlan, { build: buildId })).toBe(before);
    // The pool is free again: a new job runs to the end.
    const next = await maker.post(jobsPath()).send({ job: SMALL_RAW_JOB }).expect(202);
    expect((await pollJob(maker, workshopId, next.body.id, finished)).at(-1)!.status).toBe('done');
  });

  it('drops a job that waits for a worker; cancelling twice changes nothing', async () => {
    const first = await maker.post(jobsPath()).send({ job: { ...SMALL_RAW_JOB, timeLimitMs: 20_000 } }).expect(202);
    const second = await maker.post(jobsPath()).send({ job: SMALL_RAW_JOB }).expect(202);
    const c2 = await maker.post(`${jobsPath()}/${second.body.id}/cancel`).expect(200);
    expect(c2.body.status).toBe('cancelled');
    const again = await maker.post(`${jobsPath()}/${second.body.id}/cancel`).expect(200);
    expect(again.body.status).toBe('cancelled');
    await maker.post(`${jobsPath()}/${first.body.id}/cancel`).expect(200);
    await new Promise((r) => setTimeout(r, 300));
    expect((await maker.get(`${jobsPath()}/${second.body.id}`).expect(200)).body.status).toBe('cancelled');
  });
});

describe('who may see a job', () => {
  it('a viewer reads progress but may not start or cancel', async () => {
    const res = await maker.post(jobsPath()).send({ job: SMALL_RAW_JOB }).expect(202);
    await viewer.get(`${jobsPath()}/${res.body.id}`).expect(200);
    await viewer.post(jobsPath()).send({ job: SMALL_RAW_JOB }).expect(403);
    await viewer.post(`${jobsPath()}/${res.body.id}/cancel`).expect(403);
    await pollJob(maker, workshopId, res.body.id, finished);
  });

  it("another workshop's job id is not found, and so is a malformed id", async () => {
    const res = await maker.post(jobsPath()).send({ job: SMALL_RAW_JOB }).expect(202);
    const other = await signUp(t.app, 'jobs@otherbench.test', 'Other Bench');
    await other.agent.get(`/api/workshops/${other.workshopId}/nest-jobs/${res.body.id}`).expect(404);
    await maker.get(`${jobsPath()}/not-a-job`).expect(404);
    await pollJob(maker, workshopId, res.body.id, finished);
  });
});
