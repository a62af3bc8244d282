/**
 * Anytime search over orderings.
 *
 * Sheets: a constructive start (several orderings × placement rules, bins opened as needed), then
 * goal-driven improvement: drop the weakest sheet and search item orderings that pack everything
 * into the sheets left, minimising the area left over (after Lodi, Martello & Vigo's "empty the
 * weakest bin" and Wei et al.'s goal-driven search, 2013). Stops at the lower bound.
 *
 * Rolls: the same machinery on one bin of a target length (strip packing as a sequence of fixed-size
 * problems); each success lowers the target.
 */
import {
  RULE_BAF,
  RULE_BL,
  RULE_BLSF,
  RULE_BSSF,
  RULE_CP,
  SPLIT_HORIZONTAL,
  SPLIT_LONGER_LEFTOVER,
  SPLIT_MIN_AREA,
  SPLIT_SHORTER_LEFTOVER,
  SPLIT_VERTICAL,
} from './bins.js';
import type { Budget } from './budget.js';
import { decode, type DecodeOptions, type Packing } from './decode.js';
import type { Problem } from './problem.js';
import { randomInt, type Rng } from './rng.js';

/** Search knobs (defaults chosen by measurement on the bench; see DEVELOPERS.md). */
export const tuning = {
  fixedBestFit: false,
  startFromBest: false,
  restartFactor: 4,
  lahc: 0,
  randomRestart: false,
};

export interface SearchContext {
  rng: Rng;
  budget: Budget;
  /** Lower bound on the primary objective (sheets, or inflated roll length). */
  lowerBound: number;
  onImprove?: (primary: number) => void;
}

/** Item orderings used by the constructive start. */
export function startOrders(pr: Problem): Int32Array[] {
  const n = pr.items.length;
  const idx = () => Array.from({ length: n }, (_, i) => i);
  const it = pr.items;
  const keyed = (key: (i: number) => number, tie: (i: number) => number) =>
    Int32Array.from(idx().sort((a, b) => key(b) - key(a) || tie(b) - tie(a) || a - b));
  const maxSide = (i: number) => Math.max(it[i]!.w, it[i]!.h);
  const minSide = (i: number) => Math.min(it[i]!.w, it[i]!.h);
  return [
    keyed((i) => it[i]!.area, maxSide),
    keyed((i) => it[i]!.h, (i) => it[i]!.w),
    keyed((i) => it[i]!.w, (i) => it[i]!.h),
    keyed((i) => it[i]!.w + it[i]!.h, (i) => it[i]!.area),
    keyed(maxSide, minSide),
    keyed(minSide, maxSide),
  ];
}

export function primaryOf(pr: Problem, p: Packing): number {
  let v = 0;
  for (let b = 0; b < p.bins.length; b++) {
    if (p.bins[b]!.placements.length === 0) continue;
    const t = pr.types[p.binTypes[b]!]!;
    if (pr.objective === 'cost') v += t.cost;
    else if (t.kind !== 'remnant') v += 1;
  }
  return v;
}

function stockArea(pr: Problem, p: Packing): number {
  let a = 0;
  for (let b = 0; b < p.bins.length; b++) {
    if (p.bins[b]!.placements.length === 0) continue;
    const t = pr.types[p.binTypes[b]!]!;
    a += t.W * t.H;
  }
  return a;
}

/** Area of the largest free rectangle on any sheet: the best reusable offcut. */
export function largestFree(p: Packing): number {
  let best = 0;
  for (const bin of p.bins) {
    if (bin.placements.length === 0) continue;
    for (const [, , w, h] of bin.freeRects()) if (w * h > best) best = w * h;
  }
  return best;
}

/** Negative when a is better than b. */
export function compareBins(pr: Problem, a: Packing, b: Packing): number {
  if (a.leftoverArea !== b.leftoverArea) return a.leftoverArea - b.leftoverArea;
  const pa = primaryOf(pr, a);
  const pb = primaryOf(pr, b);
  if (Math.abs(pa - pb) > 1e-9) return pa - pb;
  const aa = stockArea(pr, a);
  const ab = stockArea(pr, b);
  if (Math.abs(aa - ab) > 1e-6) return aa - ab;
  return largestFree(b) - largestFree(a);
}

/** Drops bins with nothing on them. */
export function compact(p: Packing): Packing {
  const keep = p.bins.map((b) => b.placements.length > 0);
  return {
    bins: p.bins.filter((_, i) => keep[i]),
    binTypes: p.binTypes.filter((_, i) => keep[i]),
    leftover: p.leftover,
    leftoverArea: p.leftoverArea,
  };
}

function ruleSet(pr: Problem): number[] {
  return pr.items.length <= 300 ? [RULE_BSSF, RULE_BAF, RULE_BLSF, RULE_BL, RULE_CP] : [RULE_BSSF, RULE_BAF, RULE_BL];
}

function splitSet(pr: Problem): number[] {
  return pr.guillotine
    ? [SPLIT_SHORTER_LEFTOVER, SPLIT_MIN_AREA, SPLIT_LONGER_LEFTOVER, SPLIT_HORIZONTAL, SPLIT_VERTICAL]
    : [SPLIT_SHORTER_LEFTOVER];
}

/** Moves item seq[from] to position `to`, shifting the ones between. */
function moveItem(seq: Int32Array, from: number, to: number): void {
  const v = seq[from]!;
  if (from > to) seq.copyWithin(to + 1, to, from);
  else seq.copyWithin(from, from + 1, to + 1);
  seq[to] = v;
}

function mutate(rng: Rng, seq: Int32Array, leftover: readonly number[]): void {
  const n = seq.length;
  if (n < 2) return;
  const r = rng();
  if (r < 0.5 && leftover.length > 0) {
    const u = leftover[randomInt(rng, leftover.length)]!;
    const from = seq.indexOf(u);
    const to = randomInt(rng, from + 1);
    moveItem(seq, from, to);
  } else if (r < 0.85) {
    const i = randomInt(rng, n);
    let j = randomInt(rng, n - 1);
    if (j >= i) j++;
    const t = seq[i]!;
    seq[i] = seq[j]!;
    seq[j] = t;
  } else {
    const i = randomInt(rng, n);
    const j = randomInt(rng, n);
    moveItem(seq, i, j);
  }
}

/**
 * Searches orderings that pack every item into the fixed bins. Returns the packing, or null when the
 * budget (or `maxStale` non-improving steps) runs out first.
 */
export function packIntoFixed(
  pr: Problem,
  fixed: readonly number[],
  start: Int32Array,
  opts: DecodeOptions,
  ctx: SearchContext,
  heightOverride?: number,
  maxStale = Infinity,
): Packing | null {
  const { rng, budget } = ctx;
  let seq = start.slice();
  let cur = decode(pr, seq, opts, fixed, undefined, heightOverride);
  if (cur.leftover.length === 0) return cur;
  let bestCost = cur.leftoverArea;
  let bestSeq = seq.slice();
  let stale = 0;
  let sinceRestart = 0;
  const rules = ruleSet(pr);
  let o = { ...opts };
  // Late acceptance (Burke & Bykov): accept a step no worse than the cost `lahc` steps ago.
  const hist = tuning.lahc > 0 ? new Float64Array(tuning.lahc).fill(cur.leftoverArea) : null;
  let iter = 0;
  while (!budget.expired()) {
    const next = seq.slice();
    mutate(rng, next, cur.leftover);
    const p = decode(pr, next, o, fixed, undefined, heightOverride);
    if (p.leftover.length === 0) return p;
    iter++;
    const ok = p.leftoverArea <= cur.leftoverArea + 1e-9 || (hist !== null && p.leftoverArea <= hist[iter % hist.length]! + 1e-9);
    if (ok) {
      seq = next;
      cur = p;
    }
    if (hist) hist[iter % hist.length] = cur.leftoverArea;
    if (ok && p.leftoverArea < bestCost - 1e-9) {
      bestCost = p.leftoverArea;
      bestSeq = seq.slice();
      stale = 0;
      sinceRestart = 0;
      continue;
    }
    stale++;
    sinceRestart++;
    if (stale > maxStale) return null;
    if (sinceRestart > 50 + tuning.restartFactor * pr.items.length) {
      // Restart from the best ordering (or a shuffled one) with another placement rule.
      sinceRestart = 0;
      if (tuning.randomRestart) {
        seq = bestSeq.slice();
        for (let k = 0; k < seq.length / 4; k++) mutate(rng, seq, []);
      } else seq = bestSeq.slice();
      o = { ...o, rule: rules[randomInt(rng, rules.length)]! };
      cur = decode(pr, seq, o, fixed, undefined, heightOverride);
      if (cur.leftover.length === 0) return cur;
      if (hist) hist.fill(cur.leftoverArea);
    }
  }
  return null;
}

/** Sheets, remnants and fixed-length rolls: fewest sheets (or lowest cost). */
export function solveBins(pr: Problem, ctx: SearchContext): Packing {
  const { budget } = ctx;
  let best: Packing | null = null;
  let bestOpts: DecodeOptions = { rule: RULE_BSSF, split: SPLIT_SHORTER_LEFTOVER, bestFit: false };
  const orders = startOrders(pr);
  const done = () => best !== null && (primaryOf(pr, best) <= ctx.lowerBound || budget.expired());
  outer: for (const order of orders) {
    for (const rule of ruleSet(pr)) {
      for (const split of splitSet(pr)) {
        for (const bestFit of [false, true]) {
          const opts = { rule, split, bestFit };
          const p = decode(pr, order, opts, null);
          if (best === null || compareBins(pr, p, best) < 0) {
            best = p;
            bestOpts = opts;
            ctx.onImprove?.(primaryOf(pr, p));
          }
          if (done()) break outer;
        }
      }
    }
  }
  let cur = compact(best!);
  while (!budget.expired() && cur.leftover.length === 0 && primaryOf(pr, cur) > ctx.lowerBound) {
    // Drop the weakest counted sheet (lowest fill) and try to fit everything on the rest.
    let weakest = -1;
    let weakestFill = Infinity;
    cur.bins.forEach((bin, b) => {
      const t = pr.types[cur.binTypes[b]!]!;
      if (pr.objective === 'sheets' && t.kind === 'remnant') return;
      const fill = bin.usedArea / (t.W * t.H);
      if (fill < weakestFill) {
        weakestFill = fill;
        weakest = b;
      }
    });
    if (weakest < 0) break;
    const target = cur.binTypes.filter((_, b) => b !== weakest);
    let start = orders[0]!;
    if (tuning.startFromBest) {
      // Items of the weakest sheet first, then the others sheet by sheet.
      const seq: number[] = cur.bins[weakest]!.placements.map((p) => p.item);
      cur.bins.forEach((bin, b) => {
        if (b !== weakest) for (const p of bin.placements) seq.push(p.item);
      });
      start = Int32Array.from(seq);
    }
    const found = packIntoFixed(pr, target, start, { ...bestOpts, bestFit: tuning.fixedBestFit }, ctx);
    if (!found) break;
    cur = compact(found);
    ctx.onImprove?.(primaryOf(pr, cur));
  }
  return cur;
}

/** Lower bound on the inflated length of a roll of inflated width W. */
export function stripLowerBound(pr: Problem, t: number): number {
  const W = pr.types[t]!.W;
  let area = 0;
  let tallest = 0;
  pr.items.forEach((it, i) => {
    area += it.area;
    const o = pr.orient[t]![i]!;
    const hMin = o === 3 ? Math.min(it.w, it.h) : o === 1 ? it.h : it.w;
    tallest = Math.max(tallest, hMin);
  });
  return Math.max(area / W, tallest);
}

/** A roll: the shortest length. Returns a packing into one bin whose used length is bins[0].topY(). */
export function solveStrip(pr: Problem, t: number, ctx: SearchContext): Packing {
  const { budget, rng } = ctx;
  const type = pr.types[t]!;
  let tall = 0;
  for (const it of pr.items) tall += Math.max(it.w, it.h);
  const open = Math.min(type.H, tall + 1);
  const orders = startOrders(pr);
  let best: Packing | null = null;
  let bestLen = Infinity;
  let bestOpts: DecodeOptions = { rule: RULE_BL, split: SPLIT_SHORTER_LEFTOVER, bestFit: false };
  // Contact point would reward touching the far end of the open roll: only used at a fixed length.
  const rules = pr.items.length <= 300 ? [RULE_BL, RULE_CP, RULE_BSSF, RULE_BAF] : [RULE_BL, RULE_BSSF, RULE_BAF];
  outer: for (const order of orders) {
    for (const rule of rules) {
      if (rule === RULE_CP) continue;
      for (const split of splitSet(pr)) {
        const opts = { rule, split, bestFit: false };
        const p = decode(pr, order, opts, [t], undefined, open);
        const len = p.leftover.length > 0 ? Infinity : p.bins[0]!.topY();
        if (best === null || len < bestLen - 1e-9 || (best.leftover.length > 0 && p.leftoverArea < best.leftoverArea)) {
          best = p;
          bestLen = len;
          bestOpts = opts;
          ctx.onImprove?.(len);
        }
        if (bestLen <= ctx.lowerBound + 1e-9 || budget.expired()) break outer;
      }
    }
  }
  if (!best || best.leftover.length > 0) return best!;
  let step = Math.max(1, Math.floor((bestLen - ctx.lowerBound) / 4));
  let seed = orders[0]!;
  while (!budget.expired() && bestLen - 1e-9 > ctx.lowerBound) {
    const target = Math.max(ctx.lowerBound, bestLen - step);
    const p = packIntoFixed(pr, [t], seed, bestOpts, ctx, target, 200 + 4 * pr.items.length);
    if (p) {
      best = p;
      bestLen = p.bins[0]!.topY();
      ctx.onImprove?.(bestLen);
    } else if (step > 1) {
      step = Math.max(1, Math.floor(step / 2));
    } else {
      seed = orders[randomInt(rng, orders.length)]!;
      bestOpts = { ...bestOpts, rule: rules[randomInt(rng, rules.length)]! };
    }
  }
  return best;
}
