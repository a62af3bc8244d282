import { describe, expect, it } from 'vitest';
import { PT_PER_MM } from '../../../shared/render/pdf-sink.js';
import { PAPER_SIZES_MM, type Paper } from '../../../shared/render/paper.js';
import { stencilItemsFromBuild, type StencilItem } from '../../../shared/render/stencil-items.js';
import {
  ALIGN_MARK,
  CALIBRATION_IN_MM,
  CALIBRATION_MM,
  CUT_LINE,
  TILE_PAD_MM,
  drawStencils,
  layoutStencils,
  parseStencilOptions,
  type StencilLayout,
  type StencilOptions,
} from '../../../shared/render/stencils.js';
import { rowLetter, tileCount, tileLabel } from '../../../shared/render/tiling.js';
import { FakeSink, clipSegment, type Segment } from './fake-sink.js';
import { BACK_LOWER, BOOKSHELF_CABINET, LEFT_NOTCHED, TALL } from './fixtures.js';
import { demoBuild } from './demo-build.js';

/** Band above the drawing area: the 4 in calibration square (101.6 mm) and a 5 mm gap. */
const BAND_MM = 101.6 + 5;

const sheet = (name: 'A4' | 'Letter' | 'A3' | 'Tabloid', marginMm = 7, overlapMm = 15): StencilOptions => ({ paper: { kind: 'sheet', name }, marginMm, overlapMm });

/** The ceiling formula, written out again from its statement: n = max(1, ⌈(L + 2p − o) / (D − o)⌉). */
function formula(lengthMm: number, drawMm: number, overlapMm: number): number {
  return Math.max(1, Math.ceil((lengthMm + 2 * TILE_PAD_MM - overlapMm) / (drawMm - overlapMm)));
}

describe('paper sizes', () => {
  it('are ISO 216 (A4 210 × 297, A3 297 × 420 mm) and ANSI (Letter 8.5 × 11 in, Tabloid 11 × 17 in)', () => {
    // ISO 216 and ANSI/ASME Y14.1 sizes; 1 in = 25.4 mm exactly (1959 agreement). REFERENCES.md §8.
    expect(PAPER_SIZES_MM.A4).toEqual({ widthMm: 210, heightMm: 297 });
    expect(PAPER_SIZES_MM.A3).toEqual({ widthMm: 297, heightMm: 420 });
    expect(PAPER_SIZES_MM.Letter.widthMm).toBeCloseTo(215.9, 10);
    expect(PAPER_SIZES_MM.Letter.heightMm).toBeCloseTo(279.4, 10);
    expect(PAPER_SIZES_MM.Tabloid.widthMm).toBeCloseTo(279.4, 10);
    expect(PAPER_SIZES_MM.Tabloid.heightMm).toBeCloseTo(431.8, 10);
  });

  it('come out in points as A4 595.28 × 841.89, Letter 612 × 792, A3 841.89 × 1190.55, Tabloid 792 × 1224 (fake sink)', () => {
    // 1 pt = 1/72 in (ISO 32000-1 §8.3.2.1); the point sizes are the ones REFERENCES.md §8 lists.
    const expected: Record<string, [number, number]> = { A4: [595.28, 841.89], Letter: [612, 792], A3: [841.89, 1190.55], Tabloid: [792, 1224] };
    for (const [name, [w, h]] of Object.entries(expected)) {
      const sink = new FakeSink();
      drawStencils(sink, stencilItemsFromBuild([BOOKSHELF_CABINET]), sheet(name as 'A4'), 'test');
      expect(sink.pages.length).toBeGreaterThan(1);
      for (const p of sink.pages) {
        expect(p.widthPt).toBeCloseTo(w, 2);
        expect(p.heightPt).toBeCloseTo(h, 2);
      }
    }
  });
});

describe('tile count (ceiling formula)', () => {
  it('matches hand-worked examples', () => {
    // A4, 7 mm margins, 15 mm overlap: drawing area 196 × (297 − 14 − 106.6) = 196 × 176.4 mm.
    // A 420 × 930 mm piece: columns ⌈(420 + 4 − 15) / 181⌉ = ⌈2.26⌉ = 3; rows ⌈(930 + 4 − 15) / 161.4⌉ = ⌈5.69⌉ = 6.
    const layout = layoutStencils(stencilItemsFromBuild([{ ...BOOKSHELF_CABINET, plan: { panels: [], liningPieces: [TALL] } }]), sheet('A4'));
    expect(layout.grids[0]!.cols.count).toBe(3);
    expect(layout.grids[0]!.rows.count).toBe(6);
    expect(layout.tiles).toHaveLength(18);
    // Exactly the drawing width fits one tile; 0.01 mm more needs two.
    expect(tileCount(196 - 2 * TILE_PAD_MM, 196, 15, TILE_PAD_MM)).toBe(1);
    expect(tileCount(196 - 2 * TILE_PAD_MM + 0.01, 196, 15, TILE_PAD_MM)).toBe(2);
    expect(tileCount(10, 100, 15)).toBe(1);
    expect(() => tileCount(500, 15, 15)).toThrow(/longer than the overlap/);
  });

  const papers: [string, Paper, number, number | null][] = [
    // name, paper, drawing width, drawing height (null: a roll, cut to length up to 2000 mm)
    ['A4', { kind: 'sheet', name: 'A4' }, 210 - 14, 297 - 14 - BAND_MM],
    ['Letter', { kind: 'sheet', name: 'Letter' }, 215.9 - 14, 279.4 - 14 - BAND_MM],
    ['A3', { kind: 'sheet', name: 'A3' }, 297 - 14, 420 - 14 - BAND_MM],
    ['Tabloid', { kind: 'sheet', name: 'Tabloid' }, 279.4 - 14, 431.8 - 14 - BAND_MM],
    ['610 mm roll', { kind: 'roll', widthMm: 610, maxLengthMm: 2000 }, 610 - 14, 2000 - 14 - BAND_MM],
  ];
  for (const [name, paper, drawW, drawH] of papers) {
    it(`matches the formula for every demo piece and template on ${name}`, () => {
      const items = stencilItemsFromBuild(demoBuild());
      const layout = layoutStencils(items, { paper, marginMm: 7, overlapMm: 15 });
      items.forEach((item, i) => {
        const w = item.bounds.maxX - item.bounds.minX;
        const h = item.bounds.maxY - item.bounds.minY;
        const g = layout.grids[i]!;
        expect(g.cols.count, item.name).toBe(formula(w, drawW, 15));
        expect(g.rows.count, item.name).toBe(formula(h, drawH!, 15));
        expect(layout.tiles.filter((t) => t.itemIndex === i)).toHaveLength(g.cols.count * g.rows.count);
      });
      const sink = new FakeSink();
      drawStencils(sink, items, { paper, marginMm: 7, overlapMm: 15 }, 'Harbour Lane build');
      const coverPages = sink.pages.length - layout.tiles.length;
      expect(coverPages).toBeGreaterThanOrEqual(1);
      if (paper.kind === 'roll') {
        // A roll page is as wide as the roll and cut to length: never longer than the longest page allowed.
        for (const p of sink.pages) expect(p.widthPt).toBeCloseTo(610 * PT_PER_MM, 6);
        for (const p of sink.pages) expect(p.heightPt).toBeLessThanOrEqual(2000 * PT_PER_MM + 1e-6);
      }
    });
  }
});

describe('row and column labels', () => {
  it('name rows A, B, … Z, AA and columns 1, 2, …', () => {
    expect([0, 1, 25, 26, 27].map(rowLetter)).toEqual(['A', 'B', 'Z', 'AA', 'AB']);
    expect(tileLabel(1, 2)).toBe('B3');
  });
});

/** Marks and visible cut lines of one page, in page mm. */
function pageContent(sink: FakeSink, page: number) {
  const marks: [number, number][] = [];
  const cuts: Segment[] = [];
  for (const p of sink.paths) {
    if (p.page !== page || p.paint !== 'stroke') continue;
    if (p.strokeColor === ALIGN_MARK.color) {
      for (const c of p.circles) marks.push([c.cx / PT_PER_MM, c.cy / PT_PER_MM]);
    }
    if (p.strokeColor === CUT_LINE.color && Math.abs(p.lineWidth - CUT_LINE.widthMm * PT_PER_MM) < 1e-9) {
      for (const s of p.segments) {
        const v = p.clip ? clipSegment(s, p.clip) : s;
        if (v) cuts.push(v.map((n) => n / PT_PER_MM) as Segment);
      }
    }
  }
  return { marks, cuts };
}

function distToSegment(px: number, py: number, [x1, y1, x2, y2]: Segment): number {
  const dx = x2 - x1;
  const dy = y2 - y1;
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((px - x1) * dx + (py - y1) * dy) / len2));
  return Math.hypot(px - (x1 + t * dx), py - (y1 + t * dy));
}

function samples(s: Segment, stepMm: number): [number, number][] {
  const n = Math.max(1, Math.ceil(Math.hypot(s[2] - s[0], s[3] - s[1]) / stepMm));
  return Array.from({ length: n + 1 }, (_, i): [number, number] => [s[0] + ((s[2] - s[0]) * i) / n, s[1] + ((s[3] - s[1]) * i) / n]);
}

const ringSegments = (ring: readonly [number, number][]): Segment[] => ring.map((p, i) => [p[0], p[1], ring[(i + 1) % ring.length]![0], ring[(i + 1) % ring.length]![1]]);

/**
 * Lays the printed pages of one item together the way a person does: the first page where it is,
 * each next page beside its neighbour (the direction its labels give), moved until its alignment marks
 * sit on the neighbour's. Returns the cut lines of all pages in the piece's coordinates (mm, y up).
 */
function assemble(sink: FakeSink, layout: StencilLayout, itemIndex: number, firstPage: number): { cuts: Segment[]; offsets: Map<string, [number, number]> } {
  const tiles = layout.tiles.map((t, i) => ({ t, page: firstPage + i })).filter((x) => x.t.itemIndex === itemIndex);
  const content = new Map(tiles.map((x) => [`${x.t.row},${x.t.col}`, pageContent(sink, x.page)]));
  // Page offsets in the assembly (mm, the first page's own coordinates).
  const offsets = new Map<string, [number, number]>([['0,0', [0, 0]]]);
  for (const { t } of tiles) {
    const key = `${t.row},${t.col}`;
    if (offsets.has(key)) continue;
    // The neighbour already laid: to the left, or above for the first page of a row.
    const [nr, nc, horizontal] = t.col > 0 ? [t.row, t.col - 1, true] : [t.row - 1, t.col, false];
    const base = offsets.get(`${nr},${nc}`)!;
    // The marks on the shared edge: this page's trim line (its leftmost or topmost marks) is laid on the
    // neighbour's far overlap line (its rightmost or lowest marks).
    const axis = horizontal ? 0 : 1;
    const edge = (marks: [number, number][], pick: (...v: number[]) => number) => {
      const at = pick(...marks.map((m) => m[axis]));
      return marks.filter((m) => Math.abs(m[axis] - at) < 1e-6);
    };
    const mine = edge(content.get(key)!.marks, Math.min);
    const theirs = edge(content.get(`${nr},${nc}`)!.marks, Math.max).map(([x, y]): [number, number] => [x + base[0], y + base[1]]);
    let best: { off: [number, number]; hits: number } | null = null;
    for (const a of theirs) {
      for (const b of mine) {
        const off: [number, number] = [a[0] - b[0], a[1] - b[1]];
        const hits = mine.filter(([x, y]) => theirs.some(([u, v]) => Math.hypot(x + off[0] - u, y + off[1] - v) < 0.01)).length;
        if (!best || hits > best.hits) best = { off, hits };
      }
    }
    expect(best, `page ${t.label} has alignment marks matching its neighbour`).not.toBeNull();
    // Every mark on the shared edge meets its twin.
    expect(best!.hits).toBeGreaterThanOrEqual(2);
    expect(best!.hits).toBe(mine.length);
    expect(mine.length).toBe(theirs.length);
    offsets.set(key, best!.off);
  }
  const first = tiles[0]!.t;
  const toPiece = (x: number, y: number): [number, number] => [x - first.draw.x + first.window.minX, first.window.maxY - (y - first.draw.y)];
  const cuts: Segment[] = [];
  for (const { t } of tiles) {
    const [ox, oy] = offsets.get(`${t.row},${t.col}`)!;
    for (const s of content.get(`${t.row},${t.col}`)!.cuts) {
      const a = toPiece(s[0] + ox, s[1] + oy);
      const b = toPiece(s[2] + ox, s[3] + oy);
      cuts.push([a[0], a[1], b[0], b[1]]);
    }
  }
  return { cuts, offsets };
}

function checkAssembly(items: StencilItem[], options: StencilOptions, rings: (item: StencilItem) => [number, number][][]) {
  const sink = new FakeSink();
  const layout = drawStencils(sink, items, options, 'test');
  const firstTilePage = sink.pages.length - layout.tiles.length;
  let multiPage = 0;
  items.forEach((item, i) => {
    const { cuts, offsets } = assemble(sink, layout, i, firstTilePage);
    const g = layout.grids[i]!;
    if (offsets.size > 1) multiPage++;
    // Neighbouring pages sit one step (drawing size − overlap) apart.
    for (const [key, [ox, oy]] of offsets) {
      const [r, c] = key.split(',').map(Number) as [number, number];
      expect(ox).toBeCloseTo(c * g.cols.stepMm, 6);
      expect(oy).toBeCloseTo(r * g.rows.stepMm, 6);
    }
    const expected = rings(item).flatMap(ringSegments);
    // Every point of the outline and holes is printed on some page, within 0.5 mm …
    for (const s of expected) for (const [x, y] of samples(s, 1)) expect(Math.min(...cuts.map((c) => distToSegment(x, y, c))), `${item.name} at ${x},${y}`).toBeLessThanOrEqual(0.5);
    // … and every printed cut line lies on the outline or a hole, within 0.5 mm.
    for (const c of cuts) for (const [x, y] of samples(c, 1)) expect(Math.min(...expected.map((e) => distToSegment(x, y, e)))).toBeLessThanOrEqual(0.5);
  });
  return multiPage;
}

describe('assembled tiles reproduce the piece outline within 0.5 mm', () => {
  const liningRings = (item: StencilItem) => item.shapes.filter((s) => s.type === 'poly' && s.role === 'cut').map((s) => (s.type === 'poly' ? s.points : []));
  it('for hand-made pieces (a notch, round and square holes, 3 × 6 pages) on A4', () => {
    const items = stencilItemsFromBuild([{ ...BOOKSHELF_CABINET, plan: { panels: [], liningPieces: [LEFT_NOTCHED, TALL] } }]);
    expect(checkAssembly(items, sheet('A4'), liningRings)).toBe(2);
  });
  for (const name of ['A4', 'Letter', 'A3', 'Tabloid'] as const) {
    it(`for every lining piece of the demo build on ${name}`, () => {
      const items = stencilItemsFromBuild(demoBuild()).filter((i) => i.kind === 'lining');
      expect(items.length).toBeGreaterThan(10);
      checkAssembly(items, sheet(name), liningRings);
    });
  }
  it('with a wide overlap and margin on a 420 mm roll, pages up to 300 mm long', () => {
    const items = stencilItemsFromBuild([{ ...BOOKSHELF_CABINET, plan: { panels: [], liningPieces: [TALL] } }]);
    expect(checkAssembly(items, { paper: { kind: 'roll', widthMm: 420, maxLengthMm: 300 }, marginMm: 12, overlapMm: 30 }, liningRings)).toBe(1);
  });
});

describe('every stencil page', () => {
  const items = stencilItemsFromBuild(demoBuild());
  const sink = new FakeSink();
  const layout = drawStencils(sink, items, sheet('Letter'), 'Harbour Lane build');
  const first = sink.pages.length - layout.tiles.length;

  it('has a 100 mm and a 4 in calibration square, and the print-at-100 % note', () => {
    // 1 in = 25.4 mm exactly, so 4 in = 101.6 mm; 1 pt = 1/72 in (ISO 32000-1): 100 mm = 283.46 pt, 4 in = 288 pt.
    expect(CALIBRATION_IN_MM).toBeCloseTo(101.6, 10);
    for (let page = 0; page < sink.pages.length; page++) {
      const squares = sink.paths.filter((p) => p.page === page && p.paint === 'stroke').flatMap((p) => p.rects).filter((r) => Math.abs(r.w - r.h) < 1e-9);
      expect(squares.some((r) => Math.abs(r.w - 283.46) < 0.005), `page ${page + 1}: 100 mm square`).toBe(true);
      expect(squares.some((r) => Math.abs(r.w - 288) < 0.005), `page ${page + 1}: 4 in square`).toBe(true);
      expect(CALIBRATION_MM * PT_PER_MM).toBeCloseTo(283.4646, 4);
      const texts = sink.texts.filter((t) => t.page === page).map((t) => t.text);
      expect(texts).toContain('Print at 100 % / actual size,');
    }
  });

  it('names the piece, its quantity, the face it lines, its row and column, and carries a caution', () => {
    layout.tiles.forEach((tile, i) => {
      const item = items[tile.itemIndex]!;
      const texts = sink.texts.filter((t) => t.page === first + i).map((t) => t.text);
      const all = texts.join(' ');
      expect(all).toContain(item.name);
      expect(all).toMatch(item.kind === 'lining' ? /Cut \d+: \d+ per cabinet × \d cabinets/ : /\d+ cut-outs?: \d+ per cabinet/);
      if (item.kind === 'lining') expect(all).toMatch(/Lines the (back|left side|right side|top|bottom) face/);
      expect(all).toContain(`Page ${tile.label}: row ${tile.label[0]} of ${tile.rows}, column ${tile.col + 1} of ${tile.cols}`);
      expect(all).toMatch(/Caution: .*gloves.*local health-and-safety rules/);
      expect(texts).toContain('Page map');
    });
  });

  it('quantities multiply the per-cabinet count by the cabinets built', () => {
    // Demo: 2 bookshelves and 4 floorstanders (PRODUCT.md §9); each lining piece is cut once per cabinet.
    const lining = items.filter((i) => i.kind === 'lining');
    expect(lining.filter((i) => i.cabinetName.includes('bookshelf')).every((i) => i.quantityPerCabinet * i.cabinetCount === 2)).toBe(true);
    expect(lining.filter((i) => i.cabinetName.includes('floorstander')).every((i) => i.quantityPerCabinet * i.cabinetCount === 4)).toBe(true);
  });
});

describe('driver cut-out templates', () => {
  const items = stencilItemsFromBuild(demoBuild()).filter((i) => i.kind === 'template');
  it('one per distinct driver: identical woofers share one template with their count', () => {
    // Bookshelf: woofer Ø 118 and tweeter Ø 75; floorstander: two identical woofers Ø 118 and a tweeter Ø 75.
    const names = items.map((i) => `${i.cabinetName}|${i.name.replace(/^.* — /, '')}|${i.quantityPerCabinet}`);
    expect(names.sort()).toEqual([
      'Harbour bookshelf (two-way, rear port)|driver cut-out Ø 118 mm|1',
      'Harbour bookshelf (two-way, rear port)|driver cut-out Ø 75 mm|1',
      'Harbour slim floorstander|driver cut-out Ø 118 mm|2',
      'Harbour slim floorstander|driver cut-out Ø 75 mm|1',
    ]);
  });
  it('draw the cut-out, rebate and screw holes at the design sizes, centred on a cross', () => {
    // DEMO woofer: cut-out Ø 118, rebate Ø 134 × 5 mm, 4 screw holes Ø 4 on a Ø 126 circle (shared/demo/designs.ts).
    const woofer = items.find((i) => i.name.endsWith('Ø 118 mm'))!;
    const circles = woofer.shapes.filter((s) => s.type === 'circle');
    expect(circles.filter((c) => c.role === 'cut' && c.type === 'circle' && c.r === 59 && c.cx === 0 && c.cy === 0)).toHaveLength(1);
    expect(circles.filter((c) => c.role === 'rebate' && c.type === 'circle' && c.r === 67)).toHaveLength(1);
    const screws = circles.filter((c) => c.role === 'cut' && c.type === 'circle' && c.r === 2);
    expect(screws).toHaveLength(4);
    for (const s of screws) if (s.type === 'circle') expect(Math.hypot(s.cx, s.cy)).toBeCloseTo(63, 6);
    expect(woofer.labels.map((l) => l.text)).toEqual([
      'Cut-out Ø 118 mm (solid line)',
      'Rebate Ø 134 mm, 5 mm deep (dashed line)',
      '4 screw holes Ø 4 mm on a Ø 126 mm circle',
    ]);
  });
  it('fit on one A4 page', () => {
    const layout = layoutStencils(items, sheet('A4'));
    expect(layout.grids.every((g) => g.cols.count === 1 && g.rows.count === 1)).toBe(true);
  });
});

describe('stencil options', () => {
  it('fill in defaults (7 mm margin, 15 mm overlap)', () => {
    const r = parseStencilOptions({ paper: 'A3' });
    expect(r).toEqual({ ok: true, options: { paper: { kind: 'sheet', name: 'A3' }, marginMm: 7, overlapMm: 15 } });
  });
  it('reject bad input naming the field', () => {
    const cases: [unknown, string][] = [
      [{ paper: 'B5' }, 'paper'],
      [{ paper: 'roll' }, 'rollWidthMm'],
      [{ paper: 'roll', rollWidthMm: 100 }, 'rollWidthMm'],
      [{ paper: 'A4', overlapMm: 2 }, 'overlapMm'],
      [{ paper: 'A4', marginMm: 'wide' }, 'marginMm'],
    ];
    for (const [input, field] of cases) {
      const r = parseStencilOptions(input);
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(Object.keys(r.fields)).toContain(field);
        expect(r.message.startsWith(field)).toBe(true);
      }
    }
  });
});

describe('piece labels', () => {
  it('sit on the material, clear of the holes (the back lining’s port hole is at its centre)', () => {
    const [item] = stencilItemsFromBuild([{ ...BOOKSHELF_CABINET, plan: { panels: [], liningPieces: [BACK_LOWER] } }]);
    const name = item!.labels[0]!;
    // Port hole Ø 66 at (94.5, 74.5): it spans y 41.5 … 107.5; the piece's centre (94.5, 96.5) lies in it.
    const halfH = name.sizeMm * 1.3;
    expect(name.y - halfH > 107.5 || name.y + halfH < 41.5).toBe(true);
    expect(name.y).toBeGreaterThan(0);
    expect(name.y).toBeLessThan(193);
  });
});
