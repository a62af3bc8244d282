/**
 * The three drawings as plain primitives in millimetres, laid out side by side in one world, bottoms
 * aligned (a row uses a wide screen better than a projection cross):
 * - front: seen from the front, h = x, v = y (back-face items drawn dashed, seen through);
 * - side: section at mid-width seen from the right, h = z (front at the left), v = y;
 * - top: section at mid-height seen from above, h = x, v = z (front at the bottom).
 * The canvas only maps these to pixels and styles them by `role`.
 */
import { screwHoleCentres } from '../../../../shared/cabinet/elements';
import { FACE_COORDS } from '../../../../shared/schemas/design.schema';
import type { Axis, Face } from '../../../../shared/schemas/design.schema';
import { baffleThicknessMm, cavity, faceNormal, openingExtentMm, otherAxes, outerSizeMm, portOuterDiameterMm } from './geometry';
import type { StudioDoc, ViewName } from './types';

export const VIEWS: readonly ViewName[] = ['front', 'side', 'top'];
export const VIEW_AXES: Record<ViewName, { h: Axis; v: Axis; normal: Axis }> = {
  front: { h: 'x', v: 'y', normal: 'z' },
  side: { h: 'z', v: 'y', normal: 'x' },
  top: { h: 'x', v: 'z', normal: 'y' },
};
export const VIEW_TITLES: Record<ViewName, string> = { front: 'Front', side: 'Side section', top: 'Top section' };
/** The face nearest the viewer in each view: its items are drawn solid, the opposite face's dashed. */
const NEAR_FACE: Record<ViewName, Face> = { front: 'front', side: 'right', top: 'top' };

/** What a primitive is, for hit-testing and drag: a brace, an opening, or an outer edge (resize handle). */
export type HitId = `brace:${number}` | `opening:${number}` | `edge:${Axis}`;

export type Role =
  | 'outline'
  | 'wall'
  | 'cavity'
  | 'lining'
  | 'brace'
  | 'bar'
  | 'window'
  | 'driver'
  | 'rebate'
  /** A driver's screw hole. */
  | 'screw'
  | 'port'
  | 'tube'
  | 'terminal'
  | 'lead'
  /** A cut-out seen edge-on: a gap through the wall. */
  | 'gap'
  | 'edge';

export type Prim =
  | { kind: 'rect'; role: Role; x: number; y: number; w: number; h: number; hit?: HitId; dashed?: boolean }
  | { kind: 'circle'; role: Role; cx: number; cy: number; r: number; hit?: HitId; dashed?: boolean }
  | { kind: 'line'; role: Role; points: [number, number, number, number]; hit?: HitId; dashed?: boolean };

export interface ViewLayout {
  view: ViewName;
  /** World position of the view's origin (box coordinate 0,0 of its two axes). */
  ox: number;
  oy: number;
  /** Size of the drawing along h and v (outer box). */
  w: number;
  h: number;
}

export interface WorldLayout {
  views: Record<ViewName, ViewLayout>;
  /** World bounds of all three drawings including room for dimension lines. */
  bounds: { minX: number; minY: number; maxX: number; maxY: number };
  gapMm: number;
}

export function layoutViews(doc: StudioDoc): WorldLayout {
  const { width: W, height: H, depth: D } = doc.outer;
  const gap = Math.max(110, 0.22 * Math.max(W, H, D));
  const views: Record<ViewName, ViewLayout> = {
    front: { view: 'front', ox: 0, oy: 0, w: W, h: H },
    side: { view: 'side', ox: W + gap, oy: 0, w: D, h: H },
    top: { view: 'top', ox: W + gap + D + gap, oy: 0, w: W, h: D },
  };
  const margin = gap * 0.55;
  return {
    views,
    gapMm: gap,
    bounds: { minX: -margin, minY: -margin * 0.8, maxX: 2 * W + D + 2 * gap + margin, maxY: Math.max(H, D) + margin * 0.6 },
  };
}

/** Which lining covers a corner where two lined faces meet (PRODUCT.md §3): back, then sides, then top and bottom. */
const LINING_RANK: Record<Face, number> = { back: 3, left: 2, right: 2, top: 1, bottom: 1, front: 0 };

type Rect2 = { x: number; y: number; w: number; h: number };

function boxRect(hMin: number, hMax: number, vMin: number, vMax: number): Rect2 {
  return { x: hMin, y: vMin, w: hMax - hMin, h: vMax - vMin };
}

/** Builds the primitives of one view, in the view's own mm coordinates (origin at the box corner). */
export function projectView(doc: StudioDoc, view: ViewName): Prim[] {
  const { h: ha, v: va, normal } = VIEW_AXES[view];
  const cav = cavity(doc);
  const sizeH = outerSizeMm(doc, ha);
  const sizeV = outerSizeMm(doc, va);
  const prims: Prim[] = [];
  const section = view !== 'front';

  // Walls: the outer rectangle; in sections the cavity cut out of it shows the panel thickness.
  prims.push({ kind: 'rect', role: section ? 'wall' : 'outline', x: 0, y: 0, w: sizeH, h: sizeV });
  prims.push({ kind: 'rect', role: 'cavity', ...boxRect(cav[ha].min, cav[ha].max, cav[va].min, cav[va].max), dashed: !section });

  // Lining: a band on each lined face seen edge-on in a section.
  if (section && doc.lining) {
    const f = doc.lining.thickness;
    for (const face of doc.lining.faces) {
      const n = faceNormal(face);
      if (n.axis !== ha && n.axis !== va) continue;
      const along = n.axis === ha ? va : ha;
      const lo = n.side === 'min' ? cav[n.axis].min : cav[n.axis].max - f;
      // Stop where a lining that covers the corner meets this one.
      const lined = (face2: Face) => doc.lining!.faces.includes(face2) && LINING_RANK[face2] > LINING_RANK[face];
      const ends = (['min', 'max'] as const).map((side) => {
        const other = (Object.keys(LINING_RANK) as Face[]).find((x) => faceNormal(x).axis === along && faceNormal(x).side === side)!;
        return lined(other) ? f : 0;
      });
      const a0 = cav[along].min + ends[0]!;
      const a1 = cav[along].max - ends[1]!;
      const r = n.axis === ha ? boxRect(lo, lo + f, a0, a1) : boxRect(a0, a1, lo, lo + f);
      prims.push({ kind: 'rect', role: 'lining', ...r });
    }
  }

  // Braces.
  doc.braces.forEach((b, i) => {
    const hit: HitId = `brace:${i}`;
    if (b.type === 'shelf') {
      if (b.axis === normal) return; // parallel to the drawing plane: not drawn
      const half = b.thickness / 2;
      const across = b.axis === ha ? va : ha;
      const r =
        b.axis === ha
          ? boxRect(b.position - half, b.position + half, cav[va].min, cav[va].max)
          : boxRect(cav[ha].min, cav[ha].max, b.position - half, b.position + half);
      prims.push({ kind: 'rect', role: 'brace', ...r, hit, dashed: !section });
      // Windows show as gaps along the axis the view cuts across.
      const [u, v] = otherAxes(b.axis);
      for (const win of b.windows) {
        const centre = across === u ? win.u : win.v;
        const extent = win.shape === 'round' ? win.diameter : across === u ? win.width : win.height;
        const wr =
          b.axis === ha
            ? boxRect(b.position - half, b.position + half, centre - extent / 2, centre + extent / 2)
            : boxRect(centre - extent / 2, centre + extent / 2, b.position - half, b.position + half);
        prims.push({ kind: 'rect', role: 'window', ...wr, hit, dashed: !section });
      }
      return;
    }
    const [a0, a1] = otherAxes(b.axis);
    const c: Partial<Record<Axis, number>> = { [a0]: b.at[0], [a1]: b.at[1] };
    const s: Partial<Record<Axis, number>> = { [a0]: b.section[0], [a1]: b.section[1] };
    const range = (a: Axis): [number, number] =>
      a === b.axis ? [cav[a].min, cav[a].max] : [c[a]! - s[a]! / 2, c[a]! + s[a]! / 2];
    const [h0, h1] = range(ha);
    const [v0, v1] = range(va);
    prims.push({ kind: 'rect', role: 'bar', ...boxRect(h0, h1, v0, v1), hit, dashed: !section && b.axis !== normal });
  });

  // Openings.
  doc.openings.forEach((o, i) => {
    const hit: HitId = `opening:${i}`;
    const n = faceNormal(o.face);
    const role: Role = o.type === 'driver' ? 'driver' : o.type === 'port' ? 'port' : o.type === 'terminal' ? 'terminal' : 'lead';
    const coords = FACE_COORDS[o.face];
    const { size, round } = openingExtentMm(o);
    const pos = (a: Axis) => o[a] ?? 0;
    if (n.axis === normal) {
      // The face is parallel to the drawing: draw the cut-out where it is.
      const dashed = o.face !== NEAR_FACE[view];
      const cx = pos(ha);
      const cy = pos(va);
      const sh = coords[0] === ha ? size[0] : size[1];
      const sv = coords[0] === ha ? size[1] : size[0];
      if (o.type === 'driver') {
        if (o.rebate && o.rebate.diameter > o.diameter) prims.push({ kind: 'circle', role: 'rebate', cx, cy, r: o.rebate.diameter / 2, hit, dashed });
        prims.push({ kind: 'circle', role, cx, cy, r: o.diameter / 2, hit, dashed });
        // Screw holes where the engine puts them on the panel (the first at the top).
        if (o.screwHoles) {
          for (const [sx, sy] of screwHoleCentres(cx, cy, o.screwHoles.count, o.screwHoles.circleDiameter)) {
            prims.push({ kind: 'circle', role: 'screw', cx: sx, cy: sy, r: o.screwHoles.holeDiameter / 2, hit, dashed });
          }
        }
      } else if (round && o.type === 'port' && (o.wall ?? 0) > 0) {
        // The tube's wall as a ring, the bore inside it.
        prims.push({ kind: 'circle', role: 'tube', cx, cy, r: sh / 2, hit, dashed });
        prims.push({ kind: 'circle', role: 'port', cx, cy, r: (o.diameter ?? 0) / 2, hit, dashed });
      } else if (round) {
        prims.push({ kind: 'circle', role, cx, cy, r: sh / 2, hit, dashed });
      } else {
        prims.push({ kind: 'rect', role, x: cx - sh / 2, y: cy - sv / 2, w: sh, h: sv, hit, dashed });
      }
      return;
    }
    // The face is seen edge-on: a gap in the wall, and a port's tube running into the box.
    const along = n.axis === ha ? va : ha; // the face coordinate visible in this view
    const centre = pos(along);
    const ext = coords[0] === along ? size[0] : size[1];
    const wallT = o.face === 'front' ? baffleThicknessMm(doc) : doc.material.thickness;
    const outerAt = n.side === 'min' ? 0 : outerSizeMm(doc, n.axis);
    const dir = n.side === 'min' ? 1 : -1;
    const depthIn = o.type === 'port' ? o.length : wallT;
    const a = outerAt;
    const bEnd = outerAt + dir * depthIn;
    const nMin = Math.min(a, bEnd);
    const nMax = Math.max(a, bEnd);
    const r = n.axis === ha ? boxRect(nMin, nMax, centre - ext / 2, centre + ext / 2) : boxRect(centre - ext / 2, centre + ext / 2, nMin, nMax);
    prims.push({ kind: 'rect', role: o.type === 'port' ? 'tube' : 'gap', ...r, hit, dashed: !section });
    if (o.type === 'port' && o.shape === 'round') {
      // The bore inside the tube wall.
      const bore = o.diameter ?? 0;
      const ir =
        n.axis === ha ? boxRect(nMin, nMax, centre - bore / 2, centre + bore / 2) : boxRect(centre - bore / 2, centre + bore / 2, nMin, nMax);
      if (portOuterDiameterMm(o) > bore) prims.push({ kind: 'rect', role: 'port', ...ir, hit, dashed: !section });
    }
  });

  // Resize handles: the right and top edges of each view (the far ends of its two axes).
  prims.push({ kind: 'line', role: 'edge', points: [sizeH, 0, sizeH, sizeV], hit: `edge:${ha}` });
  prims.push({ kind: 'line', role: 'edge', points: [0, sizeV, sizeH, sizeV], hit: `edge:${va}` });
  return prims;
}

/** Parses a hit id into the selection it stands for (edges select the box). */
export function parseHit(hit: HitId): { kind: 'brace' | 'opening'; index: number } | { kind: 'edge'; axis: Axis } {
  const [kind, rest] = hit.split(':') as [string, string];
  if (kind === 'edge') return { kind: 'edge', axis: rest as Axis };
  return { kind: kind as 'brace' | 'opening', index: Number(rest) };
}

/** Which item a warning's field path points at (`openings[2].length` → opening 2). */
export function hitForField(field: string | undefined): HitId | null {
  if (!field) return null;
  const m = /^(braces|openings)\[(\d+)\]/.exec(field);
  if (!m) return null;
  return m[1] === 'braces' ? `brace:${Number(m[2])}` : `opening:${Number(m[2])}`;
}
