/**
 * The mirror image of a design across its vertical centre plane (x = W/2), for the other cabinet of a
 * mirrored pair: openings on the left side move to the right side and the reverse, and every x position
 * (openings on the front, back, top and bottom; bar braces; shelf-brace windows and x braces) becomes
 * W − x. Sizes, joinery and everything along y and z stay as they are. Pure.
 */
import type { Brace, Design, Face, Opening } from '../../../shared/schemas/design.schema.js';
import type { PanelHole, PanelPlan, Plan } from '../../../shared/schemas/plan.types.js';

const SWAP: Partial<Record<Face, Face>> = { left: 'right', right: 'left' };

function mirrorFace(face: Face): Face {
  return SWAP[face] ?? face;
}

function mirrorOpening(o: Opening, widthMm: number): Opening {
  const out = { ...o, face: mirrorFace(o.face) } as Opening;
  if (o.x !== undefined) out.x = widthMm - o.x;
  return out;
}

function mirrorBrace(b: Brace, widthMm: number): Brace {
  if (b.type === 'shelf') {
    // Window (u, v) are the two other axes in alphabetical order: u is x for braces across y or z.
    const uIsX = b.axis !== 'x';
    return {
      ...b,
      position: b.axis === 'x' ? widthMm - b.position : b.position,
      windows: b.windows.map((w) => (uIsX ? { ...w, u: widthMm - w.u } : { ...w })),
    };
  }
  // Bar `at` is the centre line in the two other axes in alphabetical order: the first is x unless the bar runs along x.
  if (b.axis === 'x') return { ...b, at: [b.at[0], b.at[1]] };
  return { ...b, at: [widthMm - b.at[0], b.at[1]] };
}

export function mirrorDesign(design: Design): Design {
  const W = design.outer.width;
  return {
    ...design,
    braces: design.braces.map((b) => mirrorBrace(b, W)),
    openings: design.openings.map((o) => mirrorOpening(o, W)),
    lining: design.lining ? { ...design.lining, faces: design.lining.faces.map(mirrorFace) } : design.lining,
  };
}

const round = (v: number) => Math.round(v * 100) / 100;

function holeKey(h: PanelHole): string {
  const size = h.shape === 'round' ? `d${round(h.diameter)}` : `${round(h.width)}x${round(h.height)}`;
  return `${h.shape}|${h.operation}|${round(h.x)}|${round(h.y)}|${size}|${round(h.depth ?? 0)}`;
}

/** Same size and the same holes (to 0.01 mm), whatever their order. */
export function samePanel(a: PanelPlan, b: PanelPlan): boolean {
  if (round(a.width) !== round(b.width) || round(a.height) !== round(b.height) || a.holes.length !== b.holes.length) return false;
  const keys = a.holes.map(holeKey).sort();
  const other = b.holes.map(holeKey).sort();
  return keys.every((k, i) => k === other[i]);
}

function sameOutline(a: Plan['liningPieces'][number], b: Plan['liningPieces'][number]): boolean {
  const pts = (p: typeof a) => JSON.stringify([p.outline.map(([x, y]) => [round(x), round(y)]), p.holes.map((h) => h.map(([x, y]) => [round(x), round(y)]))]);
  return round(a.width) === round(b.width) && round(a.height) === round(b.height) && pts(a) === pts(b);
}

export const MIRRORED_SUFFIX = ' (mirrored)';

/**
 * The plan of the mirrored cabinet with readable names: a panel or lining piece that differs from the
 * as-drawn cabinet's part of the same name gets " (mirrored)" after its name ("Left side (mirrored)");
 * one that is the same keeps its name.
 */
export function nameMirroredParts(original: Plan, mirrored: Plan): Plan {
  const panels = mirrored.panels.map((p) => {
    const twin = original.panels.find((o) => o.name === p.name);
    return twin && samePanel(twin, p) ? p : { ...p, name: p.name + MIRRORED_SUFFIX };
  });
  const liningPieces = mirrored.liningPieces.map((l) => {
    const twin = original.liningPieces.find((o) => o.name === l.name);
    return twin && sameOutline(twin, l) ? l : { ...l, name: l.name + MIRRORED_SUFFIX };
  });
  return { ...mirrored, panels, liningPieces };
}
