/**
 * Lining pieces (PRODUCT.md §3). Corner order: the back lining (and a front lining, if the baffle is lined)
 * covers its whole internal face; side linings stop at the back (and front) lining; top and bottom linings
 * fit between the side linings and stop at the back (and front) lining. Each piece is cut `crush` larger in
 * each direction (width + crush, height + crush), centred on the space it fills. Shelf braces split every
 * lined face their plane crosses; a bar brace makes a hole where it passes through a face's lining layer;
 * openings on a lined face make holes (driver: its cut-out; port: the tube's outer size plus the port
 * clearance on every side; terminal and lead: their cut-out). A hole crossing a piece's edge becomes a
 * notch; pieces narrower than minSliver are dropped with a warning. Circles are 64-sided polygons
 * (CIRCLE_SEGMENTS). Pieces are drawn in the face's view as seen from outside (see cabinet/frame.ts).
 */
import type { Design, Face } from '../schemas/design.schema.js';
import type { LiningPiecePlan, LiningTotals, Point, Warning } from '../schemas/plan.types.js';
import { polygonBounds, rectPolygon, shapeArea, subtractHolesFromRect, translatePolygon, type Rect } from '../geometry/polygon.js';
import { AXIS_INDEX, FACE_NORMAL, boxIntersection, faceRectOf, type Box3, type Frame, type Vec3 } from '../cabinet/frame.js';
import { barBraceBox, cutoutPolygon, portOuterCutout, throughCutout, type Cutout } from '../cabinet/elements.js';

export const LINING_PIECE_NAMES: Record<Face, string> = {
  front: 'Front (baffle) lining',
  back: 'Back lining',
  left: 'Left side lining',
  right: 'Right side lining',
  top: 'Top lining',
  bottom: 'Bottom lining',
};

/** Corner order: a face with a higher rank runs through; lower ranks stop at its lining. */
const CORNER_RANK: Record<Face, number> = { front: 3, back: 3, left: 2, right: 2, top: 1, bottom: 1 };
const FACE_ORDER: Face[] = ['back', 'left', 'right', 'top', 'bottom', 'front'];
const ALL_FACES: Face[] = ['front', 'back', 'left', 'right', 'top', 'bottom'];

const r3 = (v: number) => Math.round(v * 1000) / 1000;
const roundPoint = ([x, y]: Point): Point => [r3(x), r3(y)];

/** The layer of lining against a face, before corner order and splits: the whole internal face × thickness. */
export function liningLayerBox(frame: Frame, face: Face, thickness: number): Box3 {
  const n = FACE_NORMAL[face];
  const i = AXIS_INDEX[n.axis];
  const min: Vec3 = [...frame.cavity.min];
  const max: Vec3 = [...frame.cavity.max];
  if (n.side === 'min') max[i] = min[i] + thickness;
  else min[i] = max[i] - thickness;
  return { min, max };
}

/** Intervals of [lo, hi] left after removing the given slabs. */
function splitInterval(lo: number, hi: number, cuts: readonly [number, number][]): [number, number][] {
  let parts: [number, number][] = [[lo, hi]];
  for (const [a, b] of cuts) {
    const next: [number, number][] = [];
    for (const [p, q] of parts) {
      if (b <= p || a >= q) next.push([p, q]);
      else {
        if (a > p) next.push([p, a]);
        if (b < q) next.push([b, q]);
      }
    }
    parts = next;
  }
  return parts;
}

export interface LiningResult {
  pieces: LiningPiecePlan[];
  warnings: Warning[];
  totals: LiningTotals;
}

function cutoutsOnFace(design: Design, frame: Frame, face: Face, clearance: number): Cutout[] {
  const out: Cutout[] = [];
  for (const o of design.openings) {
    if (o.face !== face) continue;
    out.push(o.type === 'port' ? portOuterCutout(frame, o, clearance) : throughCutout(frame, o));
  }
  return out;
}

export function planLining(design: Design, frame: Frame): LiningResult {
  const lining = design.lining;
  const empty: LiningResult = { pieces: [], warnings: [], totals: { areaM2: 0, volumeLitres: 0, massKg: 0 } };
  if (!lining) return empty;
  const f = lining.thickness;
  const c = lining.crush;
  const lined = new Set<Face>(lining.faces);
  const pieces: LiningPiecePlan[] = [];
  const warnings: Warning[] = [];

  for (const face of FACE_ORDER) {
    if (!lined.has(face)) continue;
    const n = FACE_NORMAL[face];
    const ni = AXIS_INDEX[n.axis];
    const layer = liningLayerBox(frame, face, f);
    // Corner order: stop at the lining of every lined neighbour that ranks higher.
    const region: Box3 = { min: [...layer.min], max: [...layer.max] };
    for (const g of ALL_FACES) {
      const gn = FACE_NORMAL[g];
      if (g === face || gn.axis === n.axis || !lined.has(g) || CORNER_RANK[g] <= CORNER_RANK[face]) continue;
      const gi = AXIS_INDEX[gn.axis];
      if (gn.side === 'min') region.min[gi] = region.min[gi]! + f;
      else region.max[gi] = region.max[gi]! - f;
    }
    // Splits by shelf braces whose plane crosses this face.
    const cuts: Record<number, [number, number][]> = { 0: [], 1: [], 2: [] };
    for (const b of design.braces) {
      if (b.type !== 'shelf' || AXIS_INDEX[b.axis] === ni) continue;
      cuts[AXIS_INDEX[b.axis]]!.push([b.position - b.thickness / 2, b.position + b.thickness / 2]);
    }
    const inPlane = [0, 1, 2].filter((i) => i !== ni);
    const [ia, ib] = inPlane as [number, number];
    const partsA = splitInterval(region.min[ia]!, region.max[ia]!, cuts[ia]!);
    const partsB = splitInterval(region.min[ib]!, region.max[ib]!, cuts[ib]!);

    // Holes in face coordinates: openings on this face, and bar braces passing through the lining layer.
    const holePolys: Point[][] = cutoutsOnFace(design, frame, face, lining.portClearance).map(cutoutPolygon);
    const barRects: Rect[] = [];
    for (const b of design.braces) {
      if (b.type !== 'bar') continue;
      const hit = boxIntersection(barBraceBox(frame, b), layer);
      if (hit) barRects.push(faceRectOf(frame, face, hit));
    }

    const cells: Rect[] = [];
    for (const [a0, a1] of partsA) {
      for (const [b0, b1] of partsB) {
        const box: Box3 = { min: [...region.min], max: [...region.max] };
        box.min[ia] = a0;
        box.max[ia] = a1;
        box.min[ib] = b0;
        box.max[ib] = b1;
        cells.push(faceRectOf(frame, face, box));
      }
    }
    cells.sort((p, q) => p.minY - q.minY || p.minX - q.minX);
    const base = LINING_PIECE_NAMES[face];
    const facePieces: { shape: { outline: Point[]; holes: Point[][] }; width: number; height: number }[] = [];
    cells.forEach((cell) => {
      const w = cell.maxX - cell.minX;
      const h = cell.maxY - cell.minY;
      if (Math.min(w, h) < lining.minSliver) {
        warnings.push({
          code: 'lining_sliver',
          message: `${base}: a ${r3(Math.max(w, 0))} × ${r3(Math.max(h, 0))} mm strip is narrower than ${lining.minSliver} mm and is left out`,
          field: 'lining.minSliver',
        });
        return;
      }
      // Piece coordinates: the cell grown by crush/2 on every side, origin at its lower-left corner.
      const ox = cell.minX - c / 2;
      const oy = cell.minY - c / 2;
      const rect: Rect = { minX: 0, minY: 0, maxX: w + c, maxY: h + c };
      // A bar reaching a piece's edge runs on through the crush allowance there, so it cuts the piece clean.
      const reach = c / 2 + 1;
      const bars = barRects.map((r) =>
        rectPolygon({
          minX: r.minX <= cell.minX + 1e-6 ? cell.minX - reach : r.minX,
          minY: r.minY <= cell.minY + 1e-6 ? cell.minY - reach : r.minY,
          maxX: r.maxX >= cell.maxX - 1e-6 ? cell.maxX + reach : r.maxX,
          maxY: r.maxY >= cell.maxY - 1e-6 ? cell.maxY + reach : r.maxY,
        }),
      );
      const holes = [...holePolys, ...bars].map((p) => translatePolygon(p, -ox, -oy));
      const shapes = subtractHolesFromRect(rect, holes);
      if (shapes.length === 0) {
        warnings.push({ code: 'lining_covered', message: `${base}: a ${r3(w)} × ${r3(h)} mm piece is wholly cut away by holes and is left out`, field: 'lining' });
        return;
      }
      for (const shape of shapes) {
        if (shapes.length === 1) {
          facePieces.push({ shape, width: w + c, height: h + c });
          continue;
        }
        // A bar brace cut the piece apart: each part becomes its own piece, re-based on its own corner.
        const bb = polygonBounds(shape.outline);
        const bw = bb.maxX - bb.minX;
        const bh = bb.maxY - bb.minY;
        if (Math.min(bw, bh) < lining.minSliver) {
          warnings.push({
            code: 'lining_sliver',
            message: `${base}: a ${r3(bw)} × ${r3(bh)} mm strip is narrower than ${lining.minSliver} mm and is left out`,
            field: 'lining.minSliver',
          });
          continue;
        }
        facePieces.push({
          shape: { outline: translatePolygon(shape.outline, -bb.minX, -bb.minY), holes: shape.holes.map((hp) => translatePolygon(hp, -bb.minX, -bb.minY)) },
          width: bw,
          height: bh,
        });
      }
    });
    facePieces.forEach((p, k) => {
      const outline = p.shape.outline.map(roundPoint);
      const holes = p.shape.holes.map((h) => h.map(roundPoint));
      pieces.push({
        name: facePieces.length > 1 ? `${base} ${k + 1}` : base,
        face,
        width: r3(p.width),
        height: r3(p.height),
        quantity: 1,
        outline,
        holes,
        area: shapeArea({ outline, holes }),
        thickness: f,
      });
    });
  }

  let areaMm2 = 0;
  for (const p of pieces) areaMm2 += p.area * p.quantity;
  const volumeLitres = (areaMm2 * f) / 1e6;
  const totals: LiningTotals = {
    areaM2: areaMm2 / 1e6,
    volumeLitres,
    massKg: (volumeLitres / 1000) * lining.density,
  };
  return { pieces, warnings, totals };
}
