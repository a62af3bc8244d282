/**
 * One bench task, run in a worker thread (piscina): our engine and the two npm packers on the same
 * input. The engine gets the real clock (performance.now) and the job's time limit.
 */
import { performance } from 'node:perf_hooks';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { binLowerBounds, nest, validateLayout } from '../../shared/nesting/index.js';
import { nestJobSchema, type NestJobInput } from '../../shared/schemas/nest.schema.js';
import { benchmarksDir, parseInstance } from './loaders.js';
import { runBinpackingjs, runMaxrectsPacker, type SimpleJob } from './npm-packers.js';
import { simpleGroups } from './simple-job.js';

export type Task =
  | { kind: '2bp'; file: string; timeLimitMs: number }
  | { kind: 'strip'; dir: string; file: string; timeLimitMs: number }
  | { kind: 'job'; job: NestJobInput; modes: ('free' | 'guillotine')[] };

export interface EngineRun {
  mode: 'free' | 'guillotine';
  sheets: number;
  length?: number;
  lowerBound: number;
  ms: number;
  utilisation: number;
  unplaced: number;
  invalid: number;
}

export interface TaskResult {
  engine: EngineRun[];
  maxrects: { bins: number; length?: number; unplaced: number; ms: number };
  binpackingjs: { bins: number; length?: number; unplaced: number; ms: number };
  bounds?: { L0: number; big: number; L1: number; L2: number; L3: number };
}

function runEngine(input: NestJobInput, mode: 'free' | 'guillotine'): EngineRun {
  const job = nestJobSchema.parse({ ...input, mode });
  const t = performance.now();
  const layout = nest(job, { now: () => performance.now() });
  const ms = performance.now() - t;
  return {
    mode,
    sheets: layout.stats.sheetsUsed,
    ...(layout.stats.rollLengthUsed !== undefined ? { length: layout.stats.rollLengthUsed } : {}),
    lowerBound: layout.stats.lowerBound ?? 0,
    ms,
    utilisation: layout.stats.utilisation,
    unplaced: layout.unplaced.reduce((n, u) => n + u.quantity, 0),
    invalid: validateLayout(job, layout).length,
  };
}

function runNpm(groups: SimpleJob[]): Pick<TaskResult, 'maxrects' | 'binpackingjs'> {
  const sum = (f: (g: SimpleJob) => { bins: number; length?: number; unplaced: number; ms: number }) => {
    const out = { bins: 0, length: undefined as number | undefined, unplaced: 0, ms: 0 };
    for (const g of groups) {
      const r = f(g);
      out.bins += r.bins;
      out.unplaced += r.unplaced;
      out.ms += r.ms;
      if (r.length !== undefined) out.length = (out.length ?? 0) + r.length;
    }
    return out;
  };
  return { maxrects: sum(runMaxrectsPacker), binpackingjs: sum(runBinpackingjs) };
}

export default function runTask(task: Task): TaskResult {
  if (task.kind === '2bp') {
    const inst = parseInstance(task.file, readFileSync(path.join(benchmarksDir, '2bp-berkey-wang-martello-vigo', task.file), 'utf8'));
    const job: NestJobInput = {
      kerf: 0,
      mode: 'free',
      seed: 1,
      timeLimitMs: task.timeLimitMs,
      stock: [{ id: 'bin', kind: 'sheet', width: inst.W, height: inst.H }],
      parts: inst.items.map((it, k) => ({ id: `p${k}`, width: it.w, height: it.h, canRotate: false })),
    };
    const b = binLowerBounds(inst.W, inst.H, inst.items.map((it) => ({ ...it, turn: false })));
    return {
      engine: [runEngine(job, 'free')],
      ...runNpm([{ W: inst.W, H: inst.H, kerf: 0, trim: 0, items: inst.items.map((it) => ({ ...it, turn: false })) }]),
      bounds: { L0: b.L0, big: b.big, L1: b.L1, L2: b.L2, L3: b.L3 },
    };
  }
  if (task.kind === 'strip') {
    const inst = parseInstance(task.file, readFileSync(path.join(benchmarksDir, task.dir, task.file), 'utf8'));
    const job: NestJobInput = {
      kerf: 0,
      mode: 'free',
      seed: 1,
      timeLimitMs: task.timeLimitMs,
      stock: [{ id: 'roll', kind: 'roll', width: inst.W }],
      parts: inst.items.map((it, k) => ({ id: `p${k}`, width: it.w, height: it.h, canRotate: true })),
    };
    return {
      engine: [runEngine(job, 'free')],
      ...runNpm([{ W: inst.W, H: Infinity, kerf: 0, trim: 0, items: inst.items.map((it) => ({ ...it, turn: true })) }]),
    };
  }
  const job = nestJobSchema.parse(task.job);
  return { engine: task.modes.map((m) => runEngine(task.job, m)), ...runNpm(simpleGroups(job)) };
}
