import { describe, expect, it } from 'vitest';
import { CUT_DIAGRAM_CAUTIONS } from '../../../shared/render/cautions.js';
import { CUT_ORDER_LINE, cutDiagramSvgs, drawCutDiagrams, hatchLines, type CutDiagramInput } from '../../../shared/render/cut-diagram.js';
import { PT_PER_MM } from '../../../shared/render/pdf-sink.js';
import type { Layout } from '../../../shared/schemas/nest.schema.js';
import { FakeSink } from './fake-sink.js';
import { SMALL_LAYOUT, SMALL_PARTS, SMALL_STOCK } from './fixtures.js';

const INPUT: CutDiagramInput = { title: 'Harbour Lane build', layouts: [SMALL_LAYOUT], parts: SMALL_PARTS, stock: SMALL_STOCK, kerfMm: 4, liningMassKg: 1.25 };

function draw(input: CutDiagramInput = INPUT) {
  const sink = new FakeSink();
  drawCutDiagrams(sink, input, 'A4');
  const textsOn = (page: number) => sink.texts.filter((t) => t.page === page).map((t) => t.text);
  return { sink, textsOn };
}

describe('cut diagram pages', () => {
  it('one landscape A4 page per sheet and roll, then the cut list with totals and cautions', () => {
    const { sink, textsOn } = draw();
    // A4 turned: 297 × 210 mm = 841.89 × 595.28 pt (ISO 216; 1 pt = 1/72 in, ISO 32000-1).
    expect(sink.pages).toHaveLength(3);
    for (const p of sink.pages) {
      expect(p.widthPt).toBeCloseTo(841.89, 2);
      expect(p.heightPt).toBeCloseTo(595.28, 2);
    }
    expect(textsOn(0)[0]).toMatch(/^Sheet 1 · MDF 18 mm · 2440 × 1220 mm/);
    expect(textsOn(1)[0]).toMatch(/^Roll 1 · polyester batt 50 mm · 1200 mm wide, 400 mm used/);
    expect(textsOn(2)).toContain('Cut list (sizes in mm)');
  });

  it('draws every part to scale in its place on the sheet', () => {
    const { sink } = draw();
    const sheet = SMALL_LAYOUT.sheets[0]!;
    const outline = sink.paths.find((p) => p.page === 0 && p.rects.length === 1 && p.strokeColor === '#000000' && p.fillColor === '#ffffff')!.rects[0]!;
    const k = outline.w / sheet.width;
    expect(outline.h / sheet.height).toBeCloseTo(k, 12);
    const parts = sink.paths.filter((p) => p.page === 0 && p.fillColor === '#e4edf8' && p.paint === 'both').map((p) => p.rects[0]!);
    expect(parts).toHaveLength(sheet.placements.length);
    sheet.placements.forEach((pl, i) => {
      expect(parts[i]!.x - outline.x).toBeCloseTo(pl.x * k, 9);
      expect(parts[i]!.y - outline.y).toBeCloseTo(pl.y * k, 9);
      expect(parts[i]!.w).toBeCloseTo(pl.width * k, 9);
      expect(parts[i]!.h).toBeCloseTo(pl.height * k, 9);
    });
    // The printed scale matches the drawing: 1 : (sheet mm / drawn mm).
    const drawnMm = outline.w / PT_PER_MM;
    const scaleText = draw().textsOn(0).find((t) => t.includes('scale 1:'))!;
    expect(scaleText).toContain(`scale 1:${(sheet.width / drawnMm).toFixed(1)}`);
  });

  it('labels parts with name and size, as named (a turned part shows its own width × height)', () => {
    const { textsOn } = draw();
    const t = textsOn(0);
    expect(t).toContain('3. Back');
    expect(t).toContain('220 × 360');
    expect(t).toContain('5. Left side · 224 × 360 (turned) · Harbour bookshelf');
  });

  it('numbers the guillotine cuts in cut order along red lines', () => {
    const { sink, textsOn } = draw();
    const red = sink.paths.filter((p) => p.page === 0 && p.paint === 'stroke' && p.strokeColor === CUT_ORDER_LINE.color && p.segments.length === 1);
    expect(red).toHaveLength(SMALL_LAYOUT.sheets[0]!.cuts.length);
    const numbers = sink.texts.filter((x) => x.page === 0 && x.color === CUT_ORDER_LINE.color).map((x) => x.text);
    expect(numbers).toEqual(['1', '2', '3', '4', '5', '6', '7']);
    expect(textsOn(1).join(' ')).toContain('0 cuts');
  });

  it('hatches the offcuts and gives their sizes; utilisation and waste by hand', () => {
    const { sink, textsOn } = draw();
    expect(textsOn(0)).toContain('offcut 2440 × 492');
    expect(textsOn(0)).toContain('offcut 1768 × 362');
    expect(sink.paths.filter((p) => p.page === 0 && p.strokeColor === '#a8a8a8').length).toBeGreaterThan(50);
    // Parts 3 × 220 × 360 + 2 × 224 × 360 = 398 880 mm² of 2 976 800: 13.4 %. Offcuts 2440 × 492 + 1768 × 362
    // = 1 200 480 + 640 016 = 1 840 496 mm² (1.84 m²); waste 2 976 800 − 398 880 − 1 840 496 = 737 424 mm² (0.74 m²).
    const stats = textsOn(0)[1]!;
    expect(stats).toContain('Utilisation 13.4 %');
    expect(stats).toContain('2 offcuts to keep (1.84 m²)');
    expect(stats).toContain('waste 0.74 m²');
    expect(stats).toContain('kerf 4 mm');
  });

  it('hatch lines stay inside their rectangle and run at 45°', () => {
    for (const [x1, y1, x2, y2] of hatchLines(10, 20, 30, 12, 2)) {
      for (const [x, y] of [
        [x1, y1],
        [x2, y2],
      ] as const) {
        expect(x).toBeGreaterThanOrEqual(10 - 1e-9);
        expect(x).toBeLessThanOrEqual(40 + 1e-9);
        expect(y).toBeGreaterThanOrEqual(20 - 1e-9);
        expect(y).toBeLessThanOrEqual(32 + 1e-9);
      }
      expect(x2 - x1).toBeCloseTo(y2 - y1, 12);
    }
  });

  it('prints the cut list, material totals and every caution (REFERENCES.md §9 wording)', () => {
    const { textsOn } = draw();
    const t = textsOn(2);
    expect(t).toContain('Front (baffle)');
    expect(t).toContain('roll 1');
    expect(t).toContain('Material cost: 40.98');
    expect(t).toContain('Lining weight: 1.25 kg');
    expect(t).toContain('Sheets: 1 · roll length: 0.40 m');
    const all = t.join(' ');
    for (const c of CUT_DIAGRAM_CAUTIONS) expect(all).toContain(c.split(' ').slice(0, 6).join(' '));
    expect(all).toMatch(/respirator/);
    expect(all).toMatch(/riving knife/);
    expect(all).toMatch(/full sheet is heavy/);
    expect(all).toMatch(/local health-and-safety rules/);
    // Every page carries the short caution at its foot.
    for (let p = 0; p < 3; p++) expect(textsOn(p).some((x) => x.startsWith('Caution: wood dust'))).toBe(true);
  });

  it('warns in red about parts that found no place, saying why', () => {
    const layout: Layout = { ...SMALL_LAYOUT, unplaced: [{ partId: 'back', quantity: 2, reason: 'no stock of this material and thickness' }] };
    const { sink } = draw({ ...INPUT, layouts: [layout] });
    const warn = sink.texts.filter((t) => t.text.startsWith('NOT PLACED'));
    expect(warn.map((w) => w.text)).toEqual([
      'NOT PLACED: 2 parts — add stock and plan again',
      'NOT PLACED: 2 × Back (Harbour bookshelf), 220 × 360 × 18 mm MDF — no stock of this material and thickness',
    ]);
    for (const w of warn) expect(w.color).toBe('#b71c1c');
  });

  it('runs the cut list onto more pages when it is long', () => {
    const many = Array.from({ length: 60 }, (_, i) => ({ ...SMALL_PARTS[0]!, id: `p${i}`, name: `Part ${i + 1}` }));
    const layout: Layout = { sheets: [{ ...SMALL_LAYOUT.sheets[0]!, placements: many.map((p, i) => ({ partId: p.id, x: (i % 10) * 224, y: Math.floor(i / 10) * 100, width: 220, height: 96, rotated: false })), cuts: [], offcuts: [] }], unplaced: [], stats: SMALL_LAYOUT.stats };
    const { sink, textsOn } = draw({ ...INPUT, layouts: [layout], parts: many });
    expect(sink.pages.length).toBeGreaterThanOrEqual(3);
    const listed = sink.pages.flatMap((_, p) => (p === 0 ? [] : textsOn(p))).filter((t) => /^Part \d+$/.test(t));
    expect(new Set(listed).size).toBe(60);
    // Nothing is written below the page's bottom margin (10 mm).
    for (const t of sink.texts) expect(t.y).toBeLessThanOrEqual(sink.pages[t.page]!.heightPt - 2 * PT_PER_MM);
  });
});

describe('cut diagram SVG', () => {
  const svgs = cutDiagramSvgs(INPUT);
  it('one SVG per sheet, sized in mm with a viewBox in mm', () => {
    expect(svgs.map((s) => s.label)).toEqual(['1', 'roll 1']);
    for (const { svg } of svgs) {
      const m = svg.match(/<svg [^>]*width="([\d.]+)mm" height="([\d.]+)mm" viewBox="0 0 ([\d.]+) ([\d.]+)"/);
      expect(m).not.toBeNull();
      expect(m![1]).toBe(m![3]);
      expect(m![2]).toBe(m![4]);
    }
  });
  it('draws the sheet 1:1: the sheet is 2440 × 1220 user units (mm), and each part its own size', () => {
    const svg = svgs[0]!.svg;
    expect(svg).toMatch(/<rect x="[\d.]+" y="[\d.]+" width="2440" height="1220" fill="#ffffff"/);
    expect(svg.match(/<rect [^>]*fill="#e4edf8"/g)).toHaveLength(5);
    expect(svg).toMatch(/<rect [^>]*width="360" height="224" fill="#e4edf8"/);
    expect(svg).toContain('offcut 2440 × 492');
  });
  it('escapes names for XML', () => {
    const svg = cutDiagramSvgs({ ...INPUT, parts: [{ ...SMALL_PARTS[0]!, name: 'Front <A> & "B"' }, ...SMALL_PARTS.slice(1)] })[0]!.svg;
    for (const piece of ['&lt;A&gt;', '&amp;', '&quot;B&quot;']) expect(svg).toContain(piece);
    expect(svg).not.toContain('<A>');
  });
});
