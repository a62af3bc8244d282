/**
 * The demo build to a cut plan over the real HTTP API, and its exports. Measured:
 * - the nest job from POST to "done" (worker-thread pool, default 3 s search), and how quickly the API
 *   answers GET /api/health while the job runs (target: under 100 ms at the worst — the engine runs in a
 *   worker thread, so the main thread stays free), against the same while the engine runs on the main thread;
 * - each export route of the plan (the file made whole, then sent).
 * `npx tsx bench/cut-plan.bench.ts` prints the tables alone; bench/run.ts calls benchCutPlan().
 */
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import { pathToFileURL } from 'node:url';
import request from 'supertest';
import { nest } from '../shared/nesting/index.js';
import { createApp } from '../server/app.js';
import { initOrm, migrate } from '../server/db.js';
import { CutPlansService } from '../server/modules/cut-plans/cut-plans.service.js';
import { Build } from '../server/modules/builds/build.entity.js';
import { DEMO_BUILD_NAME, DEMO_EMAILS, DEMO_PASSWORD, seedDemo } from '../server/seed.js';
import { createSessionStore } from '../server/sessions.js';
import { closeNestPool, NEST_THREADS } from '../server/workers/pool.js';
import { printTable, type BenchTable } from './table.js';

const HEALTH_TARGET_MS = 100;

const quantile = (xs: number[], q: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * s.length))] ?? 0;
};

export async function benchCutPlan(): Promise<BenchTable[]> {
  const orm = await initOrm({ dbName: ':memory:' });
  await migrate(orm);
  await seedDemo(orm);
  const sessions = await createSessionStore(':memory:');
  const quiet = { info: () => {}, warn: () => {}, error: console.error };
  const app = createApp({ orm, sessionStore: sessions.store, sessionSecret: 'bench-secret-that-is-long-enough-0123', logger: quiet, loginLimit: { windowMs: 60_000, limit: 1000 } });
  const server = app.listen(0);
  try {
    const agent = request.agent(server);
    await agent.post('/api/auth/login').send({ email: DEMO_EMAILS.maker, password: DEMO_PASSWORD }).expect(200);
    const workshopId = (await agent.get('/api/auth/me')).body.memberships[0].workshopId as number;
    const build = await orm.em.fork().findOneOrFail(Build, { workshop: workshopId, name: DEMO_BUILD_NAME });

    const health = async (until: () => boolean): Promise<number[]> => {
      const times: number[] = [];
      while (!until()) {
        const t0 = performance.now();
        await agent.get('/api/health').expect(200);
        times.push(performance.now() - t0);
        await new Promise((r) => setTimeout(r, 20));
      }
      return times;
    };
    let idleRuns = 0;
    const idle = await health(() => idleRuns++ >= 20);

    // Through the API: the engine in the worker pool.
    const t0 = performance.now();
    const job = (await agent.post(`/api/workshops/${workshopId}/nest-jobs`).send({ buildId: build.id, settings: {} }).expect(202)).body;
    let state = job;
    let done = false;
    const during = health(() => done);
    while (state.status === 'queued' || state.status === 'running') {
      await new Promise((r) => setTimeout(r, 50));
      state = (await agent.get(`/api/workshops/${workshopId}/nest-jobs/${job.id}`)).body;
    }
    const jobMs = performance.now() - t0;
    done = true;
    const busy = await during;
    if (state.status !== 'done') throw new Error(`nest job ended ${state.status}`);
    const planId = state.result.cutPlanId as number;

    // The same search on the main thread: what the API would feel without the pool.
    const prepared = await new CutPlansService(orm.em.fork()).prepare(workshopId, build.id, {});
    let inlineDone = false;
    const inlineHealth = health(() => inlineDone);
    await new Promise((r) => setTimeout(r, 30));
    const t1 = performance.now();
    for (const g of prepared.groups) if (g.job) nest(g.job, { now: () => performance.now() });
    const inlineMs = performance.now() - t1;
    inlineDone = true;
    const blocked = await inlineHealth;

    const row = (name: string, xs: number[]) => ({
      case: name,
      requests: xs.length,
      'median ms': quantile(xs, 0.5),
      'p95 ms': quantile(xs, 0.95),
      'max ms': Math.max(...xs),
      'target max ms': HEALTH_TARGET_MS,
      verdict: Math.max(...xs) < HEALTH_TARGET_MS ? 'ok' : 'SLOW',
    });
    const responsiveness: BenchTable = {
      title: `Cut plan of the demo build: API answers while nesting (pool of ${NEST_THREADS} thread${NEST_THREADS === 1 ? '' : 's'})`,
      rows: [row('GET /api/health, idle', idle), row('… while the nest job runs in the pool', busy), row('… while the engine runs on the main thread (for comparison)', blocked)],
      notes: [`nest job POST → done: ${Math.round(jobMs)} ms (3 s search for ${prepared.parts.reduce((n, p) => n + p.quantity, 0)} parts in ${prepared.groups.length} groups, plus worker start-up); on the main thread: ${Math.round(inlineMs)} ms`],
    };

    const exportsRows = [];
    for (const file of ['cut-diagrams.pdf', 'cut-diagrams.svg', 'cut-list.csv', 'panels.dxf', 'stencils.pdf', 'stencils.pdf?paper=roll&rollWidthMm=914']) {
      const times: number[] = [];
      let bytes = 0;
      for (let i = 0; i < 4; i++) {
        const s0 = performance.now();
        const res = await agent.get(`/api/workshops/${workshopId}/cut-plans/${planId}/exports/${file}`).buffer(true).parse((r, cb) => {
          let n = 0;
          r.on('data', (c: Buffer) => (n += c.length));
          r.on('end', () => cb(null, n));
        });
        times.push(performance.now() - s0);
        bytes = res.body as number;
      }
      exportsRows.push({ export: file, kB: Math.round(bytes / 1024), 'first ms': times[0]!, 'median of next 3 ms': quantile(times.slice(1), 0.5) });
    }
    const exportsTable: BenchTable = { title: 'Cut plan exports of the demo build over HTTP', rows: exportsRows, notes: ['from the request to the last byte; the stencil target (under 2 s) is in the Exports table'] };
    return [responsiveness, exportsTable];
  } finally {
    server.close();
    await closeNestPool();
    await sessions.close();
    await orm.close(true);
  }
}
if (process.argv[1] && import.meta.url === pathToFileURL(path.resolve(process.argv[1])).href) {
  for (const t of await benchCutPlan()) printTable(t);
}
