/**
 * Speed of the cabinet engine: median time of planDesign for the demo designs and for a design with four
 * braces and six openings (tests/fixtures/designs/braced-tower.json). Targets: < 5 ms median for a typical
 * design, < 16 ms for four braces + six openings (the studio plans on every edit).
 * `npx tsx bench/plan.bench.ts` prints the table alone; bench/run.ts calls benchPlan().
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { performance } from 'node:perf_hooks';
import { planDesign } from '../shared/cabinet/index.js';
import { DEMO_BOOKSHELF, DEMO_FLOORSTANDER } from '../shared/demo/designs.js';
import { printTable, type BenchRow } from './table.js';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}

function percentile(xs: number[], p: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(p * s.length))]!;
}

function timeRuns(input: unknown, runs: number): number[] {
  for (let i = 0; i < 30; i++) planDesign(input);
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    const r = planDesign(input);
    times.push(performance.now() - t0);
    if (!r.ok) throw new Error(`bench design does not plan: ${r.message}`);
  }
  return times;
}

export async function benchPlan(runs = 300): Promise<BenchRow[]> {
  const tower: unknown = JSON.parse(readFileSync(path.join(root, 'tests/fixtures/designs/braced-tower.json'), 'utf8'));
  const cases: { name: string; input: unknown; targetMs: number }[] = [
    { name: 'bookshelf (demo)', input: DEMO_BOOKSHELF, targetMs: 5 },
    { name: 'floorstander (demo)', input: DEMO_FLOORSTANDER, targetMs: 5 },
    { name: '4 braces + 6 openings', input: tower, targetMs: 16 },
  ];
  return cases.map((c) => {
    const times = timeRuns(c.input, runs);
    const med = median(times);
    return {
      case: c.name,
      runs,
      'median ms': med,
      'p95 ms': percentile(times, 0.95),
      'target ms': c.targetMs,
      verdict: med < c.targetMs ? 'ok' : 'SLOW',
    };
  });
}

if (process.argv[1] && import.meta.url === pathToFileURL(path.resolve(process.argv[1])).href) {
  const rows = await benchPlan();
  printTable({ title: 'planDesign (cabinet engine)', rows, notes: ['median of single runs after 30 warm-up runs'] });
}
