/**
 * Super-items: parts with a common side joined edge to edge into one rectangle (a stack of equal
 * widths or a row of equal heights), so the search places the group as one piece. Zero-waste
 * layouts are built from such groups (each guillotine cut leaves two pieces with a common side);
 * joining them first lets the ordering search find layouts one sheet shorter than it finds part by
 * part. Joining items with a common side into blocks is a known idea of guillotine packing
 * heuristics (from memory; no specific source checked).
 */
import type { Packing } from './decode.js';
import { ORIENT_AS_GIVEN, ORIENT_TURNED, type Problem } from './problem.js';
import { randomInt, type Rng } from './rng.js';

interface Member {
  item: number;
  dx: number;
  dy: number;
}

export interface Merged {
  pr: Problem;
  /** members[s]: the original items of super-item s, at offsets in its as-given frame. */
  members: Member[][];
}

/**
 * Joins random pairs with a common side (in their as-given frame; a group may turn only where all
 * its members may) until `fraction` × the part count joins are done or no pair is left that fits
 * the stock. Null when no pair can be joined.
 */
export function mergeItems(pr: Problem, rng: Rng, fraction: number): Merged | null {
  const T = pr.types.length;
  let groups = pr.items.map((it, i) => ({
    w: it.w,
    h: it.h,
    masks: pr.types.map((_, t) => pr.orient[t]![i]!),
    members: [{ item: i, dx: 0, dy: 0 }] as Member[],
  }));
  const fitMask = (w: number, h: number, masks: number[]): number[] | null => {
    let any = false;
    const out = masks.map((m, t) => {
      const { W, H } = pr.types[t]!;
      let o = 0;
      if (m & ORIENT_AS_GIVEN && w <= W + 1e-7 && h <= H + 1e-7) o |= ORIENT_AS_GIVEN;
      if (m & ORIENT_TURNED && h <= W + 1e-7 && w <= H + 1e-7) o |= ORIENT_TURNED;
      if (o) any = true;
      return o;
    });
    return any ? out : null;
  };
  const eq = (a: number, b: number) => Math.abs(a - b) <= 1e-7;
  let joins = 0;
  const target = Math.max(1, Math.round(fraction * pr.items.length));
  while (joins < target) {
    const pairs: [number, number, boolean][] = [];
    for (let a = 0; a < groups.length; a++) {
      for (let b = a + 1; b < groups.length; b++) {
        const A = groups[a]!;
        const B = groups[b]!;
        if (eq(A.w, B.w)) pairs.push([a, b, true]);
        if (eq(A.h, B.h)) pairs.push([a, b, false]);
      }
    }
    let done = false;
    while (pairs.length > 0 && !done) {
      const k = randomInt(rng, pairs.length);
      const [a, b, stack] = pairs[k]!;
      pairs[k] = pairs[pairs.length - 1]!;
      pairs.pop();
      const A = groups[a]!;
      const B = groups[b]!;
      const w = stack ? A.w : A.w + B.w;
      const h = stack ? A.h + B.h : A.h;
      const masks = fitMask(w, h, A.masks.map((m, t) => m & B.masks[t]!));
      if (!masks) continue;
      const members = [...A.members, ...B.members.map((m) => ({ item: m.item, dx: m.dx + (stack ? 0 : A.w), dy: m.dy + (stack ? A.h : 0) }))];
      groups = groups.filter((_, g) => g !== a && g !== b);
      groups.push({ w, h, masks, members });
      joins++;
      done = true;
    }
    if (!done) break;
  }
  if (joins === 0) return null;
  let minSide = Infinity;
  for (const g of groups) minSide = Math.min(minSide, g.w, g.h);
  const sub: Problem = {
    ...pr,
    items: groups.map((g) => ({ part: pr.items[g.members[0]!.item]!.part, w: g.w, h: g.h, area: g.w * g.h })),
    orient: Array.from({ length: T }, (_, t) => Uint8Array.from(groups.map((g) => g.masks[t]!))),
    minSide,
  };
  return { pr: sub, members: groups.map((g) => g.members) };
}

/** The packing of super-items as a packing of the original items (placements replaced in place). */
export function expandPacking(pr: Problem, m: Merged, p: Packing): Packing {
  for (const bin of p.bins) {
    const out = bin.placements.flatMap((q) =>
      m.members[q.item]!.map((mb) => {
        const it = pr.items[mb.item]!;
        return q.rotated
          ? { item: mb.item, x: q.x + mb.dy, y: q.y + mb.dx, w: it.h, h: it.w, rotated: true }
          : { item: mb.item, x: q.x + mb.dx, y: q.y + mb.dy, w: it.w, h: it.h, rotated: false };
      }),
    );
    bin.placements.length = 0;
    bin.placements.push(...out);
  }
  const leftover = p.leftover.flatMap((s) => m.members[s]!.map((mb) => mb.item));
  return { bins: p.bins, binTypes: p.binTypes, leftover, leftoverArea: p.leftoverArea };
}
