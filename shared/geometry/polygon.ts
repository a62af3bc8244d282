/**
 * Plain polygon helpers in millimetres. A polygon is a list of [x, y] points, closed implicitly
 * (the first point is not repeated). Boolean operations go through the npm package polygon-clipping.
 */
import polygonClipping from 'polygon-clipping';
import type { Point } from '../schemas/plan.types.js';

export type { Point };

/** Segments used for every circle turned into a polygon (lining holes and notches): 64. */
export const CIRCLE_SEGMENTS = 64;

/** Lengths closer than this (mm) are treated as equal. */
export const EPS_MM = 1e-6;

export interface Rect {
  /** Lower-left corner and upper-right corner. */
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export function rectFromCentre(cx: number, cy: number, widthMm: number, heightMm: number): Rect {
  return { minX: cx - widthMm / 2, minY: cy - heightMm / 2, maxX: cx + widthMm / 2, maxY: cy + heightMm / 2 };
}

export function rectWidth(r: Rect): number {
  return r.maxX - r.minX;
}

export function rectHeight(r: Rect): number {
  return r.maxY - r.minY;
}

/** True when `inner` lies inside `outer` (touching allowed within `eps`). */
export function rectContains(outer: Rect, inner: Rect, eps = EPS_MM): boolean {
  return inner.minX >= outer.minX - eps && inner.maxX <= outer.maxX + eps && inner.minY >= outer.minY - eps && inner.maxY <= outer.maxY + eps;
}

/** True when the interiors of two rectangles overlap (touching edges do not count). */
export function rectsOverlap(a: Rect, b: Rect, eps = EPS_MM): boolean {
  return a.minX < b.maxX - eps && b.minX < a.maxX - eps && a.minY < b.maxY - eps && b.minY < a.maxY - eps;
}

/** The rectangle as a counter-clockwise polygon. */
export function rectPolygon(r: Rect): Point[] {
  return [
    [r.minX, r.minY],
    [r.maxX, r.minY],
    [r.maxX, r.maxY],
    [r.minX, r.maxY],
  ];
}

/**
 * A circle as a regular polygon with its vertices on the circle (inscribed), counter-clockwise,
 * `segments` sides (CIRCLE_SEGMENTS by default), the first vertex at angle 0.
 */
export function circlePolygon(cx: number, cy: number, diameterMm: number, segments = CIRCLE_SEGMENTS): Point[] {
  const r = diameterMm / 2;
  const out: Point[] = [];
  for (let i = 0; i < segments; i++) {
    const a = (2 * Math.PI * i) / segments;
    out.push([cx + r * Math.cos(a), cy + r * Math.sin(a)]);
  }
  return out;
}

/** Signed area by the shoelace formula: positive for counter-clockwise polygons. */
export function signedArea(poly: readonly Point[]): number {
  let s = 0;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    s += poly[j]![0] * poly[i]![1] - poly[i]![0] * poly[j]![1];
  }
  return s / 2;
}

export function polygonArea(poly: readonly Point[]): number {
  return Math.abs(signedArea(poly));
}

export function polygonBounds(poly: readonly Point[]): Rect {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const [x, y] of poly) {
    if (x < minX) minX = x;
    if (x > maxX) maxX = x;
    if (y < minY) minY = y;
    if (y > maxY) maxY = y;
  }
  return { minX, minY, maxX, maxY };
}

/** Returns the polygon with the wanted winding (counter-clockwise when `ccw`). */
export function withWinding(poly: Point[], ccw: boolean): Point[] {
  const isCcw = signedArea(poly) > 0;
  return isCcw === ccw ? poly : [...poly].reverse();
}

export function translatePolygon(poly: readonly Point[], dx: number, dy: number): Point[] {
  return poly.map(([x, y]) => [x + dx, y + dy] as Point);
}

/** A polygon with holes: one outline (counter-clockwise) and holes (clockwise). */
export interface Shape {
  outline: Point[];
  holes: Point[][];
}

function openRing(ring: ReadonlyArray<readonly [number, number]>): Point[] {
  const pts = ring.map(([x, y]) => [x, y] as Point);
  const first = pts[0];
  const last = pts[pts.length - 1];
  if (pts.length > 1 && first && last && first[0] === last[0] && first[1] === last[1]) pts.pop();
  return pts;
}

function closedRing(poly: readonly Point[]): [number, number][] {
  const ring = poly.map(([x, y]) => [x, y] as [number, number]);
  if (ring.length > 0) ring.push([ring[0]![0], ring[0]![1]]);
  return ring;
}

/**
 * A rectangle minus any number of hole polygons. Holes wholly inside the rectangle and apart from
 * each other stay holes as given (fast path); otherwise polygon-clipping computes the difference, so
 * a hole crossing an edge becomes a notch, overlapping holes merge, and a hole that cuts the
 * rectangle apart yields several shapes. Holes wholly outside are ignored.
 */
export function subtractHolesFromRect(rect: Rect, holes: readonly Point[][]): Shape[] {
  const relevant: { poly: Point[]; bounds: Rect }[] = [];
  for (const h of holes) {
    const b = polygonBounds(h);
    if (rectsOverlap(rect, b)) relevant.push({ poly: h, bounds: b });
  }
  let simple = true;
  for (let i = 0; i < relevant.length && simple; i++) {
    const a = relevant[i]!.bounds;
    if (!(a.minX > rect.minX + EPS_MM && a.maxX < rect.maxX - EPS_MM && a.minY > rect.minY + EPS_MM && a.maxY < rect.maxY - EPS_MM)) simple = false;
    for (let j = i + 1; j < relevant.length && simple; j++) {
      const b = relevant[j]!.bounds;
      if (!(a.maxX < b.minX || b.maxX < a.minX || a.maxY < b.minY || b.maxY < a.minY)) simple = false;
    }
  }
  if (simple) {
    return [{ outline: rectPolygon(rect), holes: relevant.map((h) => withWinding(h.poly, false)) }];
  }
  const result = polygonClipping.difference(
    [closedRing(rectPolygon(rect))],
    ...relevant.map((h) => [closedRing(h.poly)]),
  );
  return result.map((polygon) => {
    const [outer, ...inner] = polygon;
    return {
      outline: withWinding(openRing(outer ?? []), true),
      holes: inner.map((ring) => withWinding(openRing(ring), false)),
    };
  });
}

/** Material area of a shape: outline minus holes. */
export function shapeArea(shape: Shape): number {
  let a = polygonArea(shape.outline);
  for (const h of shape.holes) a -= polygonArea(h);
  return a;
}
