/**
 * Studio: time from an edit to fresh figures for a design with four braces and six openings
 * (tests/fixtures/designs/braced-tower.json): the editor command (drag step, nudge or typed value, with
 * its history entry) plus planDesign plus the figures read from the plan. Target: < 16 ms per edit.
 * `npx tsx bench/studio.bench.ts` prints the table alone; bench/run.ts calls benchStudio().
 */
import { readFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { planDesign } from '../shared/cabinet/index.js';
import { designSchema } from '../shared/schemas/design.schema.js';
import { StudioEditor } from '../src/features/studio/model/editor.js';
import { figuresFromPlan } from '../src/features/studio/model/figures.js';
import { printTable, type BenchRow } from './table.js';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const TARGET_MS = 16;

function stats(xs: number[]) {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return { median: s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2, p95: s[Math.min(s.length - 1, Math.floor(0.95 * s.length))]!, max: s[s.length - 1]! };
}

/** Runs one edit and re-plans, as the studio does on every change; returns the elapsed ms. */
function timed(ed: StudioEditor, edit: () => void): number {
  const t0 = performance.now();
  edit();
  const r = planDesign(ed.doc);
  if (!r.ok) throw new Error(`bench design does not plan after the edit: ${r.message}`);
  figuresFromPlan(ed.doc, r.plan);
  return performance.now() - t0;
}

export async function benchStudio(runs = 200): Promise<BenchRow[]> {
  const doc = designSchema.parse(JSON.parse(readFileSync(path.join(root, 'tests/fixtures/designs/braced-tower.json'), 'utf8')));
  const braceIndex = doc.braces.findIndex((b) => b.type === 'shelf' && b.axis === 'y');
  const ed = new StudioEditor(doc, { grid: 'mm1' });
  ed.fitToView({ width: 1200, height: 800 });
  const brace = doc.braces[braceIndex]!;
  const startY = brace.type === 'shelf' ? brace.position : 0;
  const l = ed.layout().views.side;
  const p = ed.worldToScreen({ x: l.ox + doc.outer.depth / 2, y: l.oy + startY });
  const zoom = ed.getState().camera.zoom;

  const cases: { name: string; times: number[] }[] = [];
  // 1. Drag steps: one pointer move each (merged into one history entry), up and down by up to 40 mm.
  for (let w = 0; w < 20; w++) timed(ed, () => ed.select({ kind: 'brace', index: braceIndex }));
  ed.pointerDown({ screen: p, hit: `brace:${braceIndex}` });
  const drag: number[] = [];
  for (let i = 0; i < runs; i++) {
    const dy = 40 * Math.sin((i / runs) * Math.PI * 4) + 5;
    drag.push(timed(ed, () => ed.pointerMove({ screen: { x: p.x, y: p.y - dy * zoom } })));
  }
  ed.pointerUp();
  cases.push({ name: 'drag a shelf brace (per move)', times: drag });
  // 2. Arrow-key nudges (each one history entry).
  const nudge: number[] = [];
  ed.setActiveView('side');
  for (let i = 0; i < runs; i++) nudge.push(timed(ed, () => ed.nudge(i % 2 ? 'up' : 'down', false)));
  cases.push({ name: 'nudge a shelf brace (arrow key)', times: nudge });
  // 3. Typed values: the outer width, alternating.
  const typed: number[] = [];
  for (let i = 0; i < runs; i++) typed.push(timed(ed, () => ed.setField(['outer', 'width'], doc.outer.width + (i % 2 ? 2 : 0))));
  cases.push({ name: 'type the outer width', times: typed });

  return cases.map((c) => {
    const s = stats(c.times);
    return { case: c.name, runs: c.times.length, 'median ms': s.median, 'p95 ms': s.p95, 'max ms': s.max, 'target ms': TARGET_MS, verdict: s.median < TARGET_MS ? 'ok' : 'SLOW' };
  });
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const rows = await benchStudio();
  printTable({
    title: 'Studio: edit → figures (4 braces + 6 openings)',
    rows,
    notes: [
      'Each row: the editor command and its history entry, planDesign, and the figures; verdict on the median against 16 ms.',
      `Load average while measuring: ${os.loadavg()[0]!.toFixed(1)} on ${os.cpus().length} cores (p95 and max grow with the machine's load).`,
    ],
  });
}
