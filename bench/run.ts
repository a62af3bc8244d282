/**
 * `npm run bench`: every speed and quality benchmark, printed as tables. Targets are printed beside the
 * measured values; nothing here is a test (CI does not run it).
 *   npm run bench                 all benches (the nesting set takes several minutes)
 *   npm run bench -- --quick      a sample of the nesting instances
 *   npm run bench -- plan studio  only the named benches (plan, studio, export, cut-plan, nest)
 */
import { printTable, type BenchRow, type BenchTable } from './table.js';

type Bench = () => Promise<BenchRow[] | BenchTable[]>;

const quick = process.argv.includes('--quick');
const only = process.argv.slice(2).filter((a) => !a.startsWith('--'));

const benches: { key: string; title: string; load: () => Promise<Bench> }[] = [
  { key: 'plan', title: 'Cabinet engine: planDesign time per design', load: async () => (await import('./plan.bench.js')).benchPlan },
  { key: 'studio', title: 'Studio: edit → figures', load: async () => (await import('./studio.bench.js')).benchStudio },
  { key: 'export', title: 'Exports: demo build', load: async () => (await import('./export.bench.js')).benchExport },
  { key: 'cut-plan', title: 'Cut plan of the demo build over HTTP', load: async () => (await import('./cut-plan.bench.js')).benchCutPlan },
  {
    key: 'nest',
    title: 'Nesting',
    load: async () => {
      const mod = await import('./nest.bench.js');
      return () => mod.benchNest({ quick });
    },
  },
];

function isTables(x: BenchRow[] | BenchTable[]): x is BenchTable[] {
  return x.length > 0 && typeof (x[0] as BenchTable).title === 'string' && Array.isArray((x[0] as BenchTable).rows);
}

let failed = 0;
for (const b of benches) {
  if (only.length > 0 && !only.includes(b.key)) continue;
  try {
    const run = await b.load();
    const out = await run();
    if (isTables(out)) out.forEach(printTable);
    else printTable({ title: b.title, rows: out });
  } catch (err) {
    failed += 1;
    console.error(`\n## ${b.title}: could not run (${err instanceof Error ? err.message : String(err)})`);
  }
}
process.exit(failed === 0 ? 0 : 1);
