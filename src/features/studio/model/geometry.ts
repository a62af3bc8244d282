/**
 * What the editor needs to know about a design's geometry: the cavity, where each brace and opening
 * sits, along which box axes it can move, and how to move it while keeping it inside the box.
 * Box coordinates as in PRODUCT.md §3 (mm, origin at the outer front-bottom-left corner).
 */
import { FACE_COORDS } from '../../../../shared/schemas/design.schema';
import type { Axis, Brace, Face, Opening } from '../../../../shared/schemas/design.schema';
import type { Selection, StudioDoc } from './types';

export interface Range {
  min: number;
  max: number;
}
export type Box3 = Record<Axis, Range>;

export const AXIS_SIZE_KEY: Record<Axis, 'width' | 'height' | 'depth'> = { x: 'width', y: 'height', z: 'depth' };

export function baffleThicknessMm(doc: StudioDoc): number {
  return doc.baffleThickness ?? doc.material.thickness;
}

export function outerSizeMm(doc: StudioDoc, axis: Axis): number {
  return doc.outer[AXIS_SIZE_KEY[axis]];
}

/** The internal cavity: (W−2t) × (H−2t) × (D−tf−t) whatever the joinery (PRODUCT.md §3). */
export function cavity(doc: StudioDoc): Box3 {
  const t = doc.material.thickness;
  const tf = baffleThicknessMm(doc);
  return {
    x: { min: t, max: doc.outer.width - t },
    y: { min: t, max: doc.outer.height - t },
    z: { min: tf, max: doc.outer.depth - t },
  };
}

/** The two axes a brace spans or a bar's `at` refers to, in alphabetical order (PRODUCT.md §8). */
export function otherAxes(axis: Axis): [Axis, Axis] {
  return axis === 'x' ? ['y', 'z'] : axis === 'y' ? ['x', 'z'] : ['x', 'y'];
}

/** The axis normal to a face, and whether the face is at the low or high end of it. */
export function faceNormal(face: Face): { axis: Axis; side: 'min' | 'max' } {
  switch (face) {
    case 'front':
      return { axis: 'z', side: 'min' };
    case 'back':
      return { axis: 'z', side: 'max' };
    case 'left':
      return { axis: 'x', side: 'min' };
    case 'right':
      return { axis: 'x', side: 'max' };
    case 'bottom':
      return { axis: 'y', side: 'min' };
    case 'top':
      return { axis: 'y', side: 'max' };
  }
}

/** The thickness of the panel that closes a face. */
export function faceThicknessMm(doc: StudioDoc, face: Face): number {
  return face === 'front' ? baffleThicknessMm(doc) : doc.material.thickness;
}

/** Outer diameter of a round port tube: inner diameter + 2 × wall. */
export function portOuterDiameterMm(o: Extract<Opening, { type: 'port' }>): number {
  return (o.diameter ?? 0) + 2 * (o.wall ?? 0);
}

/**
 * The cut-out's extent on its face along the face's two coordinates (FACE_COORDS order), and whether
 * it is round. A driver's rebate and screw holes count when they reach further than the cut-out
 * (as in the engine's fit check).
 */
export function openingExtentMm(o: Opening): { size: [number, number]; round: boolean } {
  switch (o.type) {
    case 'driver': {
      const screws = o.screwHoles ? o.screwHoles.circleDiameter + o.screwHoles.holeDiameter : 0;
      const d = Math.max(o.diameter, o.rebate?.diameter ?? 0, screws);
      return { size: [d, d], round: true };
    }
    case 'port':
      if (o.shape === 'slot') return { size: [o.width ?? 0, o.height ?? 0], round: false };
      return { size: [portOuterDiameterMm(o), portOuterDiameterMm(o)], round: true };
    case 'terminal':
      if (o.width !== undefined && o.height !== undefined) return { size: [o.width, o.height], round: false };
      return { size: [o.diameter ?? 0, o.diameter ?? 0], round: true };
    case 'lead':
      return { size: [o.diameter, o.diameter], round: true };
  }
}

/** The box axes along which the selection can be dragged or nudged. */
export function movableAxes(doc: StudioDoc, sel: Selection): Axis[] {
  if (sel === null) return [];
  if (sel.kind === 'box') return [];
  if (sel.kind === 'brace') {
    const b = doc.braces[sel.index];
    if (!b) return [];
    return b.type === 'shelf' ? [b.axis] : otherAxes(b.axis);
  }
  const o = doc.openings[sel.index];
  return o ? [...FACE_COORDS[o.face]] : [];
}

/** The selection's current coordinate along a box axis (its centre), or null if it has none there. */
export function itemCoordMm(doc: StudioDoc, sel: Selection, axis: Axis): number | null {
  if (sel === null || sel.kind === 'box') return null;
  if (sel.kind === 'brace') {
    const b = doc.braces[sel.index];
    if (!b) return null;
    if (b.type === 'shelf') return b.axis === axis ? b.position : null;
    const [a0, a1] = otherAxes(b.axis);
    return axis === a0 ? b.at[0] : axis === a1 ? b.at[1] : null;
  }
  const o = doc.openings[sel.index];
  if (!o || !FACE_COORDS[o.face].includes(axis)) return null;
  return o[axis] ?? null;
}

/** The allowed range of the selection's centre along an axis, so it stays inside the cavity or its face. */
export function itemRangeMm(doc: StudioDoc, sel: Selection, axis: Axis): Range | null {
  if (sel === null || sel.kind === 'box') return null;
  const cav = cavity(doc);
  if (sel.kind === 'brace') {
    const b = doc.braces[sel.index];
    if (!b) return null;
    if (b.type === 'shelf') {
      const half = b.thickness / 2;
      return { min: cav[axis].min + half, max: cav[axis].max - half };
    }
    const [a0] = otherAxes(b.axis);
    const half = (axis === a0 ? b.section[0] : b.section[1]) / 2;
    return { min: cav[axis].min + half, max: cav[axis].max - half };
  }
  const o = doc.openings[sel.index];
  if (!o) return null;
  const coords = FACE_COORDS[o.face];
  const { size } = openingExtentMm(o);
  const half = (axis === coords[0] ? size[0] : size[1]) / 2;
  return { min: half, max: outerSizeMm(doc, axis) - half };
}

export function clampToRange(value: number, range: Range | null): number {
  if (!range) return value;
  if (range.min > range.max) return (range.min + range.max) / 2;
  return Math.min(range.max, Math.max(range.min, value));
}

function replaceAt<T>(items: readonly T[], index: number, item: T): T[] {
  const next = items.slice();
  next[index] = item;
  return next;
}

/** Returns a new design with the selection's centre moved to the given coordinates (others unchanged). */
export function withItemCoords(doc: StudioDoc, sel: Selection, coords: Partial<Record<Axis, number>>): StudioDoc {
  if (sel === null || sel.kind === 'box') return doc;
  if (sel.kind === 'brace') {
    const b = doc.braces[sel.index];
    if (!b) return doc;
    let next: Brace;
    if (b.type === 'shelf') {
      const p = coords[b.axis];
      if (p === undefined || p === b.position) return doc;
      next = { ...b, position: p };
    } else {
      const [a0, a1] = otherAxes(b.axis);
      const at: [number, number] = [coords[a0] ?? b.at[0], coords[a1] ?? b.at[1]];
      if (at[0] === b.at[0] && at[1] === b.at[1]) return doc;
      next = { ...b, at };
    }
    return { ...doc, braces: replaceAt(doc.braces, sel.index, next) };
  }
  const o = doc.openings[sel.index];
  if (!o) return doc;
  const patch: Partial<Record<Axis, number>> = {};
  let changed = false;
  for (const axis of FACE_COORDS[o.face]) {
    const v = coords[axis];
    if (v !== undefined && v !== o[axis]) {
      patch[axis] = v;
      changed = true;
    }
  }
  if (!changed) return doc;
  return { ...doc, openings: replaceAt(doc.openings, sel.index, { ...o, ...patch } as Opening) };
}

/**
 * Centre lines a coordinate snaps to along an axis: the middle of the outer box and of the cavity, and
 * the centres of the other items of the same family on that axis (braces align with braces, openings
 * with openings; a brace lined up with a cut-out's centre means nothing to a builder).
 */
export function centreLinesMm(doc: StudioDoc, axis: Axis, except: Selection): number[] {
  const cav = cavity(doc);
  const lines = [outerSizeMm(doc, axis) / 2, (cav[axis].min + cav[axis].max) / 2];
  if (except?.kind === 'brace' || except?.kind === 'opening') {
    const items = except.kind === 'brace' ? doc.braces : doc.openings;
    items.forEach((_, index) => {
      if (index === except.index) return;
      const c = itemCoordMm(doc, { kind: except.kind, index }, axis);
      if (c !== null) lines.push(c);
    });
  }
  return [...new Set(lines)];
}

/** Smallest outer size the edge handles allow along an axis: the panels plus 10 mm of air (our choice). */
export function minOuterSizeMm(doc: StudioDoc, axis: Axis): number {
  const t = doc.material.thickness;
  const front = axis === 'z' ? baffleThicknessMm(doc) : t;
  return front + t + 10;
}
