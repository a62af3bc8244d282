/**
 * Worker-thread entry of the nest pool (server/workers/pool.ts): runs the nesting engine on one or more
 * nest jobs in turn (a cut plan has one job per material group), posting progress to `port` and stopping
 * early when the main thread sets `stop[0]` (Atomics). Loaded by piscina under tsx (see pool.ts).
 */
import { performance } from 'node:perf_hooks';
import type { MessagePort } from 'node:worker_threads';
import { nest } from '../../shared/nesting/index.js';
import type { Layout, NestJob } from '../../shared/schemas/nest.schema.js';

export interface NestTask {
  jobs: NestJob[];
  /** Progress messages (NestTaskMessage) go here. */
  port: MessagePort;
  /** Int32Array over a SharedArrayBuffer: 1 in slot 0 asks the search to stop. */
  stop: Int32Array;
}

export type NestTaskMessage =
  | { type: 'started' }
  | { type: 'progress'; fraction: number; bestSheets: number; message: string };

export interface NestTaskResult {
  layouts: Layout[];
  stopped: boolean;
}

/** Progress messages at most this often (ms); improvements always go out. */
const PROGRESS_EVERY_MS = 100;

export default function runNestTask(task: NestTask): NestTaskResult {
  const { jobs, port, stop } = task;
  port.postMessage({ type: 'started' } satisfies NestTaskMessage);
  const shouldStop = () => Atomics.load(stop, 0) === 1;
  const weights = jobs.map((j) => Math.max(1, j.timeLimitMs));
  const totalWeight = weights.reduce((a, b) => a + b, 0);
  const layouts: Layout[] = [];
  let before = 0;
  let sheetsBefore = 0;
  let lastPost = -Infinity;
  jobs.forEach((job, i) => {
    const layout = nest(job, {
      now: () => performance.now(),
      shouldStop,
      onProgress: (p) => {
        const t = performance.now();
        if (t - lastPost < PROGRESS_EVERY_MS && p.message !== 'improved' && p.fraction < 1) return;
        lastPost = t;
        const fraction = (before + weights[i]! * p.fraction) / totalWeight;
        port.postMessage({ type: 'progress', fraction, bestSheets: sheetsBefore + p.bestSheets, message: p.message ?? '' } satisfies NestTaskMessage);
      },
    });
    layouts.push(layout);
    before += weights[i]!;
    sheetsBefore += layout.stats.sheetsUsed;
  });
  port.close();
  return { layouts, stopped: shouldStop() };
}
