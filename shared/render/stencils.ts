/**
 * Full-size (1:1) stencils: each stencil item tiled over the chosen paper, with overlaps, alignment
 * marks, trim lines, row/column labels, a page map, and on every page a 100 mm and a 4 in calibration
 * square with a "print at 100 % / actual size" note, the piece name, its quantity, what it is for, and
 * a short caution. A cover page lists the set and says how to print and assemble it.
 *
 * Page layout (mm): margin m on every side; a band of 101.6 mm (the 4 in square) at the top; a 5 mm
 * gap; the drawing area below it fills the rest of the page. Tile counts follow the ceiling formula
 * of tiling.ts with the drawing area's width and height, the overlap, and a 2 mm padding.
 */
import { z } from 'zod';
import { issuesToFields, describeFields } from '../errors.js';
import type { Point } from '../schemas/plan.types.js';
import { PAPER_SIZES_MM, SHEET_PAPERS, paperLabel, type Paper } from './paper.js';
import type { PdfSink } from './pdf-sink.js';
import { clipText, drawPages, line, text, textBlock, type LineStyle, type Prim, type ScenePage } from './scene.js';
import { STENCIL_CAUTION } from './cautions.js';
import type { Bounds, StencilItem, StencilShape } from './stencil-items.js';
import { tileAxis, tileLabel, type TileAxis } from './tiling.js';

/** The calibration squares: 100 mm, and 4 in = 101.6 mm (1 in = 25.4 mm exactly). */
export const CALIBRATION_MM = 100;
export const CALIBRATION_IN_MM = 4 * 25.4;
const BAND_MM = CALIBRATION_IN_MM;
const GAP_MM = 5;
/** Space kept around the piece inside the tile grid, so its outline never lies on a page edge. */
export const TILE_PAD_MM = 2;
/** Radius of the alignment marks' circle. */
const MARK_RADIUS_MM = 3;

export const CUT_LINE: LineStyle = { color: '#000000', widthMm: 0.35 };
export const REBATE_LINE: LineStyle = { color: '#1f4e9e', widthMm: 0.3, dashMm: [3, 1.5] };
const GUIDE_LINE: LineStyle = { color: '#666666', widthMm: 0.18 };
const TRIM_LINE: LineStyle = { color: '#777777', widthMm: 0.2, dashMm: [2, 1.5] };
export const ALIGN_MARK: LineStyle = { color: '#b0127a', widthMm: 0.25 };
const TILE_EDGE: LineStyle = { color: '#9a9a9a', widthMm: 0.2 };
const CAL_100: LineStyle = { color: '#000000', widthMm: 0.25 };
const CAL_4IN: LineStyle = { color: '#1f4e9e', widthMm: 0.25 };
const OVERLAP_FILL = '#f1f1f1';
const REMOVED_FILL = '#dcdcdc';
const LIGHT_TEXT = '#8c8c8c';

export const stencilOptionsSchema = z
  .object({
    paper: z.enum([...SHEET_PAPERS, 'roll'], { error: `paper must be one of ${[...SHEET_PAPERS, 'roll'].join(', ')}` }),
    /** Roll width, required for paper "roll". */
    rollWidthMm: z.number({ error: 'roll width must be a number (mm)' }).min(210, 'roll width must be at least 210 mm').max(2000, 'roll width must be at most 2000 mm').optional(),
    /** Longest page cut from a roll (PDF viewers handle pages up to 200 in = 5080 mm). */
    rollMaxLengthMm: z.number({ error: 'roll page length must be a number (mm)' }).min(300, 'roll page length must be at least 300 mm').max(5000, 'roll page length must be at most 5000 mm').default(2000),
    marginMm: z.number({ error: 'margin must be a number (mm)' }).min(3, 'margin must be at least 3 mm').max(30, 'margin must be at most 30 mm').default(7),
    overlapMm: z.number({ error: 'overlap must be a number (mm)' }).min(10, 'overlap must be at least 10 mm (room for the alignment marks)').max(50, 'overlap must be at most 50 mm').default(15),
  })
  .superRefine((o, ctx) => {
    if (o.paper === 'roll' && o.rollWidthMm === undefined) ctx.addIssue({ code: 'custom', path: ['rollWidthMm'], message: 'a roll needs its width (mm)' });
  });

export interface StencilOptions {
  paper: Paper;
  marginMm: number;
  overlapMm: number;
}

export type StencilOptionsInput = z.input<typeof stencilOptionsSchema>;

/** Checks stencil options from a request; bad input names the field. */
export function parseStencilOptions(
  input: unknown,
): { ok: true; options: StencilOptions } | { ok: false; message: string; fields: Record<string, string> } {
  const r = stencilOptionsSchema.safeParse(input);
  if (!r.success) {
    const fields = issuesToFields(r.error.issues);
    return { ok: false, message: describeFields(fields), fields };
  }
  const o = r.data;
  const paper: Paper = o.paper === 'roll' ? { kind: 'roll', widthMm: o.rollWidthMm!, maxLengthMm: o.rollMaxLengthMm } : { kind: 'sheet', name: o.paper };
  return { ok: true, options: { paper, marginMm: o.marginMm, overlapMm: o.overlapMm } };
}

export interface Rect {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** One page of a stencil item: where its drawing area sits on the page and which part of the piece it shows. */
export interface StencilTile {
  itemIndex: number;
  row: number;
  col: number;
  rows: number;
  cols: number;
  label: string;
  pageWidthMm: number;
  pageHeightMm: number;
  /** Drawing area on the page (mm, from the top-left). */
  draw: Rect;
  /** The piece region shown (piece mm, y up): minX at the left edge of the drawing area, maxY at its top. */
  window: Bounds;
}

export interface StencilGrid {
  cols: TileAxis;
  rows: TileAxis;
  drawWidthMm: number;
  drawHeightMm: number;
}

export interface StencilLayout {
  options: StencilOptions;
  items: StencilItem[];
  grids: StencilGrid[];
  tiles: StencilTile[];
  /** Cover page size (mm). */
  cover: { widthMm: number; heightMm: number };
}

/** Page width and the largest drawing area the paper gives (mm). */
export function drawingArea(options: StencilOptions): { pageWidthMm: number; drawWidthMm: number; maxDrawHeightMm: number; fixedPageHeightMm?: number } {
  const m = options.marginMm;
  if (options.paper.kind === 'sheet') {
    const size = PAPER_SIZES_MM[options.paper.name];
    return { pageWidthMm: size.widthMm, drawWidthMm: size.widthMm - 2 * m, maxDrawHeightMm: size.heightMm - 2 * m - BAND_MM - GAP_MM, fixedPageHeightMm: size.heightMm };
  }
  return { pageWidthMm: options.paper.widthMm, drawWidthMm: options.paper.widthMm - 2 * m, maxDrawHeightMm: options.paper.maxLengthMm - 2 * m - BAND_MM - GAP_MM };
}

/** Splits every item into tiles. Pure: the same input gives the same pages. */
export function layoutStencils(items: readonly StencilItem[], options: StencilOptions): StencilLayout {
  const area = drawingArea(options);
  const o = options.overlapMm;
  const m = options.marginMm;
  const grids: StencilGrid[] = [];
  const tiles: StencilTile[] = [];
  items.forEach((item, itemIndex) => {
    const b = item.bounds;
    const cols = tileAxis(b.minX, b.maxX, area.drawWidthMm, o, TILE_PAD_MM);
    let drawH = area.maxDrawHeightMm;
    let rows = tileAxis(b.minY, b.maxY, drawH, o, TILE_PAD_MM);
    if (area.fixedPageHeightMm === undefined && rows.count === 1) {
      // A roll page is cut to the piece's length.
      drawH = b.maxY - b.minY + 2 * TILE_PAD_MM;
      rows = tileAxis(b.minY, b.maxY, drawH, o, TILE_PAD_MM);
    }
    grids.push({ cols, rows, drawWidthMm: area.drawWidthMm, drawHeightMm: drawH });
    // Rows run from the top of the piece down (row A at the top).
    const top = b.maxY + TILE_PAD_MM;
    const pageHeightMm = area.fixedPageHeightMm ?? 2 * m + BAND_MM + GAP_MM + drawH;
    for (let row = 0; row < rows.count; row++) {
      for (let col = 0; col < cols.count; col++) {
        const minX = cols.startMm + col * cols.stepMm;
        const maxY = top - row * rows.stepMm;
        tiles.push({
          itemIndex,
          row,
          col,
          rows: rows.count,
          cols: cols.count,
          label: tileLabel(row, col),
          pageWidthMm: area.pageWidthMm,
          pageHeightMm,
          draw: { x: m, y: m + BAND_MM + GAP_MM, w: area.drawWidthMm, h: drawH },
          window: { minX, maxX: minX + area.drawWidthMm, minY: maxY - drawH, maxY },
        });
      }
    }
  });
  const cover = { widthMm: area.pageWidthMm, heightMm: area.fixedPageHeightMm ?? 297 };
  return { options, items: [...items], grids, tiles, cover };
}

function shapeStyle(shape: StencilShape): LineStyle {
  return shape.role === 'cut' ? CUT_LINE : shape.role === 'rebate' ? REBATE_LINE : GUIDE_LINE;
}

/** The piece drawn into one tile, clipped to its drawing area. */
function tilePiecePrims(item: StencilItem, tile: StencilTile, options: StencilOptions): Prim[] {
  const { draw, window } = tile;
  const X = (x: number) => draw.x + (x - window.minX);
  const Y = (y: number) => draw.y + (window.maxY - y);
  const P = (p: Point): Point => [X(p[0]), Y(p[1])];
  const o = options.overlapMm;
  const items: Prim[] = [];
  const left = tile.col > 0;
  const right = tile.col < tile.cols - 1;
  const up = tile.row > 0;
  const down = tile.row < tile.rows - 1;
  // Overlap strips, shaded.
  if (left) items.push({ kind: 'rect', x: draw.x, y: draw.y, w: o, h: draw.h, fill: OVERLAP_FILL });
  if (right) items.push({ kind: 'rect', x: draw.x + draw.w - o, y: draw.y, w: o, h: draw.h, fill: OVERLAP_FILL });
  if (up) items.push({ kind: 'rect', x: draw.x, y: draw.y, w: draw.w, h: o, fill: OVERLAP_FILL });
  if (down) items.push({ kind: 'rect', x: draw.x, y: draw.y + draw.h - o, w: draw.w, h: o, fill: OVERLAP_FILL });
  // The material removed (holes), then the lines.
  for (const hole of item.removed) items.push({ kind: 'poly', points: hole.map(P), closed: true, fill: REMOVED_FILL });
  for (const s of item.shapes) {
    const stroke = shapeStyle(s);
    if (s.type === 'circle') items.push({ kind: 'circle', cx: X(s.cx), cy: Y(s.cy), r: s.r, stroke });
    else items.push({ kind: 'poly', points: s.points.map(P), closed: s.closed, stroke });
  }
  for (const l of item.labels) items.push(text(X(l.x), Y(l.y), l.text, l.sizeMm, { align: 'center', color: item.kind === 'lining' ? LIGHT_TEXT : '#000000' }));
  // Trim lines through the middle of each overlap, and alignment marks on them. Marks sit at the same
  // piece coordinates on both neighbours, so they coincide when the pages are laid over each other.
  const midLeft = draw.x + o / 2;
  const midRight = draw.x + draw.w - o / 2;
  const midTop = draw.y + o / 2;
  const midBottom = draw.y + draw.h - o / 2;
  const markYs = [draw.y + draw.h / 4, draw.y + (3 * draw.h) / 4];
  const markXs = [draw.x + draw.w / 4, draw.x + (3 * draw.w) / 4];
  const marks: [number, number][] = [];
  if (left) {
    items.push(line(midLeft, draw.y, midLeft, draw.y + draw.h, TRIM_LINE));
    items.push(text(midLeft + 1.5, draw.y + draw.h / 2 - 2, '✂ trim', 2.6, { color: LIGHT_TEXT }));
    for (const y of markYs) marks.push([midLeft, y]);
  }
  if (up) {
    items.push(line(draw.x, midTop, draw.x + draw.w, midTop, TRIM_LINE));
    items.push(text(draw.x + draw.w / 2 + 2, midTop - 1.5, '✂ trim', 2.6, { color: LIGHT_TEXT }));
    for (const x of markXs) marks.push([x, midTop]);
  }
  if (right) {
    items.push(line(midRight, draw.y, midRight, draw.y + draw.h, TRIM_LINE));
    for (const y of markYs) marks.push([midRight, y]);
  }
  if (down) {
    items.push(line(draw.x, midBottom, draw.x + draw.w, midBottom, TRIM_LINE));
    for (const x of markXs) marks.push([x, midBottom]);
  }
  for (const [x, y] of marks) items.push(...alignmentMark(x, y));
  // Tile name and its neighbours.
  const inset = (side: boolean) => (side ? o + 2 : 3);
  items.push(text(draw.x + inset(left), draw.y + inset(up) + 9, tile.label, 10, { font: 'bold', color: '#c8c8c8' }));
  const name = (r: number, c: number) => tileLabel(r, c);
  if (left) items.push(text(draw.x + o + 2, draw.y + draw.h / 2 + 1.5, `◀ ${name(tile.row, tile.col - 1)}`, 4, { color: LIGHT_TEXT }));
  if (right) items.push(text(draw.x + draw.w - o - 2, draw.y + draw.h / 2 + 1.5, `${name(tile.row, tile.col + 1)} ▶`, 4, { color: LIGHT_TEXT, align: 'right' }));
  if (up) items.push(text(draw.x + draw.w / 2, draw.y + o + 6, `▲ ${name(tile.row - 1, tile.col)}`, 4, { color: LIGHT_TEXT, align: 'center' }));
  if (down) items.push(text(draw.x + draw.w / 2, draw.y + draw.h - o - 2.5, `▼ ${name(tile.row + 1, tile.col)}`, 4, { color: LIGHT_TEXT, align: 'center' }));
  return [
    { kind: 'clip', x: draw.x, y: draw.y, w: draw.w, h: draw.h, items },
    { kind: 'rect', x: draw.x, y: draw.y, w: draw.w, h: draw.h, stroke: TILE_EDGE },
  ];
}

/** A circle with a cross through it: the mark two neighbouring pages share. */
export function alignmentMark(x: number, y: number): Prim[] {
  const arm = MARK_RADIUS_MM + 1.5;
  return [
    { kind: 'circle', cx: x, cy: y, r: MARK_RADIUS_MM, stroke: ALIGN_MARK },
    line(x - arm, y, x + arm, y, ALIGN_MARK),
    line(x, y - arm, x, y + arm, ALIGN_MARK),
  ];
}

/** The 100 mm and 4 in squares, sharing their top-left corner, with the print note inside. */
function calibrationPrims(x: number, y: number): Prim[] {
  const prims: Prim[] = [
    { kind: 'rect', x, y, w: CALIBRATION_IN_MM, h: CALIBRATION_IN_MM, stroke: CAL_4IN },
    { kind: 'rect', x, y, w: CALIBRATION_MM, h: CALIBRATION_MM, stroke: CAL_100 },
  ];
  const lines: [string, 'bold' | 'regular', string][] = [
    ['CHECK THE SCALE', 'bold', '#000000'],
    ['Print at 100 % / actual size,', 'regular', '#000000'],
    ['not "fit to page".', 'regular', '#000000'],
    ['Measure this square:', 'regular', '#000000'],
    ['black: 100 mm × 100 mm', 'regular', '#000000'],
    ['blue: 4 in × 4 in', 'regular', '#1f4e9e'],
    ['If it is off, do not cut:', 'regular', '#000000'],
    ['fix the print settings.', 'regular', '#000000'],
  ];
  lines.forEach(([t, font, color], i) => prims.push(text(x + 50, y + 30 + i * 6, t, 3.6, { font, color, align: 'center' })));
  prims.push(text(x + 50, y + CALIBRATION_MM - 2, '100 mm', 3, { align: 'center' }));
  prims.push(text(x + 50, y + CALIBRATION_IN_MM + 3.2, '4 in', 2.6, { align: 'center', color: '#1f4e9e' }));
  return prims;
}

/** Small overview of the piece with the tile grid; the current tile shaded. */
function pageMapPrims(item: StencilItem, grid: StencilGrid, current: { row: number; col: number }, box: Rect): Prim[] {
  const o = grid.cols.stepMm > 0 ? grid.drawWidthMm - grid.cols.stepMm : 0;
  const spanW = grid.cols.count * grid.cols.stepMm + o;
  const spanH = grid.rows.count * grid.rows.stepMm + (grid.drawHeightMm - grid.rows.stepMm);
  const s = Math.min(box.w / spanW, box.h / spanH);
  const x0 = box.x + (box.w - spanW * s) / 2;
  const y0 = box.y + (box.h - spanH * s) / 2;
  const top = item.bounds.maxY + TILE_PAD_MM;
  const P = (p: Point): Point => [x0 + (p[0] - grid.cols.startMm) * s, y0 + (top - p[1]) * s];
  const prims: Prim[] = [];
  for (let r = 0; r < grid.rows.count; r++) {
    for (let c = 0; c < grid.cols.count; c++) {
      const x = x0 + c * grid.cols.stepMm * s;
      const y = y0 + r * grid.rows.stepMm * s;
      const here = r === current.row && c === current.col;
      prims.push({ kind: 'rect', x, y, w: grid.drawWidthMm * s, h: grid.drawHeightMm * s, stroke: { color: '#888888', widthMm: 0.15 }, ...(here ? { fill: '#ffe08a' } : {}) });
    }
  }
  for (const shape of item.shapes) {
    if (shape.role === 'mark') continue;
    if (shape.type === 'circle') prims.push({ kind: 'circle', cx: P([shape.cx, 0])[0], cy: P([0, shape.cy])[1], r: shape.r * s, stroke: { color: '#000000', widthMm: 0.2 } });
    else prims.push({ kind: 'poly', points: shape.points.map(P), closed: shape.closed, stroke: { color: '#000000', widthMm: 0.2 } });
  }
  const cellW = grid.cols.stepMm * s;
  const cellH = grid.rows.stepMm * s;
  if (Math.min(cellW, cellH) >= 5) {
    for (let r = 0; r < grid.rows.count; r++) {
      for (let c = 0; c < grid.cols.count; c++) {
        prims.push(text(x0 + (c * grid.cols.stepMm + grid.drawWidthMm / 2) * s, y0 + (r * grid.rows.stepMm + grid.drawHeightMm / 2) * s + 1, tileLabel(r, c), 2.8, { align: 'center', color: '#555555' }));
      }
    }
  }
  return prims;
}

function quantityText(item: StencilItem): string {
  const total = item.quantityPerCabinet * item.cabinetCount;
  const what = item.kind === 'lining' ? `Cut ${total}` : `${total} cut-out${total === 1 ? '' : 's'}`;
  return `${what}: ${item.quantityPerCabinet} per cabinet × ${item.cabinetCount} cabinet${item.cabinetCount === 1 ? '' : 's'}`;
}

function tilePagePrims(layout: StencilLayout, tile: StencilTile, pageNo: number, pageCount: number, title: string): Prim[] {
  const { options } = layout;
  const item = layout.items[tile.itemIndex]!;
  const grid = layout.grids[tile.itemIndex]!;
  const m = options.marginMm;
  const prims: Prim[] = calibrationPrims(m, m);
  const colX = m + CALIBRATION_IN_MM + 5;
  const colW = tile.pageWidthMm - m - colX;
  let y = m + 4;
  const title1 = textBlock(colX, y, item.name, colW, 4.2, { font: 'bold' });
  prims.push(...title1.prims);
  y = title1.bottomMm + 5;
  for (const t of [item.detail, quantityText(item), `Page ${tile.label}: row ${tile.label.replace(/\d+$/, '')} of ${tile.rows}, column ${tile.col + 1} of ${tile.cols}`]) {
    const b = textBlock(colX, y, t, colW, 3.1);
    prims.push(...b.prims);
    y = b.bottomMm + 4.2;
  }
  const mapH = Math.min(30, BAND_MM - (y - m) - 30);
  if (mapH > 8) {
    prims.push(text(colX, y, 'Page map', 2.6, { color: '#555555' }));
    prims.push(...pageMapPrims(item, grid, tile, { x: colX, y: y + 1.5, w: Math.min(colW, 60), h: mapH }));
    y += mapH + 6;
  }
  const legend = tile.rows * tile.cols > 1
    ? `Solid: cut line. Grey band: ${options.overlapMm} mm overlap. Trim the ✂ edges, lay the page over its neighbour so the pink ⊕ marks match, tape.`
    : 'Solid: cut line. Dashed blue: rebate. Grey fill: cut away.';
  const lg = textBlock(colX, y, legend, colW, 2.6, { color: '#333333' });
  prims.push(...lg.prims);
  y = lg.bottomMm + 3.5;
  const caution = textBlock(colX, y, STENCIL_CAUTION, colW, 2.4, { color: '#7a1f00' });
  prims.push(...caution.prims);
  prims.push(text(tile.pageWidthMm - m, tile.pageHeightMm - m / 2 + 1, `${title} · ${paperLabel(options.paper)} · page ${pageNo} of ${pageCount}`, 2.4, { align: 'right', color: '#777777' }));
  prims.push(...tilePiecePrims(item, tile, options));
  return prims;
}

function coverPagePrims(layout: StencilLayout, title: string, pageCount: number, entries: readonly string[][], part: { index: number; count: number }): Prim[] {
  const { options, cover } = layout;
  const m = options.marginMm;
  const prims: Prim[] = calibrationPrims(m, m);
  const colX = m + CALIBRATION_IN_MM + 5;
  const colW = cover.widthMm - m - colX;
  let y = m + 5;
  const heading = textBlock(colX, y, `Full-size stencils: ${title}`, colW, 5, { font: 'bold' });
  prims.push(...heading.prims);
  y = heading.bottomMm + 5;
  const about = textBlock(
    colX,
    y,
    `${paperLabel(options.paper)} paper, ${options.marginMm} mm margins, ${options.overlapMm} mm overlap. ${layout.items.length} stencils on ${pageCount - part.count} pages, after ${part.count === 1 ? 'this page' : `these ${part.count} pages`}.`,
    colW,
    3.2,
  );
  prims.push(...about.prims);
  y = about.bottomMm + 5;
  const caution = textBlock(colX, y, STENCIL_CAUTION, colW, 2.8, { color: '#7a1f00' });
  prims.push(...caution.prims);
  y = Math.max(caution.bottomMm + 6, m + BAND_MM + GAP_MM + 4);
  const w = cover.widthMm - 2 * m;
  if (part.index === 0) {
    const steps = [
      '1. Print every page at 100 % / actual size (turn off "fit to page"). Check the squares on the first page with a ruler.',
      '2. For each stencil, lay its pages out as the page map shows: rows A, B, C… from the top, columns 1, 2, 3… from the left.',
      '3. Trim each page along its ✂ lines, lay it over its neighbour so the pink ⊕ marks and the lines match, and tape it.',
      '4. Cut the paper along the solid black line, lay it on the lining or panel, and trace it. Grey areas are cut away; a dashed blue circle is a rebate.',
    ];
    for (const s of steps) {
      const b = textBlock(m, y, s, w, 3.2);
      prims.push(...b.prims);
      y = b.bottomMm + 3;
    }
    y += 3;
  }
  const cols = [m, m + w * COVER_NAME_SHARE, m + w * 0.79, m + w * 0.89];
  const head = ['Stencil', 'Quantity', 'Tiles', 'Pages'];
  head.forEach((h, i) => prims.push(text(cols[i]!, y, h, 3, { font: 'bold' })));
  y += 1.5;
  prims.push(line(m, y, m + w, y, { color: '#000000', widthMm: 0.2 }));
  y += 4.5;
  for (const row of entries) {
    row.forEach((cell, i) => prims.push(text(cols[i]!, y, cell, COVER_TEXT_MM)));
    y += 4.6;
  }
  prims.push(text(cover.widthMm - m, cover.heightMm - m / 2 + 1, `${title} · page ${part.index + 1} of ${pageCount}`, 2.4, { align: 'right', color: '#777777' }));
  return prims;
}

const COVER_TEXT_MM = 2.9;
const COVER_NAME_SHARE = 0.63;

/** Rows of the cover's table that fit on one cover page. */
function coverRowsPerPage(layout: StencilLayout): number {
  const m = layout.options.marginMm;
  const firstRowY = m + BAND_MM + GAP_MM + 4 + 40;
  return Math.max(5, Math.floor((layout.cover.heightMm - m - firstRowY - 6) / 4.6));
}

export interface StencilDocument {
  /** In order: cover pages first, then tiles. */
  pages: ScenePage[];
  coverPages: number;
}

/** Builds every page of the stencil set as scenes (mm). */
export function buildStencilDocument(layout: StencilLayout, title: string): StencilDocument {
  const perPage = coverRowsPerPage(layout);
  const coverCount = Math.max(1, Math.ceil(layout.items.length / perPage));
  const pageCount = coverCount + layout.tiles.length;
  const entries: string[][] = [];
  const nameColMm = (layout.cover.widthMm - 2 * layout.options.marginMm) * COVER_NAME_SHARE - 3;
  let next = coverCount + 1;
  layout.items.forEach((item, i) => {
    const g = layout.grids[i]!;
    const n = g.cols.count * g.rows.count;
    entries.push([clipText(item.name, nameColMm, COVER_TEXT_MM), String(item.quantityPerCabinet * item.cabinetCount), `${g.cols.count} × ${g.rows.count}`, n === 1 ? String(next) : `${next}–${next + n - 1}`]);
    next += n;
  });
  const pages: StencilDocument['pages'] = [];
  for (let c = 0; c < coverCount; c++) {
    pages.push({
      widthMm: layout.cover.widthMm,
      heightMm: layout.cover.heightMm,
      prims: coverPagePrims(layout, title, pageCount, entries.slice(c * perPage, (c + 1) * perPage), { index: c, count: coverCount }),
    });
  }
  layout.tiles.forEach((tile, i) => {
    pages.push({ widthMm: tile.pageWidthMm, heightMm: tile.pageHeightMm, prims: tilePagePrims(layout, tile, coverCount + i + 1, pageCount, title) });
  });
  return { pages, coverPages: coverCount };
}

/** Draws the whole stencil set onto the sink, one sink page per page. */
export function drawStencils(sink: PdfSink, items: readonly StencilItem[], options: StencilOptions, title: string): StencilLayout {
  const layout = layoutStencils(items, options);
  drawPages(sink, buildStencilDocument(layout, title).pages);
  return layout;
}
