/**
 * The worker-thread pool for nesting (piscina). One pool per process, made on first use.
 *
 * Threads: at most 2, and one fewer than the machine's cores (so 1 on a 2-core box): the main thread keeps
 * a core to answer the API while a long nest runs. Jobs beyond that wait in piscina's queue.
 *
 * The worker is TypeScript. Under `npm start` the server runs under tsx, whose loader flags are in
 * process.execArgv and pass to worker threads as they are; elsewhere (vitest) `--import tsx` is added.
 */
import os from 'node:os';
import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
import type { NestJob } from '../../shared/schemas/nest.schema.js';
import type { NestTaskMessage, NestTaskResult } from './nest.worker.js';

export const NEST_THREADS = Math.max(1, Math.min(2, os.availableParallelism() - 1));

const hasTsx = (argv: readonly string[]) => argv.some((a) => a === 'tsx' || /[\\/]tsx[\\/]/.test(a));

let pool: Piscina | null = null;

function nestPool(): Piscina {
  if (!pool) {
    pool = new Piscina({
      filename: new URL('./nest.worker.ts', import.meta.url).href,
      minThreads: 0,
      maxThreads: NEST_THREADS,
      // Keep a started thread a while: loading the engine under tsx takes about a second.
      idleTimeout: 120_000,
      execArgv: hasTsx(process.execArgv) ? process.execArgv : [...process.execArgv, '--import', 'tsx'],
    });
  }
  return pool;
}

export interface NestRun {
  /** Resolves with the layouts (one per job); rejects with an AbortError when aborted before or while running. */
  done: Promise<NestTaskResult>;
  /** Asks a running search to stop and return what it has (cooperative, via Atomics). */
  stop(): void;
  /** Drops a queued task, or ends the thread of a running one (piscina AbortSignal). */
  abort(): void;
}

export function runNest(jobs: NestJob[], onMessage: (m: NestTaskMessage) => void): NestRun {
  const stop = new Int32Array(new SharedArrayBuffer(4));
  const { port1, port2 } = new MessageChannel();
  port1.on('message', onMessage);
  const controller = new AbortController();
  const done = nestPool()
    .run({ jobs, port: port2, stop }, { transferList: [port2], signal: controller.signal })
    .finally(() => port1.close()) as Promise<NestTaskResult>;
  return {
    done,
    stop: () => {
      Atomics.store(stop, 0, 1);
    },
    abort: () => controller.abort(),
  };
}

/** Ends the pool's threads (tests, shutdown). Idle threads are unref'd and never keep the process alive. */
export async function closeNestPool(): Promise<void> {
  const p = pool;
  pool = null;
  if (p) await p.destroy();
}
