/**
 * The box frame: outer size, panel thicknesses, the internal cavity, the panels' extents for a joinery
 * precedence, and the 2-D view of each face.
 *
 * Box coordinates (PRODUCT.md §3): origin at the outer front-bottom-left corner, x to the right as seen from
 * the front, y up, z from the front towards the back. All lengths in mm.
 *
 * Face view ("face coordinates", u and v): each of the six faces is drawn as seen from OUTSIDE the box,
 * origin at the lower-left corner of the outer face as the viewer sees it:
 *   front  u = x,      v = y   (viewer in front)
 *   back   u = W − x,  v = y   (viewer behind the box)
 *   left   u = D − z,  v = y   (viewer at the box's left; the front edge is on their right)
 *   right  u = z,      v = y   (viewer at the box's right; the front edge is on their left)
 *   top    u = x,      v = z   (viewer above, front edge nearest, at the bottom of the view)
 *   bottom u = W − x,  v = z   (viewer below, front edge at the bottom of the view)
 * A panel's own coordinates are its face coordinates shifted so the panel's lower-left corner is (0, 0);
 * a lining piece's are shifted to the piece's lower-left corner (same view, looking through the wall).
 */
import type { Axis, Design, Face, FacePair } from '../schemas/design.schema.js';
import type { Rect } from '../geometry/polygon.js';

export type Vec3 = [number, number, number];

export interface Box3 {
  min: Vec3;
  max: Vec3;
}

export const AXIS_INDEX: Record<Axis, 0 | 1 | 2> = { x: 0, y: 1, z: 2 };

/** The axis each face is perpendicular to, and whether it sits at the low or high end. */
export const FACE_NORMAL: Record<Face, { axis: Axis; side: 'min' | 'max' }> = {
  front: { axis: 'z', side: 'min' },
  back: { axis: 'z', side: 'max' },
  left: { axis: 'x', side: 'min' },
  right: { axis: 'x', side: 'max' },
  bottom: { axis: 'y', side: 'min' },
  top: { axis: 'y', side: 'max' },
};

/** Face view: which box axis runs along u (and whether it is mirrored) and along v. */
export const FACE_VIEW: Record<Face, { u: Axis; uMirrored: boolean; v: Axis }> = {
  front: { u: 'x', uMirrored: false, v: 'y' },
  back: { u: 'x', uMirrored: true, v: 'y' },
  left: { u: 'z', uMirrored: true, v: 'y' },
  right: { u: 'z', uMirrored: false, v: 'y' },
  top: { u: 'x', uMirrored: false, v: 'z' },
  bottom: { u: 'x', uMirrored: true, v: 'z' },
};

export const FACE_PAIR_OF: Record<Face, FacePair> = {
  front: 'frontBack',
  back: 'frontBack',
  left: 'sides',
  right: 'sides',
  top: 'topBottom',
  bottom: 'topBottom',
};

/** The face pair whose panels are perpendicular to an axis (and so take up its length). */
export const PAIR_ACROSS_AXIS: Record<Axis, FacePair> = { x: 'sides', y: 'topBottom', z: 'frontBack' };

export interface Frame {
  /** Outer sizes along x, y, z. */
  outer: Vec3;
  /** Panel thickness t. */
  thickness: number;
  /** Front (baffle) thickness tf. */
  baffleThickness: number;
  /** Internal cavity: (W−2t) × (H−2t) × (D−tf−t) whatever the joinery. */
  cavity: Box3;
  /** Position of each face pair in the joinery precedence (0 = runs through). */
  rank: Record<FacePair, number>;
}

export function makeFrame(design: Design): Frame {
  const t = design.material.thickness;
  const tf = design.baffleThickness ?? t;
  const { width: W, height: H, depth: D } = design.outer;
  const rank = { frontBack: 0, sides: 0, topBottom: 0 } as Record<FacePair, number>;
  design.joinery.forEach((p, i) => (rank[p] = i));
  return {
    outer: [W, H, D],
    thickness: t,
    baffleThickness: tf,
    cavity: { min: [t, t, tf], max: [W - t, H - t, D - t] },
    rank,
  };
}

export function panelThickness(frame: Frame, face: Face): number {
  return face === 'front' ? frame.baffleThickness : frame.thickness;
}

export function cavitySize(frame: Frame): Vec3 {
  const { min, max } = frame.cavity;
  return [max[0] - min[0], max[1] - min[1], max[2] - min[2]];
}

/** Box coordinate of a point on the face's plane given the opening's two coordinates. */
export function faceCoordsOf(frame: Frame, face: Face, p: Vec3): [number, number] {
  const view = FACE_VIEW[face];
  const ui = AXIS_INDEX[view.u];
  const u = view.uMirrored ? frame.outer[ui] - p[ui] : p[ui];
  return [u, p[AXIS_INDEX[view.v]]];
}

/** A box projected onto a face, in face coordinates. */
export function faceRectOf(frame: Frame, face: Face, box: Box3): Rect {
  const [u1, v1] = faceCoordsOf(frame, face, box.min);
  const [u2, v2] = faceCoordsOf(frame, face, box.max);
  return { minX: Math.min(u1, u2), minY: Math.min(v1, v2), maxX: Math.max(u1, u2), maxY: Math.max(v1, v2) };
}

/** Outer size of a face in face coordinates (u size, v size). */
export function faceSize(frame: Frame, face: Face): [number, number] {
  const view = FACE_VIEW[face];
  return [frame.outer[AXIS_INDEX[view.u]], frame.outer[AXIS_INDEX[view.v]]];
}

export function outerFaceRect(frame: Frame, face: Face): Rect {
  const [w, h] = faceSize(frame, face);
  return { minX: 0, minY: 0, maxX: w, maxY: h };
}

/** The cavity seen through a face: where air is behind the panel. */
export function cavityFaceRect(frame: Frame, face: Face): Rect {
  return faceRectOf(frame, face, frame.cavity);
}

/**
 * The 3-D extent of a face's panel for the joinery precedence: along each in-plane axis it runs the full
 * outer size unless the pair across that axis comes earlier, in which case it fits between those panels.
 */
export function panelBox(frame: Frame, face: Face): Box3 {
  const pair = FACE_PAIR_OF[face];
  const min: Vec3 = [0, 0, 0];
  const max: Vec3 = [...frame.outer];
  const axes: Axis[] = ['x', 'y', 'z'];
  const normal = FACE_NORMAL[face];
  for (const a of axes) {
    const i = AXIS_INDEX[a];
    if (a === normal.axis) {
      const th = panelThickness(frame, face);
      if (normal.side === 'min') max[i] = th;
      else min[i] = frame.outer[i] - th;
    } else if (frame.rank[PAIR_ACROSS_AXIS[a]] < frame.rank[pair]) {
      min[i] = frame.cavity.min[i];
      max[i] = frame.cavity.max[i];
    }
  }
  return { min, max };
}

export function panelFaceRect(frame: Frame, face: Face): Rect {
  return faceRectOf(frame, face, panelBox(frame, face));
}

/** The point on a face's plane (outer surface) of an opening placed by its two box coordinates. */
export function openingPoint(frame: Frame, face: Face, x: number | undefined, y: number | undefined, z: number | undefined): Vec3 {
  const n = FACE_NORMAL[face];
  const p: Vec3 = [x ?? 0, y ?? 0, z ?? 0];
  const i = AXIS_INDEX[n.axis];
  p[i] = n.side === 'min' ? 0 : frame.outer[i];
  return p;
}

export function boxesOverlap(a: Box3, b: Box3, eps = 1e-6): boolean {
  for (let i = 0; i < 3; i++) {
    if (!(a.min[i]! < b.max[i]! - eps && b.min[i]! < a.max[i]! - eps)) return false;
  }
  return true;
}

export function boxIntersection(a: Box3, b: Box3): Box3 | null {
  const min: Vec3 = [0, 0, 0];
  const max: Vec3 = [0, 0, 0];
  for (let i = 0; i < 3; i++) {
    min[i] = Math.max(a.min[i]!, b.min[i]!);
    max[i] = Math.min(a.max[i]!, b.max[i]!);
    if (max[i]! - min[i]! <= 1e-6) return null;
  }
  return { min, max };
}
