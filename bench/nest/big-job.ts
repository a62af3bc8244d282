/**
 * Runs one generated production job in a process of its own and prints time, sheets and peak memory
 * (maxRSS of the whole process, Node and tsx included) as JSON: `npx tsx bench/nest/big-job.ts 2000`.
 */
import { performance } from 'node:perf_hooks';
import { nest, validateLayout } from '../../shared/nesting/index.js';
import { nestJobSchema } from '../../shared/schemas/nest.schema.js';
import { largeJob } from './cabinet-jobs.js';

const parts = Number(process.argv[2] ?? 2000);
const timeLimitMs = Number(process.argv[3] ?? 2000);
const job = nestJobSchema.parse({ ...largeJob(parts, 7), timeLimitMs });
const t = performance.now();
const layout = nest(job, { now: () => performance.now() });
const ms = performance.now() - t;
const invalid = validateLayout(job, layout).length;
const count = job.parts.reduce((n, p) => n + p.quantity, 0);
process.stdout.write(
  JSON.stringify({
    parts: count,
    timeLimitMs,
    ms,
    sheets: layout.stats.sheetsUsed,
    lowerBound: layout.stats.lowerBound,
    utilisation: layout.stats.utilisation,
    invalid,
    maxRssMb: process.resourceUsage().maxRSS / 1024,
  }) + '\n',
);
