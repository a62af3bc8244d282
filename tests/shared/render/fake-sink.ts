/**
 * A PdfSink that records what is drawn, with the graphics state at the time (colours, line width,
 * dash, clip rectangle), so tests can measure the drawing without a PDF library.
 */
import type { FontName, PdfSink } from '../../../shared/render/pdf-sink.js';

export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

export type Segment = [number, number, number, number];

export interface PaintedPath {
  page: number;
  paint: 'stroke' | 'fill' | 'both';
  segments: Segment[];
  circles: { cx: number; cy: number; r: number }[];
  rects: Box[];
  strokeColor: string;
  fillColor: string;
  lineWidth: number;
  dash: [number, number] | null;
  /** The clip rectangle in force, or null. */
  clip: Box | null;
}

export interface DrawnText {
  page: number;
  font: FontName;
  sizePt: number;
  x: number;
  y: number;
  text: string;
  color: string;
}

interface State {
  strokeColor: string;
  fillColor: string;
  lineWidth: number;
  dash: [number, number] | null;
  clip: Box | null;
}

function intersect(a: Box | null, b: Box): Box {
  if (!a) return b;
  const x = Math.max(a.x, b.x);
  const y = Math.max(a.y, b.y);
  return { x, y, w: Math.max(0, Math.min(a.x + a.w, b.x + b.w) - x), h: Math.max(0, Math.min(a.y + a.h, b.y + b.h) - y) };
}

export class FakeSink implements PdfSink {
  pages: { widthPt: number; heightPt: number }[] = [];
  paths: PaintedPath[] = [];
  texts: DrawnText[] = [];
  private state: State = { strokeColor: '#000000', fillColor: '#000000', lineWidth: 1, dash: null, clip: null };
  private stack: State[] = [];
  private current: { segments: Segment[]; circles: PaintedPath['circles']; rects: Box[]; at: [number, number] | null; start: [number, number] | null } = this.emptyPath();

  private emptyPath() {
    return { segments: [] as Segment[], circles: [] as PaintedPath['circles'], rects: [] as Box[], at: null as [number, number] | null, start: null as [number, number] | null };
  }
  private get page() {
    return this.pages.length - 1;
  }
  addPage(widthPt: number, heightPt: number): void {
    this.pages.push({ widthPt, heightPt });
    this.state = { strokeColor: '#000000', fillColor: '#000000', lineWidth: 1, dash: null, clip: null };
    this.stack = [];
  }
  save(): void {
    this.stack.push({ ...this.state });
  }
  restore(): void {
    const s = this.stack.pop();
    if (!s) throw new Error('restore() without save()');
    this.state = s;
  }
  lineWidth(pt: number): void {
    this.state.lineWidth = pt;
  }
  strokeColor(color: string): void {
    this.state.strokeColor = color;
  }
  fillColor(color: string): void {
    this.state.fillColor = color;
  }
  dash(onPt: number, offPt: number): void {
    this.state.dash = [onPt, offPt];
  }
  undash(): void {
    this.state.dash = null;
  }
  moveTo(x: number, y: number): void {
    this.current.at = [x, y];
    this.current.start = [x, y];
  }
  lineTo(x: number, y: number): void {
    const at = this.current.at;
    if (!at) throw new Error('lineTo() without moveTo()');
    this.current.segments.push([at[0], at[1], x, y]);
    this.current.at = [x, y];
  }
  closePath(): void {
    const { at, start } = this.current;
    if (at && start && (at[0] !== start[0] || at[1] !== start[1])) this.current.segments.push([at[0], at[1], start[0], start[1]]);
    this.current.at = start;
  }
  rect(x: number, y: number, w: number, h: number): void {
    this.current.rects.push({ x, y, w, h });
  }
  circle(cx: number, cy: number, r: number): void {
    this.current.circles.push({ cx, cy, r });
  }
  private paint(paint: PaintedPath['paint']): void {
    if (this.page < 0) throw new Error('drawing before addPage()');
    const { segments, circles, rects } = this.current;
    this.paths.push({ page: this.page, paint, segments, circles, rects, ...this.state, clip: this.state.clip });
    this.current = this.emptyPath();
  }
  stroke(): void {
    this.paint('stroke');
  }
  fill(): void {
    this.paint('fill');
  }
  fillAndStroke(): void {
    this.paint('both');
  }
  clip(): void {
    for (const r of this.current.rects) this.state.clip = intersect(this.state.clip, r);
    if (this.current.segments.length || this.current.circles.length) throw new Error('the fake sink clips to rectangles only');
    this.current = this.emptyPath();
  }
  text(font: FontName, sizePt: number, x: number, y: number, text: string): void {
    if (this.page < 0) throw new Error('text before addPage()');
    this.texts.push({ page: this.page, font, sizePt, x, y, text, color: this.state.fillColor });
  }
  textWidth(_font: FontName, sizePt: number, text: string): number {
    return 0.55 * sizePt * text.length;
  }
}

/** Liang–Barsky: the part of segment s inside box b, or null. */
export function clipSegment(s: Segment, b: Box): Segment | null {
  const [x1, y1, x2, y2] = s;
  const dx = x2 - x1;
  const dy = y2 - y1;
  let t0 = 0;
  let t1 = 1;
  const edges: [number, number][] = [
    [-dx, x1 - b.x],
    [dx, b.x + b.w - x1],
    [-dy, y1 - b.y],
    [dy, b.y + b.h - y1],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return null;
      continue;
    }
    const t = q / p;
    if (p < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    if (t0 > t1) return null;
  }
  return [x1 + t0 * dx, y1 + t0 * dy, x1 + t1 * dx, y1 + t1 * dy];
}
