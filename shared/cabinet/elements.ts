/**
 * Braces and openings as geometry: 3-D boxes for braces, cut-outs in face coordinates for openings,
 * and port tubes. All lengths in mm.
 */
import type { Axis, BarBrace, Opening, PortOpening, ShelfBrace, BraceWindow } from '../schemas/design.schema.js';
import { circlePolygon, rectContains, rectFromCentre, rectPolygon, type Point, type Rect } from '../geometry/polygon.js';
import { AXIS_INDEX, FACE_NORMAL, FACE_VIEW, faceCoordsOf, openingPoint, panelThickness, type Box3, type Frame, type Vec3 } from './frame.js';

/** The two axes a brace spans (or a bar's cross-section uses), in alphabetical order. */
export const OTHER_AXES: Record<Axis, [Axis, Axis]> = { x: ['y', 'z'], y: ['x', 'z'], z: ['x', 'y'] };

export function shelfBraceBox(frame: Frame, brace: ShelfBrace): Box3 {
  const min: Vec3 = [...frame.cavity.min];
  const max: Vec3 = [...frame.cavity.max];
  const i = AXIS_INDEX[brace.axis];
  min[i] = brace.position - brace.thickness / 2;
  max[i] = brace.position + brace.thickness / 2;
  return { min, max };
}

export function barBraceBox(frame: Frame, bar: BarBrace): Box3 {
  const min: Vec3 = [...frame.cavity.min];
  const max: Vec3 = [...frame.cavity.max];
  OTHER_AXES[bar.axis].forEach((a, k) => {
    const i = AXIS_INDEX[a];
    min[i] = bar.at[k]! - bar.section[k]! / 2;
    max[i] = bar.at[k]! + bar.section[k]! / 2;
  });
  return { min, max };
}

/** A cut-out in 2-D: round (centre, diameter) or rectangular (centre, width, height). */
export type Cutout =
  | { shape: 'round'; cx: number; cy: number; diameter: number }
  | { shape: 'rect'; cx: number; cy: number; width: number; height: number };

export function cutoutBounds(c: Cutout): Rect {
  return c.shape === 'round' ? rectFromCentre(c.cx, c.cy, c.diameter, c.diameter) : rectFromCentre(c.cx, c.cy, c.width, c.height);
}

export function cutoutPolygon(c: Cutout): Point[] {
  return c.shape === 'round' ? circlePolygon(c.cx, c.cy, c.diameter) : rectPolygon(cutoutBounds(c));
}

export function cutoutArea(c: Cutout): number {
  return c.shape === 'round' ? (Math.PI * c.diameter * c.diameter) / 4 : c.width * c.height;
}

/** Whether two cut-outs overlap (exact for circle/circle and rect/rect, circle/rect by closest point). */
export function cutoutsOverlap(a: Cutout, b: Cutout): boolean {
  if (a.shape === 'round' && b.shape === 'round') {
    return Math.hypot(a.cx - b.cx, a.cy - b.cy) < (a.diameter + b.diameter) / 2 - 1e-6;
  }
  if (a.shape === 'rect' && b.shape === 'rect') {
    const ra = cutoutBounds(a);
    const rb = cutoutBounds(b);
    return ra.minX < rb.maxX && rb.minX < ra.maxX && ra.minY < rb.maxY && rb.minY < ra.maxY;
  }
  const circle = a.shape === 'round' ? a : (b as Extract<Cutout, { shape: 'round' }>);
  const rect = cutoutBounds(a.shape === 'rect' ? a : b);
  return circleOverlapsRect(circle.cx, circle.cy, circle.diameter / 2, rect);
}

/** Whether `inner` lies wholly inside `outer` (a rectangle in a circle: its four corners). */
export function cutoutContains(outer: Cutout, inner: Cutout): boolean {
  const eps = 1e-6;
  if (outer.shape === 'rect') return rectContains(cutoutBounds(outer), cutoutBounds(inner));
  const r = outer.diameter / 2;
  if (inner.shape === 'round') return Math.hypot(inner.cx - outer.cx, inner.cy - outer.cy) + inner.diameter / 2 <= r + eps;
  const b = cutoutBounds(inner);
  return [
    [b.minX, b.minY],
    [b.maxX, b.minY],
    [b.maxX, b.maxY],
    [b.minX, b.maxY],
  ].every(([x, y]) => Math.hypot(x! - outer.cx, y! - outer.cy) <= r + eps);
}

export function circleOverlapsRect(cx: number, cy: number, r: number, rect: Rect): boolean {
  const nx = Math.min(Math.max(cx, rect.minX), rect.maxX);
  const ny = Math.min(Math.max(cy, rect.minY), rect.maxY);
  return Math.hypot(cx - nx, cy - ny) < r - 1e-6;
}

export function cutoutOverlapsRect(c: Cutout, rect: Rect): boolean {
  if (c.shape === 'round') return circleOverlapsRect(c.cx, c.cy, c.diameter / 2, rect);
  const b = cutoutBounds(c);
  return b.minX < rect.maxX - 1e-6 && rect.minX < b.maxX - 1e-6 && b.minY < rect.maxY - 1e-6 && rect.minY < b.maxY - 1e-6;
}

/** Centre of an opening in face coordinates. */
export function openingCentre(frame: Frame, o: Opening): [number, number] {
  return faceCoordsOf(frame, o.face, openingPoint(frame, o.face, o.x, o.y, o.z));
}

/** Outer size of a port tube across its axis: round → outer diameter d + 2·wall; slot → (w + 2·wall) × (h + 2·wall). */
export function portOuterCutout(frame: Frame, p: PortOpening, clearance = 0): Cutout {
  const [cx, cy] = openingCentre(frame, p);
  if (p.shape === 'slot') {
    return { shape: 'rect', cx, cy, width: (p.width ?? 0) + 2 * p.wall + 2 * clearance, height: (p.height ?? 0) + 2 * p.wall + 2 * clearance };
  }
  return { shape: 'round', cx, cy, diameter: (p.diameter ?? 0) + 2 * p.wall + 2 * clearance };
}

/** The through cut-out an opening makes in its panel, in face coordinates. */
export function throughCutout(frame: Frame, o: Opening): Cutout {
  const [cx, cy] = openingCentre(frame, o);
  switch (o.type) {
    case 'driver':
      return { shape: 'round', cx, cy, diameter: o.diameter };
    case 'port':
      return portOuterCutout(frame, o);
    case 'terminal':
      if (o.width !== undefined && o.height !== undefined) return { shape: 'rect', cx, cy, width: o.width, height: o.height };
      return { shape: 'round', cx, cy, diameter: o.diameter ?? 0 };
    case 'lead':
      return { shape: 'round', cx, cy, diameter: o.diameter };
  }
}

/** Everything the opening cuts into its panel (through cut-out, rebate, screw holes), as one bounding rectangle. */
export function openingFootprint(frame: Frame, o: Opening): Rect {
  const b = cutoutBounds(throughCutout(frame, o));
  if (o.type !== 'driver') return b;
  const [cx, cy] = openingCentre(frame, o);
  let r = 0;
  if (o.rebate) r = Math.max(r, o.rebate.diameter / 2);
  if (o.screwHoles) r = Math.max(r, o.screwHoles.circleDiameter / 2 + o.screwHoles.holeDiameter / 2);
  return {
    minX: Math.min(b.minX, cx - r),
    minY: Math.min(b.minY, cy - r),
    maxX: Math.max(b.maxX, cx + r),
    maxY: Math.max(b.maxY, cy + r),
  };
}

/** Screw hole centres on the pitch circle, evenly spaced, the first straight above the centre (12 o'clock). */
export function screwHoleCentres(cx: number, cy: number, count: number, circleDiameter: number): Point[] {
  const out: Point[] = [];
  const r = circleDiameter / 2;
  for (let i = 0; i < count; i++) {
    const a = Math.PI / 2 + (2 * Math.PI * i) / count;
    out.push([cx + r * Math.cos(a), cy + r * Math.sin(a)]);
  }
  return out;
}

export function windowCutout(frame: Frame, brace: ShelfBrace, w: BraceWindow): Cutout {
  const [ua, va] = OTHER_AXES[brace.axis];
  const cx = w.u - frame.cavity.min[AXIS_INDEX[ua]];
  const cy = w.v - frame.cavity.min[AXIS_INDEX[va]];
  return w.shape === 'rect' ? { shape: 'rect', cx, cy, width: w.width, height: w.height } : { shape: 'round', cx, cy, diameter: w.diameter };
}

/** A port tube inside the box. */
export interface PortTube {
  /** Inner cross-section area, mm². */
  innerAreaMm2: number;
  /** Outer cross-section area (tube and wall), mm². */
  outerAreaMm2: number;
  /** Diameter that stands for the port in the end corrections and clearance rules (slot: equal-area). */
  innerDiameterMm: number;
  /** Thickness of the panel the tube passes through. */
  panelThicknessMm: number;
  /** Length of tube inside the cavity (length minus the panel). */
  insideLengthMm: number;
  /** Bounding box of the whole tube, including the part in the panel. */
  box: Box3;
  /** Bounding box of the part inside the cavity. */
  insideBox: Box3;
  /** Box coordinate of the inner end along the normal axis, and the axis. */
  innerEnd: number;
  axis: Axis;
  /** +1 when the tube runs towards larger coordinates from its face, −1 otherwise. */
  direction: 1 | -1;
  /** Centre of the tube across its axis in box coordinates; outer radius (round) or half sizes (slot). */
  outerHalf: [number, number];
  shape: 'round' | 'slot';
}

export function portTube(frame: Frame, p: PortOpening): PortTube {
  const n = FACE_NORMAL[p.face];
  const ni = AXIS_INDEX[n.axis];
  const tp = panelThickness(frame, p.face);
  const direction: 1 | -1 = n.side === 'min' ? 1 : -1;
  const start = n.side === 'min' ? 0 : frame.outer[ni];
  const innerEnd = start + direction * p.length;
  const panelInner = start + direction * tp;
  const centre = openingPoint(frame, p.face, p.x, p.y, p.z);
  const [a1, a2] = OTHER_AXES[n.axis];
  let half: [number, number];
  let innerArea: number;
  let outerArea: number;
  let dEq: number;
  if (p.shape === 'slot') {
    // Slot width and height run along the face's u and v axes.
    const w = p.width ?? 0;
    const h = p.height ?? 0;
    const view = FACE_VIEW[p.face];
    const halfByAxis: Partial<Record<Axis, number>> = { [view.u]: (w + 2 * p.wall) / 2, [view.v]: (h + 2 * p.wall) / 2 };
    half = [halfByAxis[a1] ?? 0, halfByAxis[a2] ?? 0];
    innerArea = w * h;
    outerArea = (w + 2 * p.wall) * (h + 2 * p.wall);
    dEq = 2 * Math.sqrt(innerArea / Math.PI);
  } else {
    const d = p.diameter ?? 0;
    const ro = d / 2 + p.wall;
    half = [ro, ro];
    innerArea = (Math.PI * d * d) / 4;
    outerArea = Math.PI * ro * ro;
    dEq = d;
  }
  const mkBox = (from: number, to: number): Box3 => {
    const min: Vec3 = [0, 0, 0];
    const max: Vec3 = [0, 0, 0];
    min[ni] = Math.min(from, to);
    max[ni] = Math.max(from, to);
    [a1, a2].forEach((a, k) => {
      const i = AXIS_INDEX[a];
      min[i] = centre[i]! - half[k]!;
      max[i] = centre[i]! + half[k]!;
    });
    return { min, max };
  };
  return {
    innerAreaMm2: innerArea,
    outerAreaMm2: outerArea,
    innerDiameterMm: dEq,
    panelThicknessMm: tp,
    insideLengthMm: Math.max(0, p.length - tp),
    box: mkBox(start, innerEnd),
    insideBox: mkBox(panelInner, innerEnd),
    innerEnd,
    axis: n.axis,
    direction,
    outerHalf: half,
    shape: p.shape,
  };
}
