/**
 * Decoder: packs items in a given order, each at the best-scoring position of the open bins
 * (first bin that fits, or best over all bins), opening new bins when allowed.
 */
import { Candidate, makeBin, type PackBin } from './bins.js';
import { work } from './budget.js';
import type { Problem } from './problem.js';

// Local copies of ORIENT_AS_GIVEN / ORIENT_TURNED (problem.ts): hot loop, no module indirection.
const AS_GIVEN = 1;
const TURNED = 2;

export interface DecodeOptions {
  rule: number;
  split: number;
  /** Best position over all open bins (true) or the first bin with room (false). */
  bestFit: boolean;
}

export interface Packing {
  bins: PackBin[];
  /** Index into problem.types of each bin. */
  binTypes: number[];
  /** Items not placed. */
  leftover: number[];
  leftoverArea: number;
}

const cand = new Candidate();

/**
 * @param fixed bins to pack into (type indices); null opens bins as needed within `available`
 * @param heightOverride bin height to use instead of the type's (a roll cut to a target length)
 */
export function decode(
  pr: Problem,
  order: ArrayLike<number>,
  opts: DecodeOptions,
  fixed: readonly number[] | null,
  available?: number[],
  heightOverride?: number,
): Packing {
  const bins: PackBin[] = [];
  const binTypes: number[] = [];
  work.n += 300;
  const newBin = (t: number) => {
    const type = pr.types[t]!;
    work.n += 20;
    bins.push(makeBin(pr.guillotine, type.W, heightOverride ?? type.H, pr.minSide, opts.split));
    binTypes.push(t);
  };
  if (fixed) for (const t of fixed) newBin(t);
  const avail = fixed ? [] : (available ?? pr.types.map((t) => t.available)).slice();
  const leftover: number[] = [];
  let leftoverArea = 0;
  const { rule, bestFit } = opts;
  for (let k = 0; k < order.length; k++) {
    const i = order[k]!;
    const it = pr.items[i]!;
    work.n += 4;
    cand.reset();
    for (let b = 0; b < bins.length; b++) {
      const o = pr.orient[binTypes[b]!]![i]!;
      const bin = bins[b]!;
      const mw = bin.maxFreeW + 1e-7;
      const mh = bin.maxFreeH + 1e-7;
      if (o & AS_GIVEN && it.w <= mw && it.h <= mh) bin.consider(it.w, it.h, false, rule, cand, b);
      if (o & TURNED && it.h <= mw && it.w <= mh) bin.consider(it.h, it.w, true, rule, cand, b);
      if (!bestFit && cand.free >= 0) break;
    }
    if (cand.free < 0 && !fixed) {
      for (let t = 0; t < pr.types.length; t++) {
        if (avail[t]! <= 0) continue;
        const o = pr.orient[t]![i]!;
        if (o === 0) continue;
        avail[t]!--;
        newBin(t);
        const b = bins.length - 1;
        if (o & AS_GIVEN) bins[b]!.consider(it.w, it.h, false, rule, cand, b);
        if (o & TURNED) bins[b]!.consider(it.h, it.w, true, rule, cand, b);
        break;
      }
    }
    if (cand.free >= 0) bins[cand.bin]!.place(cand, i);
    else {
      leftover.push(i);
      leftoverArea += it.area;
    }
  }
  return { bins, binTypes, leftover, leftoverArea };
}
