/**
 * Deleting a workshop while its nest jobs are queued or running: the jobs are cancelled before the rows go, so
 * none tries to save a cut plan into the deleted workshop (no failed job, no error logged, no 500), and the
 * worker pool is free again for other workshops. 403 Forbidden (RFC 9110 §15.5.4) for a workshop one no longer
 * belongs to; 204 No Content (§15.3.5) for the delete.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { NestJobDto } from '../../shared/schemas/api.schema.js';
import { CutPlan } from '../../server/modules/cut-plans/cut-plan.entity.js';
import { CutPlansService } from '../../server/modules/cut-plans/cut-plans.service.js';
import { NestJobsService } from '../../server/modules/nest-jobs/nest-jobs.service.js';
import { WorkshopSettingsService } from '../../server/modules/workshops/workshop-settings.service.js';
import { Workshop } from '../../server/modules/workshops/workshop.entity.js';
import { MemoryStorage } from '../../server/storage/storage.js';
import { closeNestPool, NEST_THREADS } from '../../server/workers/pool.js';
import { demoPlanSetup, finished, pollJob, SMALL_RAW_JOB } from './cut-plans.helpers.js';
import { DEMO, signIn, signUp, type Agent, type TestApp } from './helpers.js';

/** A search time far longer than the test: only a cancel ends these jobs early. */
const LONG_MS = 60_000;

let t: TestApp;
let maker: Agent;
let owner: Agent;
let workshopId: number;
let buildId: number;
let stockIds: number[];

beforeAll(async () => {
  ({ t, maker, workshopId, buildId, stockIds } = await demoPlanSetup());
  owner = await signIn(t.app, DEMO.owner);
});
afterAll(async () => {
  await closeNestPool();
  await t.close();
});

/** Waits until `check` holds (every 40 ms), or fails naming `what`. */
async function until(what: string, check: () => boolean, timeoutMs = 20_000): Promise<void> {
  const end = Date.now() + timeoutMs;
  while (!check()) {
    if (Date.now() > end) throw new Error(`still waiting for ${what} after ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 40));
  }
}

describe('deleting a workshop with nest jobs in flight', () => {
  it('cancels its queued and running jobs first: they read back cancelled, save nothing, log no error; other workshops’ jobs run on', async () => {
    const own = await demoPlanSetup();
    try {
      const logged: string[] = [];
      const push = (...a: unknown[]) => void logged.push(a.map(String).join(' '));
      const logger = { info: () => {}, warn: push, error: push };
      // The two services as server/app.ts wires them, on a database of their own.
      const jobs = new NestJobsService(own.t.orm.em, new CutPlansService(own.t.orm.em.fork()), logger);
      const settings = new WorkshopSettingsService(own.t.orm.em, new MemoryStorage(), logger, jobs);
      const doomed = own.workshopId;
      const plansBefore = await own.t.orm.em.fork().count(CutPlan, { workshop: doomed });

      const started: NestJobDto[] = [];
      for (let i = 0; i <= NEST_THREADS; i++) {
        started.push(await jobs.create(doomed, { buildId: own.buildId, settings: { stockIds: own.stockIds, timeLimitMs: LONG_MS } }, DEMO.maker));
      }
      const other = await signUp(own.t.app, 'next@saltmarsh.test', 'Saltmarsh Cabinets');
      const kept = await jobs.create(other.workshopId, { job: SMALL_RAW_JOB }, DEMO.maker);
      await until('the first job to start searching', () => jobs.get(doomed, started[0]!.id).status === 'running');
      expect(jobs.get(doomed, started.at(-1)!.id).status, 'one more job than worker threads waits its turn').toBe('queued');

      await settings.remove(doomed, 'Harbour Lane Audio');

      for (const j of started) expect(jobs.get(doomed, j.id)).toMatchObject({ status: 'cancelled', result: null, error: null });
      expect(await own.t.orm.em.fork().count(Workshop, { id: doomed })).toBe(0);
      expect(['queued', 'running'], 'the other workshop’s job is not touched').toContain(jobs.get(other.workshopId, kept.id).status);
      // The running job is asked to stop, which frees the worker for the other workshop's job.
      await until('the other workshop’s job to finish', () => finished(jobs.get(other.workshopId, kept.id)));
      expect(jobs.get(other.workshopId, kept.id).status).toBe('done');
      for (const j of started) expect(jobs.get(doomed, j.id).status).toBe('cancelled');
      expect(plansBefore).toBe(0);
      expect(await own.t.orm.em.fork().count(CutPlan, { workshop: doomed })).toBe(0);
      expect(logged).toEqual([]);
    } finally {
      await own.t.close();
    }
  });

  it('over HTTP: the delete answers 204 while a job runs; the job is gone for its former members (403, never a 500)', async () => {
    const job = await maker.post(`/api/workshops/${workshopId}/nest-jobs`).send({ buildId, settings: { stockIds, timeLimitMs: LONG_MS } }).expect(202);
    const running = await pollJob(maker, workshopId, job.body.id, (d) => d.status === 'running' || finished(d));
    expect(running.at(-1)!.status).toBe('running');
    const loggedBefore = t.logged.length;

    await owner.delete(`/api/workshops/${workshopId}`).send({ confirmName: 'Harbour Lane Audio' }).expect(204);

    const after = await maker.get(`/api/workshops/${workshopId}/nest-jobs/${job.body.id}`);
    expect(after.status).toBe(403);
    expect(after.body.error.code).toBe('forbidden');
    await maker.post(`/api/workshops/${workshopId}/nest-jobs/${job.body.id}/cancel`).expect(403);
    // The worker stops and the pool takes the next workshop's job: it runs to the end.
    const other = await signUp(t.app, 'next@saltmarsh.test', 'Next Bench');
    const next = await other.agent
      .post(`/api/workshops/${other.workshopId}/nest-jobs`)
      .send({ job: SMALL_RAW_JOB })
      .expect(202);
    expect((await pollJob(other.agent, other.workshopId, next.body.id, finished)).at(-1)!.status).toBe('done');
    expect(await t.orm.em.fork().count(CutPlan, { workshop: workshopId })).toBe(0);
    expect(t.logged.slice(loggedBefore).filter((l) => l.includes('nest job')), 'no job failed trying to save').toEqual([]);
  });
});
