/**
 * Guillotine cut order and offcuts of one packed sheet, derived from the placements (inflated
 * coordinates, see bins.ts). A piece is split by edge-to-edge cuts that cross no part: first any
 * empty band along the piece's side is cut off whole (largest first, so offcuts stay large), else
 * one cut between parts (rip cuts first), and both pieces are processed the same way (depth first:
 * the cut order a panel saw follows). A layout that is not guillotine-cuttable returns null.
 */
import type { Cut, Offcut } from '../schemas/nest.schema.js';
import { EPS, MaxRectsBin, Candidate, type Placed } from './bins.js';

interface Piece {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
  parts: Placed[];
}

export interface SheetFrame {
  /** Inflated bin size the placements were packed in (roll: the used length). */
  W: number;
  H: number;
  kerf: number;
  trim: number;
  lengthAlongY: boolean;
  minOffcut: { width: number; height: number };
}

export interface CutPlan {
  cuts: Cut[];
  offcuts: Offcut[];
}

function isKeeper(w: number, h: number, min: SheetFrame['minOffcut']): boolean {
  return (w >= min.width - EPS && h >= min.height - EPS) || (h >= min.width - EPS && w >= min.height - EPS);
}

/** Valid cut positions strictly inside (lo, hi) along one axis: part edges no part straddles. */
function cutPositions(parts: Placed[], vertical: boolean, lo: number, hi: number): number[] {
  const edges: [number, number][] = parts.map((p) => (vertical ? [p.x, p.x + p.w] : [p.y, p.y + p.h]));
  edges.sort((a, b) => a[0] - b[0]);
  const out: number[] = [];
  let reach = edges[0]![1];
  for (let i = 1; i < edges.length; i++) {
    const [a, b] = edges[i]!;
    if (a >= reach - EPS && a > lo + EPS && a < hi - EPS) out.push(a);
    if (b > reach) reach = b;
  }
  return out;
}

export function planGuillotineCuts(placements: Placed[], f: SheetFrame): CutPlan | null {
  const k = f.kerf;
  const t = f.trim;
  const cuts: Cut[] = [];
  const offcuts: Offcut[] = [];
  const addCut = (vertical: boolean, c: number, piece: Piece) => {
    // Kerf centre on the real sheet: the kerf lies at the end of the lower/left piece.
    const line = c + t - k / 2;
    const ripIsVertical = f.lengthAlongY;
    const kind: Cut['kind'] = vertical === ripIsVertical ? 'rip' : 'cross';
    const lo = (vertical ? piece.y0 : piece.x0) + t;
    const hi = (vertical ? piece.y1 : piece.x1) + t - k;
    cuts.push(
      vertical
        ? { order: cuts.length + 1, kind, x1: line, y1: lo, x2: line, y2: hi }
        : { order: cuts.length + 1, kind, x1: lo, y1: line, x2: hi, y2: line },
    );
  };
  const emptyLeaf = (x0: number, y0: number, x1: number, y1: number) => {
    const w = x1 - x0 - k;
    const h = y1 - y0 - k;
    if (w > EPS && h > EPS && isKeeper(w, h, f.minOffcut)) offcuts.push({ x: x0 + t, y: y0 + t, width: w, height: h });
  };
  const split = (piece: Piece, vertical: boolean, positions: number[]): Piece[] => {
    const bounds = [vertical ? piece.x0 : piece.y0, ...positions, vertical ? piece.x1 : piece.y1];
    const out: Piece[] = [];
    for (let i = 0; i + 1 < bounds.length; i++) {
      const a = bounds[i]!;
      const b = bounds[i + 1]!;
      const parts = piece.parts.filter((p) => (vertical ? p.x >= a - EPS && p.x + p.w <= b + EPS : p.y >= a - EPS && p.y + p.h <= b + EPS));
      out.push(vertical ? { x0: a, y0: piece.y0, x1: b, y1: piece.y1, parts } : { x0: piece.x0, y0: a, x1: piece.x1, y1: b, parts });
    }
    return out;
  };
  const ripVertical = f.lengthAlongY;
  const stack: Piece[] = [{ x0: 0, y0: 0, x1: f.W, y1: f.H, parts: placements }];
  while (stack.length > 0) {
    const piece = stack.pop()!;
    const { parts } = piece;
    if (parts.length === 0) {
      emptyLeaf(piece.x0, piece.y0, piece.x1, piece.y1);
      continue;
    }
    let bx0 = Infinity;
    let by0 = Infinity;
    let bx1 = -Infinity;
    let by1 = -Infinity;
    for (const p of parts) {
      bx0 = Math.min(bx0, p.x);
      by0 = Math.min(by0, p.y);
      bx1 = Math.max(bx1, p.x + p.w);
      by1 = Math.max(by1, p.y + p.h);
    }
    // 1. Cut off the largest empty band at a side of the piece.
    const bands: { vertical: boolean; at: number; area: number; emptyFirst: boolean }[] = [];
    const pw = piece.x1 - piece.x0;
    const ph = piece.y1 - piece.y0;
    if (bx1 < piece.x1 - EPS) bands.push({ vertical: true, at: bx1, area: (piece.x1 - bx1) * ph, emptyFirst: false });
    if (by1 < piece.y1 - EPS) bands.push({ vertical: false, at: by1, area: (piece.y1 - by1) * pw, emptyFirst: false });
    if (bx0 > piece.x0 + EPS) bands.push({ vertical: true, at: bx0, area: (bx0 - piece.x0) * ph, emptyFirst: true });
    if (by0 > piece.y0 + EPS) bands.push({ vertical: false, at: by0, area: (by0 - piece.y0) * pw, emptyFirst: true });
    if (bands.length > 0) {
      bands.sort((a, b) => b.area - a.area || Number(a.vertical !== ripVertical) - Number(b.vertical !== ripVertical));
      const band = bands[0]!;
      addCut(band.vertical, band.at, piece);
      const [first, second] = split(piece, band.vertical, [band.at]);
      // Process the part side first (stack: push the empty side first).
      if (band.emptyFirst) {
        stack.push(first!, second!);
      } else {
        stack.push(second!, first!);
      }
      continue;
    }
    if (parts.length === 1) continue; // the part is cut to size
    // 2. One cut across the piece, rip cuts preferred, nearest the piece's origin side first. One
    //    cut at a time (not all strips at once) lets each remainder lose its empty band whole.
    let vertical = ripVertical;
    let positions = cutPositions(parts, vertical, vertical ? piece.x0 : piece.y0, vertical ? piece.x1 : piece.y1);
    if (positions.length === 0) {
      vertical = !vertical;
      positions = cutPositions(parts, vertical, vertical ? piece.x0 : piece.y0, vertical ? piece.x1 : piece.y1);
    }
    if (positions.length === 0) return null;
    const at = positions[0]!;
    addCut(vertical, at, piece);
    const [lower, upper] = split(piece, vertical, [at]);
    stack.push(upper!, lower!);
  }
  offcuts.sort((a, b) => b.width * b.height - a.width * a.height);
  return { cuts, offcuts };
}

/** Free mode: disjoint offcuts chosen greedily (largest first) from the maximal free rectangles. */
export function freeOffcuts(placements: Placed[], f: SheetFrame): Offcut[] {
  const k = f.kerf;
  const minSide = Math.min(f.minOffcut.width, f.minOffcut.height) + k;
  const bin = new MaxRectsBin(f.W, f.H, Math.max(minSide, EPS));
  const cand = new Candidate();
  for (const p of placements) {
    cand.reset();
    cand.x = p.x;
    cand.y = p.y;
    cand.w = p.w;
    cand.h = p.h;
    cand.free = 0;
    bin.place(cand, p.item);
  }
  const free = bin
    .freeRects()
    .filter(([, , w, h]) => w - k > EPS && h - k > EPS && isKeeper(w - k, h - k, f.minOffcut))
    .sort((a, b) => b[2] * b[3] - a[2] * a[3]);
  const chosen: [number, number, number, number][] = [];
  for (const r of free) {
    const clash = chosen.some(([x, y, w, h]) => r[0] < x + w - EPS && x < r[0] + r[2] - EPS && r[1] < y + h - EPS && y < r[1] + r[3] - EPS);
    if (!clash) chosen.push(r);
  }
  return chosen.map(([x, y, w, h]) => ({ x: x + f.trim, y: y + f.trim, width: w - k, height: h - k }));
}
