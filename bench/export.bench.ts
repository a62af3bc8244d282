/**
 * Speed of the exports for the demo build (PRODUCT.md §9: a pair of bookshelf cabinets and a batch of
 * four floorstanders): the full-size stencil set to a PDF buffer through pdfkit, on each paper, from
 * planned designs to the last byte. Target (issue 6): the demo build's stencils in under 2 s.
 * Also timed: the panels DXF (no target).
 * `npx tsx bench/export.bench.ts` prints the table alone; bench/run.ts calls benchExport().
 */
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { performance } from 'node:perf_hooks';
import { planDesign } from '../shared/cabinet/index.js';
import { DEMO_BOOKSHELF, DEMO_FLOORSTANDER } from '../shared/demo/designs.js';
import { buildCabinet, type BuildCabinet } from '../shared/render/build.js';
import { panelsDxf } from '../shared/render/dxf.js';
import { stencilItemsFromBuild } from '../shared/render/stencil-items.js';
import { drawStencils, parseStencilOptions, type StencilOptionsInput } from '../shared/render/stencils.js';
import type { DesignInput } from '../shared/schemas/design.schema.js';
import { PdfkitSink } from '../server/export/pdfkit-sink.js';
import { printTable, type BenchRow } from './table.js';

const TARGET_MS = 2000;

function demoBuild(): BuildCabinet[] {
  const plan = (design: DesignInput, count: number) => {
    const r = planDesign(design);
    if (!r.ok) throw new Error(`demo design does not plan: ${r.message}`);
    return buildCabinet(r.design, r.plan, count);
  };
  return [plan(DEMO_BOOKSHELF, 2), plan(DEMO_FLOORSTANDER, 4)];
}

async function stencilPdf(paper: StencilOptionsInput): Promise<{ bytes: number; pages: number }> {
  const parsed = parseStencilOptions(paper);
  if (!parsed.ok) throw new Error(parsed.message);
  const sink = new PdfkitSink({ title: 'Harbour Lane build — stencils' });
  const layout = drawStencils(sink, stencilItemsFromBuild(demoBuild()), parsed.options, 'Harbour Lane build');
  const pdf = await sink.finish();
  return { bytes: pdf.length, pages: layout.tiles.length };
}

async function timed<T>(fn: () => Promise<T>, runs: number): Promise<{ result: T; firstMs: number; medianMs: number; maxMs: number }> {
  // The first run also loads the fonts and compiles the code paths: timed on its own.
  const t0 = performance.now();
  await fn();
  const firstMs = performance.now() - t0;
  const times: number[] = [];
  let result!: T;
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    result = await fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return { result, firstMs, medianMs: times[times.length >> 1]!, maxMs: times[times.length - 1]! };
}

export async function benchExport(runs = 5): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  const papers: [string, StencilOptionsInput][] = [
    ['stencils A4', { paper: 'A4' }],
    ['stencils Letter', { paper: 'Letter' }],
    ['stencils A3', { paper: 'A3' }],
    ['stencils 610 mm roll', { paper: 'roll', rollWidthMm: 610 }],
  ];
  for (const [name, paper] of papers) {
    const t = await timed(() => stencilPdf(paper), runs);
    rows.push({
      case: `${name} (demo build)`,
      'tile pages': t.result.pages,
      'PDF kB': Math.round(t.result.bytes / 1024),
      'first run ms': t.firstMs,
      'median ms': t.medianMs,
      'max ms': t.maxMs,
      'target ms': TARGET_MS,
      verdict: Math.max(t.firstMs, t.maxMs) < TARGET_MS ? 'ok' : 'SLOW',
    });
  }
  const dxf = await timed(async () => panelsDxf(demoBuild()).length, runs);
  rows.push({ case: 'panels DXF (demo build)', 'DXF kB': Math.round(dxf.result / 1024), 'first run ms': dxf.firstMs, 'median ms': dxf.medianMs, 'max ms': dxf.maxMs });
  return rows;
}

if (process.argv[1] && import.meta.url === pathToFileURL(path.resolve(process.argv[1])).href) {
  const rows = await benchExport();
  printTable({
    title: 'Exports (demo build: 2 bookshelves + 4 floorstanders)',
    rows,
    notes: ['planned designs → stencil PDF buffer through pdfkit (fonts embedded); first run timed alone, then 5 runs', `target: demo stencils under ${TARGET_MS} ms (issue 6)`],
  });
}
