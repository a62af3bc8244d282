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
import type { PackBin } from './bins.js';
import type { Problem } from './problem.js';
import { expandPacking, mergeItems } from './merge.js';
import { randomInt, type Rng } from './rng.js';

/** Search knobs (defaults chosen by measurement on the bench; see DEVELOPERS.md). */
export const tuning = {
  fixedBestFit: false,
  startFromBest: false,
  restartFactor: 4,
  lahc: 0,
  randomRestart: false,
  repack: true,
  repackStale: 0,
  /** Share of the budget for the super-item search (merge.ts), on jobs of at most mergeMaxItems parts. */
  mergeShare: 0.4,
  mergeMaxItems: 300,
  mergeStep: 0.15,
  mergeMin: 0.8,
  /** Only when the parts would fill the sheets at the area bound to at least this share. */
  mergeFill: 0.97,
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

/** Area of new stock used (remnants are to be used up, so they do not count). */
function stockArea(pr: Problem, p: Packing): number {
  let a = 0;
  for (let b = 0; b < p.bins.length; b++) {
    if (p.bins[b]!.placements.length === 0) continue;
    const t = pr.types[p.binTypes[b]!]!;
    if (t.kind !== 'remnant') a += t.W * t.H;
  }
  return a;
}

/** Area of the largest free rectangle on any sheet: the best reusable offcut. */
export function largestFree(p: Packing): number {
  let best = 0;
  for (const bin of p.bins) {
    if (bin.placements.length === 0) continue;
    const a = bin.largestFreeArea();
    if (a > best) best = a;
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

export interface FixedResult {
  /** A packing with every item placed, or null. */
  found: Packing | null;
  /** The packing with the least area left over. */
  best: Packing;
}

/**
 * Searches orderings that pack every item into the fixed bins. Stops when everything fits, or when
 * the budget (or `maxStale` non-improving steps) runs out.
 */
export function packIntoFixed(
  pr: Problem,
  fixed: readonly number[],
  start: Int32Array,
  opts: DecodeOptions,
  ctx: SearchContext,
  heightOverride?: number,
  maxStale = Infinity,
): FixedResult {
  const { rng, budget } = ctx;
  let seq = start.slice();
  let cur = decode(pr, seq, opts, fixed, undefined, heightOverride);
  if (cur.leftover.length === 0) return { found: cur, best: cur };
  let best = cur;
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
    if (p.leftover.length === 0) return { found: p, best: p };
    iter++;
    const ok = p.leftoverArea <= cur.leftoverArea + 1e-9 || (hist !== null && p.leftoverArea <= hist[iter % hist.length]! + 1e-9);
    if (ok) {
      seq = next;
      cur = p;
    }
    if (hist) hist[iter % hist.length] = cur.leftoverArea;
    if (ok && p.leftoverArea < bestCost - 1e-9) {
      bestCost = p.leftoverArea;
      best = p;
      bestSeq = seq.slice();
      stale = 0;
      sinceRestart = 0;
      continue;
    }
    stale++;
    sinceRestart++;
    if (stale > maxStale) return { found: null, best };
    if (sinceRestart > 50 + tuning.restartFactor * pr.items.length) {
      // Restart from the best ordering (or a shuffled one) with another placement rule.
      sinceRestart = 0;
      if (tuning.randomRestart) {
        seq = bestSeq.slice();
        for (let k = 0; k < seq.length / 4; k++) mutate(rng, seq, []);
      } else seq = bestSeq.slice();
      o = { ...o, rule: rules[randomInt(rng, rules.length)]! };
      cur = decode(pr, seq, o, fixed, undefined, heightOverride);
      if (cur.leftover.length === 0) return { found: cur, best: cur };
      if (hist) hist.fill(cur.leftoverArea);
    }
  }
  return { found: null, best };
}

/**
 * A packing into the fixed bins with items left over, completed by one more bin of type `t` that
 * takes every leftover item; null when they do not all fit. With the leftover area minimised, the
 * extra bin holds as little as possible: the waste gathers in one large offcut.
 */
function completeWithExtra(pr: Problem, partial: Packing, t: number, opts: DecodeOptions): Packing | null {
  if (partial.leftover.length === 0) return partial;
  const order = Int32Array.from([...partial.leftover].sort((a, b) => pr.items[b]!.area - pr.items[a]!.area || a - b));
  const extra = decode(pr, order, { ...opts, rule: RULE_BL }, [t]);
  if (extra.leftover.length > 0) return null;
  return compact({ bins: [...partial.bins, ...extra.bins], binTypes: [...partial.binTypes, t], leftover: [], leftoverArea: 0 });
}

/** Packs `items` into the bins of `types` (one or two bins) trying a few orderings and rules. */
function repackInto(pr: Problem, items: number[], types: number[], opts: DecodeOptions, ctx: SearchContext, tries: number): Packing | null {
  const { rng, budget } = ctx;
  const it = pr.items;
  const keyed = (key: (i: number) => number) => Int32Array.from([...items].sort((a, b) => key(b) - key(a) || a - b));
  const orders = [
    keyed((i) => it[i]!.area),
    keyed((i) => it[i]!.h),
    keyed((i) => it[i]!.w),
    keyed((i) => Math.max(it[i]!.w, it[i]!.h)),
  ];
  const rules = [RULE_BSSF, RULE_BL, RULE_BAF, RULE_CP];
  for (let k = 0; k < tries; k++) {
    let order: Int32Array;
    if (k < orders.length) order = orders[k]!;
    else {
      order = orders[randomInt(rng, orders.length)]!.slice();
      for (let s = 0; s < 2; s++) {
        const a = randomInt(rng, order.length);
        const b = randomInt(rng, order.length);
        const t = order[a]!;
        order[a] = order[b]!;
        order[b] = t;
      }
    }
    for (const rule of k < orders.length ? rules : [rules[randomInt(rng, rules.length)]!]) {
      if (budget.expired()) return null;
      const p = decode(pr, order, { ...opts, rule, bestFit: false }, types);
      if (p.leftover.length === 0) return p;
    }
  }
  return null;
}

/**
 * Empties the weakest bin item by item: each item moves into another bin (or pair of bins) whose
 * items, with it, still pack into that bin (or pair). After Lodi, Martello & Vigo's tabu search
 * neighbourhood (INFORMS J. Computing 11(4):345–357, 1999), without the tabu list.
 */
function emptyWeakest(pr: Problem, cur: Packing, weakest: number, opts: DecodeOptions, ctx: SearchContext): Packing {
  const { rng, budget } = ctx;
  const bins = cur.bins.slice();
  const types = cur.binTypes.slice();
  const items = bins.map((b) => b.placements.map((p) => p.item));
  const area = (b: number) => types[b] !== undefined ? pr.types[types[b]!]!.W * pr.types[types[b]!]!.H : 0;
  const free = (b: number) => area(b) - bins[b]!.usedArea;
  let moved = true;
  while (moved && items[weakest]!.length > 0 && !budget.expired()) {
    moved = false;
    const mine = [...items[weakest]!].sort((a, b) => pr.items[b]!.area - pr.items[a]!.area || a - b);
    const others = bins.map((_, b) => b).filter((b) => b !== weakest).sort((a, b) => free(b) - free(a) || a - b);
    for (const i of mine) {
      const need = pr.items[i]!.area;
      for (const b of others) {
        if (free(b) < need - 1e-9) break;
        const p = repackInto(pr, [...items[b]!, i], [types[b]!], opts, ctx, 6);
        if (p) {
          bins[b] = p.bins[0]!;
          items[b]!.push(i);
          items[weakest] = items[weakest]!.filter((x) => x !== i);
          moved = true;
          break;
        }
        if (budget.expired()) break;
      }
      if (moved || budget.expired()) break;
      // Pairs of bins with room for it together.
      for (let x = 0; x < others.length && !moved; x++) {
        for (let y = x + 1; y < others.length && !moved; y++) {
          const b1 = others[x]!;
          const b2 = others[y]!;
          if (free(b1) + free(b2) < need - 1e-9) continue;
          const p = repackInto(pr, [...items[b1]!, ...items[b2]!, i], [types[b1]!, types[b2]!], opts, ctx, 4);
          if (p) {
            bins[b1] = p.bins[0]!;
            bins[b2] = p.bins[1]!;
            items[b1] = p.bins[0]!.placements.map((q) => q.item);
            items[b2] = p.bins[1]!.placements.map((q) => q.item);
            items[weakest] = items[weakest]!.filter((z) => z !== i);
            moved = true;
          }
          if (budget.expired()) return cur;
        }
      }
      if (moved) break;
    }
  }
  if (items[weakest]!.length > 0) {
    // Not emptied: repack what is left in the weakest bin.
    const p = repackInto(pr, items[weakest]!, [types[weakest]!], opts, ctx, 1);
    if (!p) return cur;
    bins[weakest] = p.bins[0]!;
  } else {
    bins[weakest] = makeEmpty(pr, types[weakest]!, opts);
  }
  return compact({ bins, binTypes: types, leftover: [], leftoverArea: 0 });
}

function makeEmpty(pr: Problem, t: number, opts: DecodeOptions): PackBin {
  return decode(pr, [], opts, [t]).bins[0]!;
}

/**
 * Sheets, remnants and fixed-length rolls: fewest sheets (or lowest cost). Small jobs that end one
 * sheet or more above the bound get a second search over super-items (merge.ts) with the budget left.
 */
export function solveBins(pr: Problem, ctx: SearchContext): Packing {
  if (tuning.mergeShare <= 0 || pr.items.length > tuning.mergeMaxItems || fillAtAreaBound(pr) < tuning.mergeFill) return solveBinsCore(pr, ctx);
  const first = solveBinsCore(pr, { ...ctx, budget: ctx.budget.child(1 - tuning.mergeShare) });
  let best = first;
  let primary = primaryOf(pr, best);
  while (best.leftover.length === 0 && primary > ctx.lowerBound + 1e-9 && !ctx.budget.expired()) {
    const m = mergeItems(pr, ctx.rng, tuning.mergeMin + (1 - tuning.mergeMin) * ctx.rng());
    if (!m) break;
    const p = solveBinsCore(m.pr, { ...ctx, onImprove: undefined, lowerBound: Math.max(ctx.lowerBound, primary - 1), budget: ctx.budget.child(tuning.mergeStep) });
    if (p.leftover.length > 0) continue;
    const e = expandPacking(pr, m, p);
    if (primaryOf(pr, e) < primary - 1e-9) {
      best = e;
      primary = primaryOf(pr, e);
      ctx.onImprove?.(primary);
    }
  }
  return best;
}

/**
 * How full the sheets would be at the area bound (largest counted sheet size): near 1 only a
 * layout with almost no waste reaches it, which is where whole groups of parts must be placed as one.
 */
function fillAtAreaBound(pr: Problem): number {
  let sheet = 0;
  for (const t of pr.types) if (t.kind !== 'remnant' && Number.isFinite(t.H)) sheet = Math.max(sheet, t.W * t.H);
  if (sheet <= 0) return 0;
  let area = 0;
  for (const it of pr.items) area += it.area;
  const k = Math.max(1, Math.ceil(area / sheet - 1e-9));
  return area / (k * sheet);
}

function solveBinsCore(pr: Problem, ctx: SearchContext): Packing {
  const { budget } = ctx;
  let best: Packing | null = null;
  let bestOpts: DecodeOptions = { rule: RULE_BSSF, split: SPLIT_SHORTER_LEFTOVER, bestFit: false };
  const orders = startOrders(pr);
  // At the bound the count cannot improve; a few more starts may still give a larger offcut.
  let tried = 0;
  const done = () => best !== null && (budget.expired() || (primaryOf(pr, best) <= ctx.lowerBound && tried >= 24));
  outer: for (const order of orders) {
    for (const rule of ruleSet(pr)) {
      for (const split of splitSet(pr)) {
        for (const bestFit of [false, true]) {
          const opts = { rule, split, bestFit };
          const p = decode(pr, order, opts, null);
          tried++;
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
  // Drop the weakest counted sheet (lowest fill) and try to fit everything on the rest. When that
  // fails (or the bound is already reached), the closest attempt plus one sheet often leaves a
  // larger offcut: keep it if it is better by compareBins.
  const weakestOf = (p: Packing): number => {
    let weakest = -1;
    let weakestFill = Infinity;
    p.bins.forEach((bin, b) => {
      const t = pr.types[p.binTypes[b]!]!;
      if (pr.objective === 'sheets' && t.kind === 'remnant') return;
      const fill = bin.usedArea / (t.W * t.H);
      if (fill < weakestFill) {
        weakestFill = fill;
        weakest = b;
      }
    });
    return weakest;
  };
  const startFor = (p: Packing, weakest: number): Int32Array => {
    if (!tuning.startFromBest) return orders[0]!;
    // Items of the weakest sheet first, then the others sheet by sheet.
    const seq: number[] = p.bins[weakest]!.placements.map((x) => x.item);
    p.bins.forEach((bin, b) => {
      if (b !== weakest) for (const x of bin.placements) seq.push(x.item);
    });
    return Int32Array.from(seq);
  };
  const fixedOpts = { ...bestOpts, bestFit: tuning.fixedBestFit };
  let atBound = primaryOf(pr, cur) <= ctx.lowerBound;
  while (!budget.expired() && cur.leftover.length === 0 && cur.bins.length > 1) {
    const weakest = weakestOf(cur);
    if (weakest < 0) break;
    if (tuning.repack && !atBound) {
      const e = emptyWeakest(pr, cur, weakest, fixedOpts, ctx);
      if (e.bins.length < cur.bins.length) {
        cur = e;
        ctx.onImprove?.(primaryOf(pr, cur));
        atBound = primaryOf(pr, cur) <= ctx.lowerBound;
        continue;
      }
    }
    const target = cur.binTypes.filter((_, b) => b !== weakest);
    // At the bound only the offcut can improve: a short search.
    const r = packIntoFixed(pr, target, startFor(cur, weakest), fixedOpts, ctx, undefined, atBound ? 50 + 2 * pr.items.length : Infinity);
    if (r.found) {
      cur = compact(r.found);
      ctx.onImprove?.(primaryOf(pr, cur));
      atBound = primaryOf(pr, cur) <= ctx.lowerBound;
      continue;
    }
    const alt = completeWithExtra(pr, r.best, cur.binTypes[weakest]!, fixedOpts);
    if (alt && compareBins(pr, alt, cur) < 0) cur = alt;
    break;
  }
  return pr.types.length > 1 ? downsize(pr, cur, fixedOpts, ctx) : cur;
}

/**
 * Several stock sizes: moves a sheet's parts onto a smaller (or, by cost, cheaper) size still in
 * stock when they fit there, emptiest sheets first; a remnant counts as free.
 */
function downsize(pr: Problem, cur: Packing, opts: DecodeOptions, ctx: SearchContext): Packing {
  const bins = cur.bins.slice();
  const types = cur.binTypes.slice();
  const value = (t: number) => {
    const type = pr.types[t]!;
    return pr.objective === 'cost' ? type.cost : type.kind === 'remnant' ? 0 : 1;
  };
  const area = (t: number) => pr.types[t]!.W * pr.types[t]!.H;
  const order = bins.map((_, b) => b).sort((a, b) => bins[a]!.usedArea / area(types[a]!) - bins[b]!.usedArea / area(types[b]!) || a - b);
  for (const b of order) {
    if (ctx.budget.expired()) break;
    const items = bins[b]!.placements.map((p) => p.item);
    const used = (t: number) => types.filter((x) => x === t).length;
    const better = pr.types
      .map((_, t) => t)
      .filter((t) => t !== types[b] && used(t) < pr.types[t]!.available && items.every((i) => pr.orient[t]![i]! !== 0))
      .filter((t) => value(t) < value(types[b]!) - 1e-9 || (Math.abs(value(t) - value(types[b]!)) <= 1e-9 && area(t) < area(types[b]!)))
      .sort((x, y) => value(x) - value(y) || area(x) - area(y) || x - y);
    for (const t of better) {
      if (area(t) < bins[b]!.usedArea - 1e-9) continue;
      const p = repackInto(pr, items, [t], opts, ctx, 6);
      if (p) {
        bins[b] = p.bins[0]!;
        types[b] = t;
        break;
      }
    }
  }
  return { bins, binTypes: types, leftover: cur.leftover, leftoverArea: cur.leftoverArea };
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
    const p = packIntoFixed(pr, [t], seed, bestOpts, ctx, target, 200 + 4 * pr.items.length).found;
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
