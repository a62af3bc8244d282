/**
 * A drawing as plain data (a "scene"), in millimetres with the origin at the top-left and y down, so
 * that one description feeds both outputs: the PDF (through a PdfSink) and SVG strings.
 * Line widths and text sizes are in output millimetres.
 */
import type { Point } from '../schemas/plan.types.js';
import { PT_PER_MM, type FontName, type PdfSink } from './pdf-sink.js';

export interface LineStyle {
  color: string;
  widthMm: number;
  /** Dash pattern: drawn length, gap length (mm). */
  dashMm?: readonly [number, number];
}

export interface Paint {
  stroke?: LineStyle;
  fill?: string;
}

export type TextAlign = 'left' | 'center' | 'right';

export type Prim =
  | ({ kind: 'poly'; points: readonly Point[]; closed: boolean } & Paint)
  | ({ kind: 'rect'; x: number; y: number; w: number; h: number } & Paint)
  | ({ kind: 'circle'; cx: number; cy: number; r: number } & Paint)
  | {
      kind: 'text';
      x: number;
      /** Alphabetic baseline. */
      y: number;
      text: string;
      sizeMm: number;
      font: FontName;
      align: TextAlign;
      color: string;
    }
  /** Prims drawn clipped to a rectangle. */
  | { kind: 'clip'; x: number; y: number; w: number; h: number; items: Prim[] };

export const line = (x1: number, y1: number, x2: number, y2: number, stroke: LineStyle): Prim => ({
  kind: 'poly',
  points: [
    [x1, y1],
    [x2, y2],
  ],
  closed: false,
  stroke,
});

export function text(
  x: number,
  y: number,
  value: string,
  sizeMm: number,
  opts: { font?: FontName; align?: TextAlign; color?: string } = {},
): Prim {
  return { kind: 'text', x, y, text: value, sizeMm, font: opts.font ?? 'regular', align: opts.align ?? 'left', color: opts.color ?? '#000000' };
}

/**
 * Estimated advance width of `value` in DejaVu Sans at `sizeMm` (em fractions: space 0.32, digits 0.64,
 * capitals 0.72, others 0.6; bold 8 % wider — rounded up from the font's advance widths). Used only to
 * decide what fits; the PDF aligns with the sink's exact widths.
 */
export function estimateTextWidthMm(value: string, sizeMm: number, font: FontName = 'regular'): number {
  let em = 0;
  for (const ch of value) {
    if (ch === ' ') em += 0.32;
    else if (ch >= '0' && ch <= '9') em += 0.64;
    else if (ch >= 'A' && ch <= 'Z') em += 0.72;
    else em += 0.6;
  }
  return em * sizeMm * (font === 'bold' ? 1.08 : 1);
}

/** Shortens `value` with an ellipsis so that it fits `widthMm` (by the estimate). */
export function clipText(value: string, widthMm: number, sizeMm: number, font: FontName = 'regular'): string {
  if (estimateTextWidthMm(value, sizeMm, font) <= widthMm) return value;
  let v = value;
  while (v.length > 1 && estimateTextWidthMm(`${v}…`, sizeMm, font) > widthMm) v = v.slice(0, -1);
  return `${v}…`;
}

/** Breaks `value` into lines no wider than `widthMm` (by the estimate), at spaces. */
export function wrapText(value: string, widthMm: number, sizeMm: number, font: FontName = 'regular'): string[] {
  const lines: string[] = [];
  for (const paragraph of value.split('\n')) {
    let current = '';
    for (const word of paragraph.split(/\s+/).filter(Boolean)) {
      const candidate = current ? `${current} ${word}` : word;
      if (current && estimateTextWidthMm(candidate, sizeMm, font) > widthMm) {
        lines.push(current);
        current = word;
      } else current = candidate;
    }
    lines.push(current);
  }
  return lines;
}

/** Wrapped text as prims, top line's baseline at y; returns the prims and the y below the block. */
export function textBlock(
  x: number,
  y: number,
  value: string,
  widthMm: number,
  sizeMm: number,
  opts: { font?: FontName; color?: string; lineHeight?: number } = {},
): { prims: Prim[]; bottomMm: number } {
  const lh = sizeMm * (opts.lineHeight ?? 1.3);
  const lines = wrapText(value, widthMm, sizeMm, opts.font);
  const prims = lines.map((l, i) => text(x, y + i * lh, l, sizeMm, opts));
  return { prims, bottomMm: y + (lines.length - 1) * lh + sizeMm * 0.4 };
}

/** Scene points to page points: offset in mm, then mm → pt. */
interface Offset {
  dxMm: number;
  dyMm: number;
}

function applyPaint(sink: PdfSink, paint: Paint): 'stroke' | 'fill' | 'both' | null {
  if (paint.fill) sink.fillColor(paint.fill);
  if (paint.stroke) {
    sink.strokeColor(paint.stroke.color);
    sink.lineWidth(paint.stroke.widthMm * PT_PER_MM);
    if (paint.stroke.dashMm) sink.dash(paint.stroke.dashMm[0] * PT_PER_MM, paint.stroke.dashMm[1] * PT_PER_MM);
    else sink.undash();
  }
  if (paint.fill && paint.stroke) return 'both';
  if (paint.fill) return 'fill';
  if (paint.stroke) return 'stroke';
  return null;
}

function paintPath(sink: PdfSink, how: 'stroke' | 'fill' | 'both'): void {
  if (how === 'both') sink.fillAndStroke();
  else if (how === 'fill') sink.fill();
  else sink.stroke();
}

/** Draws prims onto the current page of `sink`, shifted by the offset (mm). */
export function drawScene(sink: PdfSink, prims: readonly Prim[], offset: Offset = { dxMm: 0, dyMm: 0 }): void {
  const X = (x: number) => (x + offset.dxMm) * PT_PER_MM;
  const Y = (y: number) => (y + offset.dyMm) * PT_PER_MM;
  for (const p of prims) {
    if (p.kind === 'clip') {
      sink.save();
      sink.rect(X(p.x), Y(p.y), p.w * PT_PER_MM, p.h * PT_PER_MM);
      sink.clip();
      drawScene(sink, p.items, offset);
      sink.restore();
      continue;
    }
    if (p.kind === 'text') {
      const sizePt = p.sizeMm * PT_PER_MM;
      const w = p.align === 'left' ? 0 : sink.textWidth(p.font, sizePt, p.text);
      const x = X(p.x) - (p.align === 'center' ? w / 2 : p.align === 'right' ? w : 0);
      sink.fillColor(p.color);
      sink.text(p.font, sizePt, x, Y(p.y), p.text);
      continue;
    }
    if (p.kind === 'poly' && p.points.length < 2) continue;
    sink.save();
    const how = applyPaint(sink, p);
    if (how) {
      if (p.kind === 'rect') sink.rect(X(p.x), Y(p.y), p.w * PT_PER_MM, p.h * PT_PER_MM);
      else if (p.kind === 'circle') sink.circle(X(p.cx), Y(p.cy), p.r * PT_PER_MM);
      else {
        const [first, ...rest] = p.points;
        sink.moveTo(X(first![0]), Y(first![1]));
        for (const [x, y] of rest) sink.lineTo(X(x), Y(y));
        if (p.closed) sink.closePath();
      }
      paintPath(sink, how);
    }
    sink.restore();
  }
}

/** A page of a document: its size (mm) and what is drawn on it. */
export interface ScenePage {
  widthMm: number;
  heightMm: number;
  prims: Prim[];
}

/** Draws each page onto the sink as a page of its own. */
export function drawPages(sink: PdfSink, pages: readonly ScenePage[]): void {
  for (const page of pages) {
    sink.addPage(page.widthMm * PT_PER_MM, page.heightMm * PT_PER_MM);
    drawScene(sink, page.prims);
  }
}

const num = (v: number) => String(Math.round(v * 1000) / 1000);

export function escapeXml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' })[c]!);
}

function svgPaint(p: Paint): string {
  const parts = [`fill="${p.fill ?? 'none'}"`];
  if (p.stroke) {
    parts.push(`stroke="${p.stroke.color}"`, `stroke-width="${num(p.stroke.widthMm)}"`);
    if (p.stroke.dashMm) parts.push(`stroke-dasharray="${num(p.stroke.dashMm[0])} ${num(p.stroke.dashMm[1])}"`);
  }
  return parts.join(' ');
}

function svgPrims(prims: readonly Prim[], clipIds: { next: number }): string[] {
  const out: string[] = [];
  for (const p of prims) {
    switch (p.kind) {
      case 'rect':
        out.push(`<rect x="${num(p.x)}" y="${num(p.y)}" width="${num(p.w)}" height="${num(p.h)}" ${svgPaint(p)}/>`);
        break;
      case 'circle':
        out.push(`<circle cx="${num(p.cx)}" cy="${num(p.cy)}" r="${num(p.r)}" ${svgPaint(p)}/>`);
        break;
      case 'poly': {
        const pts = p.points.map(([x, y]) => `${num(x)},${num(y)}`).join(' ');
        out.push(`<${p.closed ? 'polygon' : 'polyline'} points="${pts}" ${svgPaint(p)}/>`);
        break;
      }
      case 'text': {
        const anchor = p.align === 'left' ? 'start' : p.align === 'center' ? 'middle' : 'end';
        const weight = p.font === 'bold' ? ' font-weight="bold"' : '';
        out.push(
          `<text x="${num(p.x)}" y="${num(p.y)}" font-size="${num(p.sizeMm)}" font-family="DejaVu Sans, Verdana, sans-serif"${weight} text-anchor="${anchor}" fill="${p.color}">${escapeXml(p.text)}</text>`,
        );
        break;
      }
      case 'clip': {
        const id = `clip${clipIds.next++}`;
        out.push(`<clipPath id="${id}"><rect x="${num(p.x)}" y="${num(p.y)}" width="${num(p.w)}" height="${num(p.h)}"/></clipPath>`);
        out.push(`<g clip-path="url(#${id})">`, ...svgPrims(p.items, clipIds), '</g>');
        break;
      }
    }
  }
  return out;
}

/** A standalone SVG document in mm: width="…mm" height="…mm", viewBox in mm (1 user unit = 1 mm). */
export function sceneToSvg(prims: readonly Prim[], widthMm: number, heightMm: number, title?: string): string {
  const head = `<?xml version="1.0" encoding="UTF-8"?>\n<svg xmlns="http://www.w3.org/2000/svg" width="${num(widthMm)}mm" height="${num(heightMm)}mm" viewBox="0 0 ${num(widthMm)} ${num(heightMm)}">`;
  const body = svgPrims(prims, { next: 1 });
  const titleTag = title ? [`<title>${escapeXml(title)}</title>`] : [];
  return [head, ...titleTag, `<rect x="0" y="0" width="${num(widthMm)}" height="${num(heightMm)}" fill="#ffffff"/>`, ...body, '</svg>', ''].join('\n');
}
