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
import type { PdfSink } from './pdf-sink.js';
import { clipText, drawPages, estimateTextWidthMm, line, sceneToSvg, text, textBlock, type LineStyle, type Prim, type ScenePage } from './scene.js';
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

/** `value` in two lines, broken at the space nearest its middle (one line when it has no space). */
function splitInTwo(value: string): string[] {
  const spaces = [...value.matchAll(/ /g)].map((m) => m.index);
  if (spaces.length === 0) return [value];
  const at = spaces.reduce((best, i) => (Math.abs(i - value.length / 2) < Math.abs(best - value.length / 2) ? i : best));
  return [value.slice(0, at), value.slice(at + 1)];
}

function partLabelPrims(x: number, y: number, w: number, h: number, n: number, part: CutPart | undefined, widthMm: number, heightMm: number, d: Decor): Prim[] {
  const cx = x + w / 2;
  const cy = y + h / 2;
  const title = `${n}. ${part?.name ?? '?'}`;
  const size = `${fmtMm(widthMm)} × ${fmtMm(heightMm)}`;
  const cabinet = part?.cabinet ? [part.cabinet] : [];
  const broken = splitInTwo(title);
  // Candidate labels, best first: [lines, how many of them are the (bold) title].
  const candidates: [string[], number][] = [
    [[title, size, ...cabinet], 1],
    [[title, size], 1],
    [[...broken, size], broken.length],
    [[title], 1],
    [broken, broken.length],
  ];
  const minMm = MIN_LABEL_MM * (d.textMm / 3.2);
  // Fewer lines at a readable size beat more lines in small print: the first pass wants 70 % of full size.
  for (const wanted of [d.textMm * 0.7, minMm]) {
    for (const [lines, bold] of candidates) {
      // The largest size (up to d.textMm) at which every line fits 92 % of the width and the block 90 % of the height.
      const widthLimit = Math.min(...lines.map((l, i) => (w * 0.92) / (estimateTextWidthMm(l, 1, i < bold ? 'bold' : 'regular') * (i < bold ? 1 : 0.85))));
      const fontMm = Math.min(d.textMm * 0.85, widthLimit, (h * 0.9) / (lines.length * 1.25));
      if (fontMm >= wanted) {
        const lh = fontMm * 1.25;
        const top = cy - (lines.length * lh) / 2 + fontMm * 0.85;
        return lines.map((l, i) => text(cx, top + i * lh, l, i < bold ? fontMm : fontMm * 0.85, { align: 'center', font: i < bold ? 'bold' : 'regular', color: '#1d3557' }));
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
  // Each cut's number sits on its line near where the saw enters, moved along the line when it would
  // cover another number.
  const badges: [number, number][] = [];
  for (const c of [...sheet.cuts].sort((a, b) => a.order - b.order)) {
    const len = S(Math.hypot(c.x2 - c.x1, c.y2 - c.y1));
    const ux = len > 0 ? S(c.x2 - c.x1) / len : 0;
    const uy = len > 0 ? S(c.y2 - c.y1) / len : 0;
    const at = (t: number): [number, number] => [x0 + S(c.x1) + ux * t, y0 + S(c.y1) + uy * t];
    let spot = at(Math.min(badge * 1.6, len / 2));
    for (let t = badge * 1.6; t <= len - badge; t += badge * 1.2) {
      const p = at(t);
      if (badges.every(([bx, by]) => Math.hypot(bx - p[0], by - p[1]) >= badge * 2.2)) {
        spot = p;
        break;
      }
    }
    badges.push(spot);
    prims.push({ kind: 'circle', cx: spot[0], cy: spot[1], r: badge, fill: '#ffffff', stroke: scaled(CUT_ORDER_LINE, d.lineScale) });
    prims.push(text(spot[0], spot[1] + badge * 0.38, String(c.order), badge * 1.05, { align: 'center', font: 'bold', color: CUT_ORDER_LINE.color }));
  }
  return prims;
}

function kindWord(n: Pick<NumberedSheet, 'kind'>): string {
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
  return `${sheetName(n)}${material ? ` · ${material}` : ''} · ${size} · stock "${n.sheet.stockId}"`;
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

const MARGIN = 10;

function pageSize(paper: SheetPaperName, landscape: boolean): { w: number; h: number } {
  const p = PAPER_SIZES_MM[paper];
  return landscape ? { w: p.heightMm, h: p.widthMm } : { w: p.widthMm, h: p.heightMm };
}

/** Room kept at the foot of every page for the caution (two lines) and the page number. */
const FOOT_MM = 9;

function footer(page: { w: number; h: number }, title: string, pageNo: number, pageCount: number): Prim[] {
  const caution = textBlock(MARGIN, page.h - MARGIN - FOOT_MM + 3, CUT_DIAGRAM_FOOT_CAUTION, page.w - 2 * MARGIN, 2.3, { color: '#7a1f00' });
  return [...caution.prims, text(page.w - MARGIN, page.h - MARGIN / 2 + 1, `${title} · page ${pageNo} of ${pageCount}`, 2.4, { align: 'right', color: '#777777' })];
}

/** Text at up to `sizeMm`, smaller if needed to fit `widthMm`. */
function fitted(x: number, y: number, value: string, widthMm: number, sizeMm: number, font: 'regular' | 'bold' = 'regular'): Prim {
  const size = Math.min(sizeMm, widthMm / estimateTextWidthMm(value, 1, font));
  return text(x, y, value, size, { font });
}

const LEGEND_MM = 2.5;
const LEGEND_LINE_MM = 3.3;

function legendLine(i: number, p: LayoutSheet['placements'][number], part: CutPart | undefined): string {
  const [pw, ph] = p.rotated ? [p.height, p.width] : [p.width, p.height];
  return `${i + 1}. ${part?.name ?? p.partId} · ${fmtMm(pw)} × ${fmtMm(ph)}${p.rotated ? ' (turned)' : ''}${part ? ` · ${part.cabinet}` : ''}`;
}

/** The placements' numbers and names in columns from (x, y), `rows` to a column. */
function legendPrims(lines: readonly string[], x: number, y: number, widthMm: number, cols: number, rows: number): Prim[] {
  const colW = widthMm / cols;
  return lines.map((l, i) => text(x + Math.floor(i / rows) * colW, y + (i % rows) * LEGEND_LINE_MM, clipText(l, colW - 2, LEGEND_MM), LEGEND_MM));
}

/** The name a person reads on the diagrams, the cut plan page and the checklist: "Sheet 2", "Remnant 1", "Roll 1". */
export function sheetName(n: Pick<NumberedSheet, 'kind' | 'label'>): string {
  return `${kindWord(n)} ${n.kind === 'roll' ? n.label.replace('roll ', '') : n.label}`;
}

/** The sheet's page, and when its parts list would crowd the drawing, pages with the list alone. */
function sheetPages(n: NumberedSheet, input: CutDiagramInput, parts: ReadonlyMap<string, CutPart>, paper: SheetPaperName, sheetCount: number, index: number): ScenePage[] {
  const s = n.sheet;
  const page = pageSize(paper, s.width >= s.height);
  const stock = input.stock ?? [];
  const info = stock.find((x) => x.id === s.stockId);
  const availW = page.w - 2 * MARGIN;
  const prims: Prim[] = [fitted(MARGIN, MARGIN + 4, `${sheetTitle(n, stock)}   (${index + 1} of ${sheetCount})`, availW, 4.2, 'bold')];
  const top = MARGIN + 13;
  const floor = page.h - MARGIN - FOOT_MM;
  // The parts list goes under the drawing when it takes at most 30 % of the room, else on pages of its own.
  const cols = page.w > page.h ? 3 : 2;
  const lines = s.placements.map((p, i) => legendLine(i, p, parts.get(p.partId)));
  const rows = Math.ceil(lines.length / cols);
  const legendH = rows > 0 ? rows * LEGEND_LINE_MM + 4 : 0;
  const inline = legendH <= 0.3 * (floor - top);
  const availH = floor - top - (inline ? legendH : 6);
  const scale = Math.min(availW / s.width, availH / s.height);
  const grain = info?.grain === 'length' ? ' · grain along the length' : '';
  prims.push(fitted(MARGIN, MARGIN + 9.5, `${sheetStats(n, input.kerfMm)} · scale 1:${(1 / scale).toFixed(1)}${grain}`, availW, 3));
  prims.push(...sheetPrims(s, parts, MARGIN + (availW - s.width * scale) / 2, top, scale, { textMm: 3.2, lineScale: 1 }, info?.trim ?? 0));
  const pages: ScenePage[] = [{ widthMm: page.w, heightMm: page.h, prims }];
  if (inline) {
    prims.push(...legendPrims(lines, MARGIN, top + s.height * scale + 5, availW, cols, rows));
    return pages;
  }
  prims.push(text(MARGIN, top + s.height * scale + 5, `${sheetName(n)}: the list of its ${lines.length} parts is on the next page.`, 2.8, { color: '#444444' }));
  const list = pageSize(paper, true);
  const listCols = 3;
  const perPage = Math.floor((list.h - MARGIN - FOOT_MM - top) / LEGEND_LINE_MM) * listCols;
  for (let k = 0; k < lines.length; k += perPage) {
    const chunk = lines.slice(k, k + perPage);
    pages.push({
      widthMm: list.w,
      heightMm: list.h,
      prims: [
        fitted(MARGIN, MARGIN + 4, `${sheetName(n)}: parts, numbered as on the diagram`, list.w - 2 * MARGIN, 4.2, 'bold'),
        ...legendPrims(chunk, MARGIN, top, list.w - 2 * MARGIN, listCols, Math.ceil(chunk.length / listCols)),
      ],
    });
  }
  return pages;
}

/** An amount to two decimals, with the workshop's ISO 4217 code after it when it has one (`42.00 EUR`). */
export function money(v: number, currency?: string | null): string {
  return `${v.toFixed(2)}${currency ? ` ${currency}` : ''}`;
}

/**
 * How the sheet count stands against the lower bound, in plain words ("" when no bound is known):
 * at the bound it is the fewest possible; above it, no layout can go under the bound.
 */
export function sheetsBoundText(sheetsUsed: number, lowerBound: number | undefined, prefix = ''): string {
  if (lowerBound === undefined || lowerBound <= 0) return '';
  if (sheetsUsed <= lowerBound) return `${prefix}the fewest possible`;
  return `${prefix}no layout can use fewer than ${lowerBound}`;
}

/** Lines of the totals block. */
export function totalsLines(t: MaterialTotals, currency?: string, parts: ReadonlyMap<string, CutPart> = new Map()): string[] {
  const lines: string[] = [];
  for (const u of t.stock) {
    const what = [u.material, u.thickness !== undefined ? `${fmtMm(u.thickness)} mm` : undefined].filter(Boolean).join(' ');
    const cost = u.cost === null ? 'no price' : money(u.cost, currency);
    if (u.kind === 'roll') lines.push(`Roll "${u.stockId}"${what ? ` (${what})` : ''}, ${fmtMm(u.widthMm)} mm wide: ${(u.lengthMm / 1000).toFixed(2)} m — ${cost}`);
    else lines.push(`${u.kind === 'remnant' ? 'Remnant' : 'Sheet'} "${u.stockId}"${what ? ` (${what})` : ''}, ${fmtMm(u.widthMm)} × ${fmtMm(u.heightMm ?? 0)} mm: ${u.count} — ${cost}`);
  }
  lines.push(`Sheets: ${t.sheetsUsed}${t.remnantsUsed ? ` (and ${t.remnantsUsed} remnant${t.remnantsUsed === 1 ? '' : 's'})` : ''}${sheetsBoundText(t.sheetsUsed, t.sheetsLowerBound, ' — ')} · roll length: ${(t.rollLengthMm / 1000).toFixed(2)} m`);
  lines.push(`Material cost: ${t.cost === null ? 'no prices given' : money(t.cost, currency)}${t.costIncomplete ? ' (some stock has no price)' : ''}`);
  if (t.liningMassKg !== undefined) lines.push(`Lining weight: ${t.liningMassKg.toFixed(2)} kg`);
  lines.push(`Parts placed: ${t.partsPlaced} · overall utilisation ${percent(t.utilisation)}`);
  if (t.partsUnplaced > 0) {
    lines.push(`NOT PLACED: ${t.partsUnplaced} part${t.partsUnplaced === 1 ? '' : 's'} — add stock and plan again`);
    for (const u of t.unplaced) {
      const p = parts.get(u.partId);
      const what = p ? `${p.name} (${p.cabinet}), ${fmtMm(p.widthMm)} × ${fmtMm(p.heightMm)} × ${fmtMm(p.thicknessMm)} mm ${p.material}` : u.partId;
      lines.push(`NOT PLACED: ${u.quantity} × ${what}${u.reason ? ` — ${u.reason}` : ''}`);
    }
  }
  return lines;
}

function tablePages(input: CutDiagramInput, paper: SheetPaperName): ScenePage[] {
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
  const pages: ScenePage[] = [];
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
      prims.push(text(align === 'right' ? x + share * w - 2 : x, y, clipText(c, share * w - 3, 2.9), 2.9, { align, color }));
      x += share * w;
    });
    y += lh;
  });
  // Totals and cautions, on the same page if they fit.
  const totalLines = totalsLines(totals, input.currency, new Map(input.parts.map((p) => [p.id, p])));
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
export function buildCutDiagramPages(input: CutDiagramInput, paper: SheetPaperName = 'A4'): ScenePage[] {
  const parts = new Map(input.parts.map((p) => [p.id, p]));
  const numbered = numberSheets(input.layouts, input.stock ?? []);
  const pages = [...numbered.flatMap((n, i) => sheetPages(n, input, parts, paper, numbered.length, i)), ...tablePages(input, paper)];
  pages.forEach((p, i) => p.prims.push(...footer({ w: p.widthMm, h: p.heightMm }, input.title, i + 1, pages.length)));
  return pages;
}

/** Draws the cut diagrams onto the sink. */
export function drawCutDiagrams(sink: PdfSink, input: CutDiagramInput, paper: SheetPaperName = 'A4'): void {
  drawPages(sink, buildCutDiagramPages(input, paper));
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

