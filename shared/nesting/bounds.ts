/**
 * Lower bounds on the number of W × H bins for rectangles (REFERENCES.md §10):
 * - L0, the continuous bound ⌈Σ w·h / (W·H)⌉;
 * - the big-item count (items that cannot share a bin with each other);
 * - L1 and L2 of S. Martello & D. Vigo, "Exact Solution of the Two-Dimensional Finite Bin Packing
 *   Problem", Management Science 44(3):388–399, 1998;
 * - L3 of the same paper, for the oriented case;
 * - a grid-point count, valid when parts turn: an item whose shorter side is at least s holds an
 *   s × s square, and a W × H bin holds at most ⌊W/s⌋·⌊H/s⌋ disjoint axis-parallel s × s squares
 *   (each half-open square (x, x+s] × (y, y+s] inside the bin contains exactly one point of the
 *   grid {i·s} × {j·s}, 1 ≤ i ≤ ⌊W/s⌋, 1 ≤ j ≤ ⌊H/s⌋, and disjoint squares contain different points:
 *   a pigeonhole argument), so n items of shorter side ≥ s need ⌈n / (⌊W/s⌋·⌊H/s⌋)⌉ bins.
 * When an item may turn, the sets of L1/L2 only take an item whose every allowed orientation
 * qualifies, with its smallest qualifying size: a relaxation, so the bound stays valid (in the
 * spirit of Dell'Amico, Martello & Vigo, Discrete Applied Mathematics 118:13–24, 2002).
 * Kerf is handled by the caller: grow items and bins by one kerf (see bins.ts).
 */

export interface BoundItem {
  w: number;
  h: number;
  /** May be turned 90°. */
  turn: boolean;
}

export interface BinBounds {
  L0: number;
  big: number;
  L1: number;
  L2: number;
  /** Oriented case only; 0 when some item may turn. */
  L3: number;
  /** Grid-point count of items by their shorter side (valid with turning). */
  count: number;
  best: number;
}

const TOL = 1e-9;

function ceilTol(v: number): number {
  return Math.ceil(v - 1e-9);
}

function orientations(it: BoundItem): [number, number][] {
  return it.turn && Math.abs(it.w - it.h) > TOL ? [[it.w, it.h], [it.h, it.w]] : [[it.w, it.h]];
}

/** Candidate values of q in (0, cap]: where the sets of the bound change (the maximum is at one). */
function candidates(sizes: number[], full: number): number[] {
  const cap = full / 2;
  const set = new Set<number>();
  for (const s of sizes) {
    if (s > TOL && s <= cap + TOL) set.add(Math.min(s, cap));
    const r = full - s;
    if (r > TOL && r <= cap + TOL) set.add(Math.min(r, cap));
  }
  set.add(cap);
  return [...set].filter((q) => q > TOL).sort((a, b) => a - b);
}

/**
 * Martello–Toth style 1-D bound for sizes that must stack along a side of length H (no two side by
 * side): max over q of Lα and Lβ.
 */
function oneDimensional(sizes: number[], H: number): number {
  if (sizes.length === 0) return 0;
  let best = 0;
  for (const s of sizes) if (s > H / 2 + TOL) best++;
  for (const q of candidates(sizes, H)) {
    let k1 = 0;
    let k2 = 0;
    let k2Sum = 0;
    let k2Slots = 0;
    let k3 = 0;
    let k3Sum = 0;
    const per = Math.floor(H / q + TOL);
    for (const h of sizes) {
      if (h > H - q + TOL) k1++;
      else if (h > H / 2 + TOL) {
        k2++;
        k2Sum += h;
        k2Slots += Math.floor((H - h) / q + TOL);
      } else if (h >= q - TOL) {
        k3++;
        k3Sum += h;
      }
    }
    const la = k1 + k2 + Math.max(0, ceilTol((k3Sum - (k2 * H - k2Sum)) / H));
    const lb = per > 0 ? k1 + k2 + Math.max(0, ceilTol((k3 - k2Slots) / per)) : 0;
    best = Math.max(best, la, lb);
  }
  return best;
}

/** L1 and L2 in one direction: "wide" items (every orientation wider than W/2) stack in height. */
function directional(items: BoundItem[], W: number, H: number): { l1: number; l2: number } {
  // For each item: the smallest width and, among orientations wider than W/2, the smallest height.
  const minW: number[] = [];
  const wideH: number[] = [];
  const wideSizes: number[] = [];
  let area = 0;
  const areas: number[] = [];
  for (const it of items) {
    const os = orientations(it);
    let mw = Infinity;
    let allWide = true;
    let hMin = Infinity;
    for (const [w, h] of os) {
      mw = Math.min(mw, w);
      if (w > W / 2 + TOL) hMin = Math.min(hMin, h);
      else allWide = false;
    }
    minW.push(mw);
    wideH.push(allWide ? hMin : -1);
    if (allWide) wideSizes.push(hMin);
    areas.push(it.w * it.h);
    area += it.w * it.h;
  }
  const l1 = oneDimensional(wideSizes, H);
  let l2 = l1;
  // Smallest width over the orientations for K1 membership: every orientation wider than W − q.
  const widthsForQ: number[] = [];
  for (let i = 0; i < items.length; i++) widthsForQ.push(minW[i]!);
  for (const q of candidates(widthsForQ, W)) {
    let k1H = 0;
    let k23Area = 0;
    for (let i = 0; i < items.length; i++) {
      const mw = minW[i]!;
      if (mw > W - q + TOL) k1H += wideH[i]! > 0 ? wideH[i]! : 0;
      else if (mw >= q - TOL) k23Area += areas[i]!;
    }
    const extra = Math.max(0, ceilTol((k23Area - (H * l1 - k1H) * W) / (W * H)));
    l2 = Math.max(l2, l1 + extra);
  }
  void area;
  return { l1, l2 };
}

function flip(items: BoundItem[]): BoundItem[] {
  return items.map((it) => ({ w: it.h, h: it.w, turn: it.turn }));
}

function boundL3(items: BoundItem[], W: number, H: number): number {
  const ps = candidates(items.map((i) => i.h), H);
  const qs = candidates(items.map((i) => i.w), W);
  // Keep the work bounded on very large jobs (a subset of (p, q) still gives a valid bound).
  const limit = 4_000_000;
  const stride = Math.max(1, Math.ceil((ps.length * qs.length * items.length) / limit));
  let best = 0;
  let count = 0;
  for (const p of ps) {
    for (const q of qs) {
      if (count++ % stride !== 0) continue;
      const perP = Math.floor(H / p + TOL);
      const perQ = Math.floor(W / q + TOL);
      let big = 0;
      let i3 = 0;
      let slots = 0;
      for (const { w, h } of items) {
        const inI1 = h > H - p + TOL && w > W - q + TOL;
        if (inI1) {
          big++;
          continue;
        }
        if (h > H / 2 + TOL && w > W / 2 + TOL) {
          big++;
          const a = Math.floor((H - h) / p + TOL);
          const b = Math.floor((W - w) / q + TOL);
          slots += perP * b + perQ * a - a * b;
        } else if (h <= H / 2 + TOL && h >= p - TOL && w <= W / 2 + TOL && w >= q - TOL) i3++;
      }
      const per = perP * perQ;
      const v = big + (per > 0 ? Math.max(0, ceilTol((i3 - slots) / per)) : 0);
      if (v > best) best = v;
    }
  }
  return best;
}

/** The grid-point count bound (see the header): max over s of ⌈n_s / (⌊W/s⌋·⌊H/s⌋)⌉. */
export function countBound(W: number, H: number, items: BoundItem[]): number {
  const sides = items.map((it) => Math.min(it.w, it.h)).sort((a, b) => b - a);
  let best = 0;
  for (let n = 1; n <= sides.length; n++) {
    const s = sides[n - 1]!;
    // Only where the next side is smaller: n items have a shorter side ≥ s.
    if (n < sides.length && sides[n]! >= s - TOL) continue;
    if (s <= TOL) break;
    const per = Math.floor(W / s + TOL) * Math.floor(H / s + TOL);
    if (per === 0) continue; // items that fit nowhere are the caller's to report
    best = Math.max(best, Math.ceil(n / per));
  }
  return best;
}

export function binLowerBounds(W: number, H: number, items: BoundItem[]): BinBounds {
  if (items.length === 0) return { L0: 0, big: 0, L1: 0, L2: 0, L3: 0, count: 0, best: 0 };
  let area = 0;
  let big = 0;
  let oriented = true;
  for (const it of items) {
    area += it.w * it.h;
    if (orientations(it).every(([w, h]) => w > W / 2 + TOL && h > H / 2 + TOL)) big++;
    if (orientations(it).length > 1) oriented = false;
  }
  const L0 = ceilTol(area / (W * H));
  const a = directional(items, W, H);
  const b = directional(flip(items), H, W);
  const L1 = Math.max(a.l1, b.l1);
  const L2 = Math.max(a.l2, b.l2, L1);
  const L3 = oriented ? boundL3(items, W, H) : 0;
  const count = countBound(W, H, items);
  return { L0, big, L1, L2, L3, count, best: Math.max(L0, big, L1, L2, L3, count) };
}
