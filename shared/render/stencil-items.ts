/**
 * What goes on a stencil set: every lining piece of every cabinet of a build, and one template per
 * distinct driver cut-out (cut-out circle, rebate circle, screw holes, centre cross).
 * Geometry is in the piece's own coordinates (mm, origin lower-left, y up), as the plan gives it.
 */
import type { Face } from '../schemas/design.schema.js';
import type { LiningPiecePlan, PanelHole, PanelPlan, Point } from '../schemas/plan.types.js';
import type { BuildCabinet } from './build.js';
import { estimateTextWidthMm } from './scene.js';

export interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** What a shape is for: `cut` lines are cut along, `rebate` lines are routed (pocket), `mark` lines guide. */
export type ShapeRole = 'cut' | 'rebate' | 'mark';

export type StencilShape =
  | { role: ShapeRole; type: 'poly'; points: Point[]; closed: boolean }
  | { role: ShapeRole; type: 'circle'; cx: number; cy: number; r: number };

export interface StencilLabel {
  x: number;
  y: number;
  text: string;
  sizeMm: number;
}

export interface StencilItem {
  kind: 'lining' | 'template';
  /** "Harbour bookshelf — Back lining (lower)". */
  name: string;
  cabinetName: string;
  /** "Lines the back face" or what the template is for. */
  detail: string;
  quantityPerCabinet: number;
  cabinetCount: number;
  bounds: Bounds;
  shapes: StencilShape[];
  /** Holes to shade (lining pieces): the material removed. */
  removed: Point[][];
  labels: StencilLabel[];
}

export function boundsOf(points: readonly Point[]): Bounds {
  const b = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
  for (const [x, y] of points) {
    b.minX = Math.min(b.minX, x);
    b.maxX = Math.max(b.maxX, x);
    b.minY = Math.min(b.minY, y);
    b.maxY = Math.max(b.maxY, y);
  }
  return b;
}

/** Even–odd rule: is (x, y) inside the polygon? */
function inside(poly: readonly Point[], x: number, y: number): boolean {
  let odd = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const [xi, yi] = poly[i]!;
    const [xj, yj] = poly[j]!;
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) odd = !odd;
  }
  return odd;
}

/**
 * Where a label of w × h (mm) sits on a piece: the first of a few spots (the centre first) where the
 * label lies on the material, clear of every hole's bounding box; the centre when none is.
 */
export function labelSpot(outline: readonly Point[], holes: readonly (readonly Point[])[], w: number, h: number): [number, number] {
  const b = boundsOf(outline);
  const holeBoxes = holes.map(boundsOf);
  const fractions: [number, number][] = [[0.5, 0.5], [0.5, 0.75], [0.5, 0.25], [0.3, 0.5], [0.7, 0.5], [0.5, 0.88], [0.5, 0.12], [0.3, 0.8], [0.7, 0.2]];
  for (const [fx, fy] of fractions) {
    const x = b.minX + fx * (b.maxX - b.minX);
    const y = b.minY + fy * (b.maxY - b.minY);
    const box = { minX: x - w / 2, maxX: x + w / 2, minY: y - h / 2, maxY: y + h / 2 };
    const corners: Point[] = [[box.minX, box.minY], [box.maxX, box.minY], [box.maxX, box.maxY], [box.minX, box.maxY]];
    const onMaterial = corners.every(([px, py]) => inside(outline, px, py));
    const clear = holeBoxes.every((hb) => hb.maxX < box.minX || hb.minX > box.maxX || hb.maxY < box.minY || hb.minY > box.maxY);
    if (onMaterial && clear) return [x, y];
  }
  return [(b.minX + b.maxX) / 2, (b.minY + b.maxY) / 2];
}

const FACE_WORDS: Record<Face, string> = {
  front: 'front (baffle)',
  back: 'back',
  left: 'left side',
  right: 'right side',
  top: 'top',
  bottom: 'bottom',
};

/** Formats a length in mm for labels: at most one decimal, no trailing ".0". */
export function fmtMm(valueMm: number): string {
  return String(Math.round(valueMm * 10) / 10);
}

function liningItem(cabinet: BuildCabinet, piece: LiningPiecePlan): StencilItem {
  const bounds = boundsOf(piece.outline);
  const shapes: StencilShape[] = [
    { role: 'cut', type: 'poly', points: piece.outline, closed: true },
    ...piece.holes.map((h): StencilShape => ({ role: 'cut', type: 'poly', points: h, closed: true })),
  ];
  const size = Math.min(8, Math.max(3, (bounds.maxX - bounds.minX) / 25));
  const [cx, cy] = labelSpot(piece.outline, piece.holes, estimateTextWidthMm(piece.name, size), size * 2.6);
  return {
    kind: 'lining',
    name: `${cabinet.name} — ${piece.name}`,
    cabinetName: cabinet.name,
    detail: `Lines the ${FACE_WORDS[piece.face]} face · ${fmtMm(piece.thickness)} mm lining · ${fmtMm(piece.width)} × ${fmtMm(piece.height)} mm`,
    quantityPerCabinet: piece.quantity,
    cabinetCount: cabinet.count,
    bounds,
    shapes,
    removed: piece.holes,
    labels: [
      { x: cx, y: cy + size * 0.8, text: piece.name, sizeMm: size },
      { x: cx, y: cy - size * 0.9, text: `cut ${piece.quantity * cabinet.count}`, sizeMm: size * 0.8 },
    ],
  };
}

type RoundHole = Extract<PanelHole, { shape: 'round' }>;

interface DriverGroup {
  panel: PanelPlan;
  cut: RoundHole;
  rebate?: RoundHole;
  screws: RoundHole[];
}

const near = (a: number, b: number, tol = 0.01) => Math.abs(a - b) <= tol;

/**
 * Groups each driver's through hole with its rebate (same centre) and its screw holes (same `ref`
 * when both carry one; otherwise screw holes within the rebate, or within 25 mm of the cut-out edge).
 */
export function driverGroups(panel: PanelPlan): DriverGroup[] {
  const round = panel.holes.filter((h): h is RoundHole => h.shape === 'round');
  const cuts = round.filter((h) => h.source === 'driver' && h.operation === 'through');
  return cuts.map((cut) => {
    const rebate = round.find((h) => h.operation === 'rebate' && near(h.x, cut.x) && near(h.y, cut.y));
    const reach = Math.max(rebate ? rebate.diameter / 2 : 0, cut.diameter / 2 + 25);
    const screws = round.filter((h) => {
      if (h.source !== 'screw') return false;
      if (h.ref !== undefined && cut.ref !== undefined) return h.ref === cut.ref;
      return Math.hypot(h.x - cut.x, h.y - cut.y) <= reach;
    });
    return { panel, cut, rebate, screws };
  });
}

function templateKey(g: DriverGroup): string {
  const r = (v: number) => v.toFixed(1);
  const screws = g.screws
    .map((s) => `${r(s.x - g.cut.x)},${r(s.y - g.cut.y)},${r(s.diameter)}`)
    .sort()
    .join(';');
  return [r(g.cut.diameter), g.rebate ? `${r(g.rebate.diameter)}x${r(g.rebate.depth ?? 0)}` : '-', screws].join('|');
}

function templateItem(cabinet: BuildCabinet, g: DriverGroup, quantity: number): StencilItem {
  const cutR = g.cut.diameter / 2;
  const outerR = Math.max(
    cutR,
    g.rebate ? g.rebate.diameter / 2 : 0,
    ...g.screws.map((s) => Math.hypot(s.x - g.cut.x, s.y - g.cut.y) + s.diameter / 2),
  );
  const half = outerR + 6;
  const textBand = 18;
  const shapes: StencilShape[] = [
    { role: 'cut', type: 'circle', cx: 0, cy: 0, r: cutR },
    { role: 'mark', type: 'poly', points: [[-half, 0], [half, 0]], closed: false },
    { role: 'mark', type: 'poly', points: [[0, -half], [0, half]], closed: false },
    { role: 'mark', type: 'poly', points: [[-half, -half], [half, -half], [half, half], [-half, half]], closed: true },
  ];
  if (g.rebate) shapes.push({ role: 'rebate', type: 'circle', cx: 0, cy: 0, r: g.rebate.diameter / 2 });
  for (const s of g.screws) {
    const sx = s.x - g.cut.x;
    const sy = s.y - g.cut.y;
    shapes.push({ role: 'cut', type: 'circle', cx: sx, cy: sy, r: s.diameter / 2 });
    const arm = Math.max(3, s.diameter);
    shapes.push({ role: 'mark', type: 'poly', points: [[sx - arm, sy], [sx + arm, sy]], closed: false });
    shapes.push({ role: 'mark', type: 'poly', points: [[sx, sy - arm], [sx, sy + arm]], closed: false });
  }
  const notes = [`Cut-out Ø ${fmtMm(g.cut.diameter)} mm (solid line)`];
  if (g.rebate) notes.push(`Rebate Ø ${fmtMm(g.rebate.diameter)} mm, ${fmtMm(g.rebate.depth ?? 0)} mm deep (dashed line)`);
  if (g.screws.length > 0) {
    const pitch = Math.hypot(g.screws[0]!.x - g.cut.x, g.screws[0]!.y - g.cut.y) * 2;
    notes.push(`${g.screws.length} screw holes Ø ${fmtMm(g.screws[0]!.diameter)} mm on a Ø ${fmtMm(pitch)} mm circle`);
  }
  const labels = notes.map((t, i) => ({ x: 0, y: -half - 5 - i * 4.8, text: t, sizeMm: 3.2 }));
  return {
    kind: 'template',
    name: `${cabinet.name} — driver cut-out Ø ${fmtMm(g.cut.diameter)} mm`,
    cabinetName: cabinet.name,
    detail: `Template for the ${g.panel.name} panel: centre cross, cut-out${g.rebate ? ', rebate' : ''}${g.screws.length ? ', screw holes' : ''}`,
    quantityPerCabinet: quantity,
    cabinetCount: cabinet.count,
    bounds: { minX: -half, maxX: half, minY: -half - textBand, maxY: half },
    shapes,
    removed: [],
    labels,
  };
}

/** Every lining piece, then one template per distinct driver cut-out, for each cabinet of the build. */
export function stencilItemsFromBuild(cabinets: readonly BuildCabinet[]): StencilItem[] {
  const lining: StencilItem[] = [];
  const templates: StencilItem[] = [];
  for (const cabinet of cabinets) {
    for (const piece of cabinet.plan.liningPieces) lining.push(liningItem(cabinet, piece));
    const byKey = new Map<string, { group: DriverGroup; count: number }>();
    for (const panel of cabinet.plan.panels) {
      for (const g of driverGroups(panel)) {
        const key = templateKey(g);
        const seen = byKey.get(key);
        if (seen) seen.count += panel.quantity;
        else byKey.set(key, { group: g, count: panel.quantity });
      }
    }
    for (const { group, count } of byKey.values()) templates.push(templateItem(cabinet, group, count));
  }
  return [...lining, ...templates];
}
