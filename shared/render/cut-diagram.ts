/**
 * Cut diagrams: one page per sheet or roll of a layout (parts to scale, labelled with name and size,
 * numbered guillotine cuts in cut order, hatched offcuts with their sizes, utilisation and waste),
 * then the cut-list table, the material totals and the cautions. As PDF pages (through a PdfSink)
 * and as SVG strings in mm (one per sheet, drawn 1:1).
 *
 * Sheets are drawn with the layout's origin at the top-left corner, x to the right, y down.
 */
import type { Layout, LayoutSheet } from '../schemas/nest.schema.js';
import type { CutPart } from './build.js';
import { CUT_DIAGRAM_CAUTIONS, CUT_DIAGRAM_FOOT_CAUTION } from './cautions.js';
import { cutListRows, materialTotals, numberSheets, placedArea, type MaterialTotals, type NumberedSheet, type StockInfo } from './cut-list.js';
import { PAPER_SIZES_MM, type SheetPaperName } from './paper.js';
import { PT_PER_MM, type PdfSink } from './pdf-sink.js';
import { drawScene, estimateTextWidthMm, line, sceneToSvg, text, textBlock, type LineStyle, type Prim } from './scene.js';
import { fmtMm } from './stencil-items.js';

export interface CutDiagramInput {
  /** Shown on every page: "Harbour Lane build — 2 bookshelves, 4 floorstanders". */
  title: string;
  layouts: readonly Layout[];
  parts: readonly CutPart[];
  stock?: readonly StockInfo[];
  kerfMm?: number;
  liningMassKg?: number;
  /** Written after costs ("EUR"); none by default. */
  currency?: string;
}

const PART_FILL = '#e4edf8';
const PART_LINE: LineStyle = { color: '#1d3557', widthMm: 0.25 };
export const CUT_ORDER_LINE: LineStyle = { color: '#c62828', widthMm: 0.3 };
const OFFCUT_LINE: LineStyle = { color: '#6b6b6b', widthMm: 0.2, dashMm: [1.5, 1] };
const HATCH_LINE: LineStyle = { color: '#a8a8a8', widthMm: 0.15 };
const SHEET_LINE: LineStyle = { color: '#000000', widthMm: 0.4 };
const TRIM_LINE: LineStyle = { color: '#8d6e63', widthMm: 0.15, dashMm: [1, 1] };

/** Sizes of the decorations, in output mm (they do not scale with the sheet). */
interface Decor {
  textMm: number;
  lineScale: number;
}

function scaled(style: LineStyle, k: number): LineStyle {
  return { ...style, widthMm: style.widthMm * k, ...(style.dashMm ? { dashMm: [style.dashMm[0] * k, style.dashMm[1] * k] as const } : {}) };
}

/** 45° hatch lines inside a rectangle, `gap` apart (all in output mm). */
export function hatchLines(x: number, y: number, w: number, h: number, gap: number): [number, number, number, number][] {
  const out: [number, number, number, number][] = [];
  // Lines x − y = c for c from −h to w: enter and leave the rectangle.
  for (let c = -h + gap / 2; c < w; c += gap) {
    const x1 = Math.max(0, c);
    const y1 = x1 - c;
    const x2 = Math.min(w, c + h);
    const y2 = x2 - c;
    out.push([x + x1, y + y1, x + x2, y + y2]);
  }
  return out;
}

/** Smallest label text (mm) before a part shows only its number: about 4.5 pt. */
const MIN_LABEL_MM = 1.6;

function partLabelPrims(x: number, y: number, w: number, h: number, n: number, part: CutPart | undefined, widthMm: number, heightMm: number, d: Decor): Prim[] {
  const cx = x + w / 2;
  const cy = y + h / 2;
  const lines = [`${n}. ${part?.name ?? '?'}`, `${fmtMm(widthMm)} × ${fmtMm(heightMm)}`, part?.cabinet ?? ''].filter(Boolean);
  const minMm = MIN_LABEL_MM * (d.textMm / 3.2);
  // Fewer lines at a readable size beat more lines in small print: the first pass wants 70 % of full size.
  for (const wanted of [d.textMm * 0.7, minMm]) {
    for (let count = lines.length; count >= 1; count--) {
      const shown = lines.slice(0, count);
      // The largest size (up to d.textMm) at which every line fits 92 % of the width and the block 90 % of the height.
      const widthLimit = Math.min(...shown.map((l, i) => (w * 0.92) / (estimateTextWidthMm(l, 1, i === 0 ? 'bold' : 'regular') * (i === 0 ? 1 : 0.85))));
      const heightLimit = (h * 0.9) / (shown.length * 1.25);
      const size = Math.min(d.textMm, widthLimit, heightLimit);
      if (size >= wanted) {
        const lh = size * 1.25;
        const top = cy - (shown.length * lh) / 2 + size * 0.85;
        return shown.map((l, i) => text(cx, top + i * lh, l, i === 0 ? size : size * 0.85, { align: 'center', font: i === 0 ? 'bold' : 'regular', color: '#1d3557' }));
      }
    }
  }
  const small = Math.min(d.textMm, Math.min(w, h) * 0.7);
  return [text(cx, cy + small * 0.35, String(n), small, { align: 'center', font: 'bold', color: '#1d3557' })];
}

/**
 * One sheet drawn at `scale` (output mm per sheet mm) with its top-left at (x0, y0). Placements are
 * numbered 1, 2… in layout order, as in the legend.
 */
export function sheetPrims(sheet: LayoutSheet, parts: ReadonlyMap<string, CutPart>, x0: number, y0: number, scale: number, d: Decor, trimMm = 0): Prim[] {
  const S = (v: number) => v * scale;
  const prims: Prim[] = [{ kind: 'rect', x: x0, y: y0, w: S(sheet.width), h: S(sheet.height), fill: '#ffffff', stroke: scaled(SHEET_LINE, d.lineScale) }];
  if (trimMm > 0) {
    prims.push({ kind: 'rect', x: x0 + S(trimMm), y: y0 + S(trimMm), w: S(sheet.width - 2 * trimMm), h: S(sheet.height - 2 * trimMm), stroke: scaled(TRIM_LINE, d.lineScale) });
  }
  for (const o of sheet.offcuts ?? []) {
    const x = x0 + S(o.x);
    const y = y0 + S(o.y);
    for (const [ax, ay, bx, by] of hatchLines(x, y, S(o.width), S(o.height), d.textMm * 0.9)) prims.push(line(ax, ay, bx, by, scaled(HATCH_LINE, d.lineScale)));
    prims.push({ kind: 'rect', x, y, w: S(o.width), h: S(o.height), stroke: scaled(OFFCUT_LINE, d.lineScale) });
    const label = `offcut ${fmtMm(o.width)} × ${fmtMm(o.height)}`;
    const size = d.textMm * 0.8;
    if (estimateTextWidthMm(label, size) < S(o.width) * 0.9 && S(o.height) > size * 1.6) {
      const tw = estimateTextWidthMm(label, size);
      prims.push({ kind: 'rect', x: x + S(o.width) / 2 - tw / 2 - size * 0.3, y: y + S(o.height) / 2 - size * 0.9, w: tw + size * 0.6, h: size * 1.3, fill: '#ffffff' });
      prims.push(text(x + S(o.width) / 2, y + S(o.height) / 2 + size * 0.1, label, size, { align: 'center', color: '#444444' }));
    }
  }
  sheet.placements.forEach((p, i) => {
    const x = x0 + S(p.x);
    const y = y0 + S(p.y);
    prims.push({ kind: 'rect', x, y, w: S(p.width), h: S(p.height), fill: PART_FILL, stroke: scaled(PART_LINE, d.lineScale) });
    const part = parts.get(p.partId);
    // Size as the part is named (before any turn), so it matches the cut list.
    const [pw, ph] = p.rotated ? [p.height, p.width] : [p.width, p.height];
    prims.push(...partLabelPrims(x, y, S(p.width), S(p.height), i + 1, part, pw, ph, d));
  });
  const badge = d.textMm * 0.65;
  for (const c of [...sheet.cuts].sort((a, b) => a.order - b.order)) {
    prims.push(line(x0 + S(c.x1), y0 + S(c.y1), x0 + S(c.x2), y0 + S(c.y2), scaled(CUT_ORDER_LINE, d.lineScale)));
  }
  for (const c of sheet.cuts) {
    // The cut's number sits near its start, where the saw enters.
    const horizontal = Math.abs(c.y2 - c.y1) < Math.abs(c.x2 - c.x1);
    const bx = x0 + S(c.x1) + (horizontal ? badge * 1.6 : 0);
    const by = y0 + S(c.y1) + (horizontal ? 0 : badge * 1.6);
    prims.push({ kind: 'circle', cx: bx, cy: by, r: badge, fill: '#ffffff', stroke: scaled(CUT_ORDER_LINE, d.lineScale) });
    prims.push(text(bx, by + badge * 0.38, String(c.order), badge * 1.05, { align: 'center', font: 'bold', color: CUT_ORDER_LINE.color }));
  }
  return prims;
}

function kindWord(n: NumberedSheet): string {
  return n.kind === 'roll' ? 'Roll' : n.kind === 'remnant' ? 'Remnant' : 'Sheet';
}

function percent(v: number): string {
  return `${(v * 100).toFixed(1)} %`;
}

export function sheetUtilisation(sheet: LayoutSheet): number {
  return sheet.utilisation ?? (sheet.width * sheet.height > 0 ? placedArea(sheet) / (sheet.width * sheet.height) : 0);
}

function sheetTitle(n: NumberedSheet, stock: readonly StockInfo[]): string {
  const info = stock.find((s) => s.id === n.sheet.stockId);
  const material = [info?.material, info?.thickness !== undefined ? `${fmtMm(info.thickness)} mm` : undefined].filter(Boolean).join(' ');
  const size = n.kind === 'roll' ? `${fmtMm(n.sheet.width)} mm wide, ${fmtMm(n.sheet.height)} mm used` : `${fmtMm(n.sheet.width)} × ${fmtMm(n.sheet.height)} mm`;
  return `${kindWord(n)} ${n.kind === 'roll' ? n.label.replace('roll ', '') : n.label}${material ? ` · ${material}` : ''} · ${size} · stock "${n.sheet.stockId}"`;
}

function sheetStats(n: NumberedSheet, kerfMm: number | undefined): string {
  const s = n.sheet;
  const offcutArea = (s.offcuts ?? []).reduce((a, o) => a + o.width * o.height, 0);
  const wasteM2 = Math.max(0, s.width * s.height - placedArea(s) - offcutArea) / 1e6;
  const bits = [`Utilisation ${percent(sheetUtilisation(s))}`, `${s.placements.length} parts`, `${s.cuts.length} cuts`];
  if (s.offcuts?.length) bits.push(`${s.offcuts.length} offcut${s.offcuts.length === 1 ? '' : 's'} to keep (${(offcutArea / 1e6).toFixed(2)} m²)`);
  bits.push(`waste ${wasteM2.toFixed(2)} m²`);
  if (kerfMm !== undefined) bits.push(`kerf ${fmtMm(kerfMm)} mm`);
  return bits.join(' · ');
}

interface Page {
  widthMm: number;
  heightMm: number;
  prims: Prim[];
}

const MARGIN = 10;

function pageSize(paper: SheetPaperName, landscape: boolean): { w: number; h: number } {
  const p = PAPER_SIZES_MM[paper];
  return landscape ? { w: p.heightMm, h: p.widthMm } : { w: p.widthMm, h: p.heightMm };
}

function footer(page: { w: number; h: number }, title: string, pageNo: number, pageCount: number): Prim[] {
  return [
    text(MARGIN, page.h - MARGIN / 2 - 2.4, CUT_DIAGRAM_FOOT_CAUTION, 2.3, { color: '#7a1f00' }),
    text(page.w - MARGIN, page.h - MARGIN / 2 + 1, `${title} · page ${pageNo} of ${pageCount}`, 2.4, { align: 'right', color: '#777777' }),
  ];
}

function sheetPage(n: NumberedSheet, input: CutDiagramInput, parts: ReadonlyMap<string, CutPart>, paper: SheetPaperName, sheetCount: number, index: number): Page {
  const s = n.sheet;
  const page = pageSize(paper, s.width >= s.height);
  const stock = input.stock ?? [];
  const prims: Prim[] = [];
  prims.push(text(MARGIN, MARGIN + 4, `${sheetTitle(n, stock)}   (${index + 1} of ${sheetCount})`, 4.2, { font: 'bold' }));
  const info = stock.find((x) => x.id === s.stockId);
  const grain = info?.grain === 'length' ? ' · grain along the length' : '';
  // Legend under the drawing: every placement with its number.
  const legendCols = page.w > page.h ? 3 : 2;
  const legendRows = Math.ceil(s.placements.length / legendCols);
  const legendLh = 3.3;
  const legendH = legendRows > 0 ? legendRows * legendLh + 4 : 0;
  const top = MARGIN + 13;
  const bottom = page.h - MARGIN - 6 - legendH;
  const availW = page.w - 2 * MARGIN;
  const availH = bottom - top;
  const scale = Math.min(availW / s.width, availH / s.height);
  prims.push(text(MARGIN, MARGIN + 9.5, `${sheetStats(n, input.kerfMm)} · scale 1:${(1 / scale).toFixed(1)}${grain}`, 3));
  const x0 = MARGIN + (availW - s.width * scale) / 2;
  prims.push(...sheetPrims(s, parts, x0, top, scale, { textMm: 3.2, lineScale: 1 }, info?.trim ?? 0));
  const colW = availW / legendCols;
  const ly = top + s.height * scale + 5;
  s.placements.forEach((p, i) => {
    const part = parts.get(p.partId);
    const [pw, ph] = p.rotated ? [p.height, p.width] : [p.width, p.height];
    const label = `${i + 1}. ${part?.name ?? p.partId} — ${part?.cabinet ?? ''} · ${fmtMm(pw)} × ${fmtMm(ph)}${p.rotated ? ' (turned)' : ''}`;
    const col = Math.floor(i / legendRows);
    const row = i % legendRows;
    prims.push(text(MARGIN + col * colW, ly + row * legendLh, clip(label, colW - 2, 2.5), 2.5));
  });
  return { widthMm: page.w, heightMm: page.h, prims };
}

/** Shortens `value` with an ellipsis so that it fits `widthMm` (by the estimate). */
function clip(value: string, widthMm: number, sizeMm: number): string {
  if (estimateTextWidthMm(value, sizeMm) <= widthMm) return value;
  let v = value;
  while (v.length > 1 && estimateTextWidthMm(`${v}…`, sizeMm) > widthMm) v = v.slice(0, -1);
  return `${v}…`;
}

function money(v: number, currency?: string): string {
  return `${v.toFixed(2)}${currency ? ` ${currency}` : ''}`;
}

/** Lines of the totals block. */
export function totalsLines(t: MaterialTotals, currency?: string): string[] {
  const lines: string[] = [];
  for (const u of t.stock) {
    const what = [u.material, u.thickness !== undefined ? `${fmtMm(u.thickness)} mm` : undefined].filter(Boolean).join(' ');
    const cost = u.cost === null ? 'no price' : money(u.cost, currency);
    if (u.kind === 'roll') lines.push(`Roll "${u.stockId}"${what ? ` (${what})` : ''}, ${fmtMm(u.widthMm)} mm wide: ${(u.lengthMm / 1000).toFixed(2)} m — ${cost}`);
    else lines.push(`${u.kind === 'remnant' ? 'Remnant' : 'Sheet'} "${u.stockId}"${what ? ` (${what})` : ''}, ${fmtMm(u.widthMm)} × ${fmtMm(u.heightMm ?? 0)} mm: ${u.count} — ${cost}`);
  }
  lines.push(`Sheets: ${t.sheetsUsed}${t.remnantsUsed ? ` (and ${t.remnantsUsed} remnant${t.remnantsUsed === 1 ? '' : 's'})` : ''} · roll length: ${(t.rollLengthMm / 1000).toFixed(2)} m`);
  lines.push(`Material cost: ${t.cost === null ? 'no prices given' : money(t.cost, currency)}${t.costIncomplete ? ' (some stock has no price)' : ''}`);
  if (t.liningMassKg !== undefined) lines.push(`Lining weight: ${t.liningMassKg.toFixed(2)} kg`);
  lines.push(`Parts placed: ${t.partsPlaced} · overall utilisation ${percent(t.utilisation)}`);
  if (t.partsUnplaced > 0) lines.push(`NOT PLACED: ${t.partsUnplaced} part${t.partsUnplaced === 1 ? '' : 's'} — add stock and plan again`);
  return lines;
}

function tablePages(input: CutDiagramInput, paper: SheetPaperName): Page[] {
  const page = pageSize(paper, true);
  const rows = cutListRows(input.layouts, input.parts, input.stock ?? []);
  const totals = materialTotals(input.layouts, input.stock ?? [], input.liningMassKg);
  const w = page.w - 2 * MARGIN;
  const cols: [string, number, 'left' | 'right'][] = [
    ['Part', 0.2, 'left'],
    ['Cabinet', 0.2, 'left'],
    ['Width', 0.07, 'right'],
    ['Height', 0.07, 'right'],
    ['Thick.', 0.06, 'right'],
    ['Qty', 0.05, 'right'],
    ['Grain', 0.1, 'left'],
    ['Material', 0.13, 'left'],
    ['Sheet', 0.12, 'left'],
  ];
  const lh = 4.4;
  const pages: Page[] = [];
  let prims: Prim[] = [];
  let y = 0;
  const newPage = (heading: string) => {
    prims = [text(MARGIN, MARGIN + 4, heading, 4.2, { font: 'bold' })];
    pages.push({ widthMm: page.w, heightMm: page.h, prims });
    y = MARGIN + 13;
  };
  const header = () => {
    let x = MARGIN;
    for (const [name, share, align] of cols) {
      prims.push(text(align === 'right' ? x + share * w - 2 : x, y, name, 3, { font: 'bold', align }));
      x += share * w;
    }
    prims.push(line(MARGIN, y + 1.5, MARGIN + w, y + 1.5, { color: '#000000', widthMm: 0.25 }));
    y += lh + 0.5;
  };
  const limit = page.h - MARGIN - 8;
  newPage('Cut list (sizes in mm)');
  header();
  rows.forEach((r, i) => {
    if (y > limit) {
      newPage('Cut list (continued)');
      header();
    }
    if (i % 2 === 1) prims.push({ kind: 'rect', x: MARGIN, y: y - 3.2, w, h: lh, fill: '#f3f3f3' });
    const cells = [r.part, r.cabinet, fmtMm(r.widthMm), fmtMm(r.heightMm), fmtMm(r.thicknessMm), String(r.quantity), r.grain, r.material, r.sheet];
    let x = MARGIN;
    cells.forEach((c, k) => {
      const [, share, align] = cols[k]!;
      const color = r.sheet === 'not placed' ? '#b71c1c' : '#000000';
      prims.push(text(align === 'right' ? x + share * w - 2 : x, y, clip(c, share * w - 3, 2.9), 2.9, { align, color }));
      x += share * w;
    });
    y += lh;
  });
  // Totals and cautions, on the same page if they fit.
  const totalLines = totalsLines(totals, input.currency);
  const cautionH = CUT_DIAGRAM_CAUTIONS.length * 9 + 10;
  if (y + 12 + totalLines.length * 5 + cautionH > limit) newPage('Totals and cautions');
  else y += 6;
  prims.push(text(MARGIN, y, 'Material totals', 3.8, { font: 'bold' }));
  y += 6;
  for (const l of totalLines) {
    prims.push(text(MARGIN, y, l, 3.1, { color: l.startsWith('NOT PLACED') ? '#b71c1c' : '#000000' }));
    y += 4.8;
  }
  y += 4;
  prims.push(text(MARGIN, y, 'Cautions', 3.8, { font: 'bold', color: '#7a1f00' }));
  y += 5.5;
  for (const c of CUT_DIAGRAM_CAUTIONS) {
    const b = textBlock(MARGIN, y, c, w, 2.9);
    prims.push(...b.prims);
    y = b.bottomMm + 4;
  }
  return pages;
}

/** Every page of the cut diagrams (scenes in mm): sheets, then the cut list, totals and cautions. */
export function buildCutDiagramPages(input: CutDiagramInput, paper: SheetPaperName = 'A4'): Page[] {
  const parts = new Map(input.parts.map((p) => [p.id, p]));
  const numbered = numberSheets(input.layouts, input.stock ?? []);
  const pages = [...numbered.map((n, i) => sheetPage(n, input, parts, paper, numbered.length, i)), ...tablePages(input, paper)];
  pages.forEach((p, i) => p.prims.push(...footer({ w: p.widthMm, h: p.heightMm }, input.title, i + 1, pages.length)));
  return pages;
}

/** Draws the cut diagrams onto the sink. */
export function drawCutDiagrams(sink: PdfSink, input: CutDiagramInput, paper: SheetPaperName = 'A4'): void {
  for (const page of buildCutDiagramPages(input, paper)) {
    sink.addPage(page.widthMm * PT_PER_MM, page.heightMm * PT_PER_MM);
    drawScene(sink, page.prims);
  }
}

/**
 * One SVG per sheet, drawn 1:1 (width="…mm", viewBox in mm), with a title band above the sheet.
 * `label` is the sheet's number as on the PDF ("1", "roll 1").
 */
export function cutDiagramSvgs(input: CutDiagramInput): { label: string; svg: string }[] {
  const parts = new Map(input.parts.map((p) => [p.id, p]));
  return numberSheets(input.layouts, input.stock ?? []).map((n) => {
    const s = n.sheet;
    const textMm = Math.max(12, Math.min(40, Math.max(s.width, s.height) / 80));
    const pad = textMm;
    const band = textMm * 3.2;
    const widthMm = s.width + 2 * pad;
    const heightMm = s.height + band + 2 * pad;
    const stock = input.stock ?? [];
    const info = stock.find((x) => x.id === s.stockId);
    const prims: Prim[] = [
      text(pad, pad + textMm, sheetTitle(n, stock), textMm, { font: 'bold' }),
      text(pad, pad + textMm * 2.4, sheetStats(n, input.kerfMm), textMm * 0.8),
      ...sheetPrims(s, parts, pad, pad + band, 1, { textMm, lineScale: textMm / 3 }, info?.trim ?? 0),
    ];
    return { label: n.label, svg: sceneToSvg(prims, widthMm, heightMm, `${input.title} — ${kindWord(n)} ${n.label}`) };
  });
}

