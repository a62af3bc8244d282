/**
 * Rectangle nesting of parts on sheets, remnants and rolls (PRODUCT.md §4, contract §8).
 *
 *   nest(job, { now, onProgress, shouldStop }) → Layout
 *   parseNestJob(input) → { ok, job } | { ok: false, message, fields }
 *   validateLayout(job, layout) → string[] (an independent check; [] when valid)
 *
 * Pure: no clock or randomness of its own. `now` (e.g. performance.now) enforces the time limit;
 * without it the search stops by its work budget alone. Same job and seed → same layout (see
 * budget.ts for the one exception: a run cut short by the clock on a slow or busy machine).
 */
import { describeFields, issuesToFields } from '../errors.js';
import { nestJobSchema, type Layout, type LayoutSheet, type NestJob, type NestProgress } from '../schemas/nest.schema.js';
import type { PackBin } from './bins.js';
import { binLowerBounds, type BoundItem } from './bounds.js';
import { Budget } from './budget.js';
import { freeOffcuts, planGuillotineCuts } from './cuts.js';
import type { Packing } from './decode.js';
import { ORIENT_TURNED, prepareJob, type Problem, type StockType } from './problem.js';
import { mulberry32 } from './rng.js';
import { primaryOf, solveBins, solveStrip, stripLowerBound, type SearchContext } from './search.js';

export { validateLayout } from './validate.js';
export { binLowerBounds, type BinBounds, type BoundItem } from './bounds.js';
export type { NestJob, Layout, NestProgress } from '../schemas/nest.schema.js';

export interface NestOptions {
  onProgress?: (p: NestProgress) => void;
  now?: () => number;
  shouldStop?: () => boolean;
}

export type ParseResult = { ok: true; job: NestJob } | { ok: false; message: string; fields: Record<string, string> };

export function parseNestJob(input: unknown): ParseResult {
  const r = nestJobSchema.safeParse(input);
  if (!r.success) {
    // zod's own wording for a missing field ("expected array, received undefined") becomes "is required".
    const fields = issuesToFields(
      r.error.issues.map((i) => ({ path: i.path, message: /received undefined$/.test(i.message) ? `${String(i.path.at(-1) ?? 'value')} is required` : i.message })),
    );
    return { ok: false, message: describeFields(fields), fields };
  }
  const job = r.data;
  const fields: Record<string, string> = {};
  job.stock.forEach((s, i) => {
    if (2 * s.trim >= s.width) fields[`stock[${i}].trim`] = 'edge trim leaves no usable width';
    else if (s.height !== undefined && 2 * s.trim >= s.height) fields[`stock[${i}].trim`] = 'edge trim leaves no usable height';
  });
  const seenStock = new Set<string>();
  job.stock.forEach((s, i) => {
    if (seenStock.has(s.id)) fields[`stock[${i}].id`] = `stock id ${s.id} is used twice`;
    seenStock.add(s.id);
  });
  const seenPart = new Set<string>();
  job.parts.forEach((p, i) => {
    if (seenPart.has(p.id)) fields[`parts[${i}].id`] = `part id ${p.id} is used twice`;
    seenPart.add(p.id);
  });
  if (Object.keys(fields).length > 0) return { ok: false, message: describeFields(fields), fields };
  return { ok: true, job };
}

/** Sub-problem on some of the stock types and some of the items. */
function restrict(pr: Problem, typeIdx: number[], items?: number[]): Problem {
  const keep = items ?? pr.items.map((_, i) => i);
  const sub: Problem = {
    ...pr,
    items: keep.map((i) => pr.items[i]!),
    types: typeIdx.map((t) => pr.types[t]!),
    orient: typeIdx.map((t) => Uint8Array.from(keep.map((i) => pr.orient[t]![i]!))),
  };
  sub.minSide = Math.min(...sub.items.map((it) => Math.min(it.w, it.h)));
  return sub;
}

/** Lower bound on counted sheets (sheets objective) for a sheet problem. */
function sheetLowerBound(pr: Problem): number {
  if (pr.objective === 'cost') return 0;
  const W = Math.max(...pr.types.map((t) => t.W));
  const H = Math.max(...pr.types.map((t) => t.H));
  const items: BoundItem[] = pr.items.map((it, i) => {
    let o = 0;
    for (let t = 0; t < pr.types.length; t++) o |= pr.orient[t]![i]!;
    return o & ORIENT_TURNED && o !== ORIENT_TURNED ? { w: it.w, h: it.h, turn: true } : o === ORIENT_TURNED ? { w: it.h, h: it.w, turn: false } : { w: it.w, h: it.h, turn: false };
  });
  let remnants = 0;
  let remnantArea = 0;
  const remnantTypes: number[] = [];
  pr.types.forEach((t, i) => {
    if (t.kind !== 'remnant') return;
    remnants += t.available;
    remnantArea += t.available * t.W * t.H;
    remnantTypes.push(i);
  });
  const lb = binLowerBounds(W, H, items).best;
  if (remnants === 0) return lb;
  // With remnants (smaller, free): every bound on the whole less one bin a remnant; the parts no
  // remnant can take, on their own; and the area the remnants cannot hold.
  const sheetOnly = items.filter((_, i) => remnantTypes.every((t) => pr.orient[t]![i]! === 0));
  let area = 0;
  for (const it of pr.items) area += it.area;
  const byArea = Math.ceil((area - remnantArea) / (W * H) - 1e-9);
  return Math.max(0, lb - remnants, binLowerBounds(W, H, sheetOnly).best, byArea);
}

interface Solved {
  pr: Problem;
  packing: Packing;
}

/** Output coordinates rounded to a millionth of a mm: removes floating-point noise like 1767.6000000000001. */
const mm = (v: number) => Math.round(v * 1e6) / 1e6;

function toSheet(job: NestJob, pr: Problem, bin: PackBin, type: StockType, roll: boolean): LayoutSheet {
  const stock = job.stock[type.stock]!;
  const k = pr.kerf;
  const t = type.trim;
  const top = bin.topY();
  const height = roll ? top - k + 2 * t : stock.height!;
  const frameH = roll ? top : type.H;
  const placements = bin.placements
    .map((p) => ({
      partId: job.parts[pr.items[p.item]!.part]!.id,
      x: mm(p.x + t),
      y: mm(p.y + t),
      width: mm(p.w - k),
      height: mm(p.h - k),
      rotated: p.rotated,
    }))
    .sort((a, b) => a.y - b.y || a.x - b.x);
  const frame = { W: type.W, H: frameH, kerf: k, trim: t, lengthAlongY: type.lengthAlongY, minOffcut: job.minOffcut };
  let cuts: LayoutSheet['cuts'] = [];
  let offcuts: LayoutSheet['offcuts'];
  if (pr.guillotine) {
    const plan = planGuillotineCuts(bin.placements, frame);
    if (!plan) throw new Error('nesting: internal error, a guillotine layout is not cuttable');
    cuts = plan.cuts.map((c) => ({ ...c, x1: mm(c.x1), y1: mm(c.y1), x2: mm(c.x2), y2: mm(c.y2) }));
    offcuts = plan.offcuts;
  } else {
    offcuts = freeOffcuts(bin.placements, frame);
  }
  let partArea = 0;
  for (const p of placements) partArea += p.width * p.height;
  offcuts = offcuts.map((o) => ({ x: mm(o.x), y: mm(o.y), width: mm(o.width), height: mm(o.height) }));
  return {
    stockId: stock.id,
    kind: stock.kind,
    width: stock.width,
    height: mm(height),
    placements,
    cuts,
    offcuts,
    utilisation: partArea / (stock.width * height),
  };
}

export function nest(job: NestJob, options: NestOptions = {}): Layout {
  const { now, onProgress, shouldStop } = options;
  const t0 = now ? now() : 0;
  const prepared = prepareJob(job);
  const rng = mulberry32(job.seed);
  const totalItems = prepared.problems.reduce((n, p) => n + p.items.length, 0);
  let itemsLeft = totalItems;
  // Time kept back from the search for bounds, cut plans and offcuts: 10 % plus 0.05 ms a part,
  // at most 30 % of the limit (measured: about 0.03–0.07 ms a part for the layout work).
  const reserve = Math.min(0.3 * job.timeLimitMs, 0.1 * job.timeLimitMs + 0.05 * totalItems);
  let timeLeft = job.timeLimitMs - reserve;
  const solved: Solved[] = [];
  const unplaced = new Map<number, { n: number; reason: string }>();
  const addUnplaced = (part: number, n: number, reason: string) => {
    const u = unplaced.get(part);
    if (u) u.n += n;
    else unplaced.set(part, { n, reason });
  };
  for (const u of prepared.unfit) addUnplaced(u.part, u.quantity, u.reason);
  let lowerBound = 0;
  let bestSoFar = 0;
  let doneSheets = 0;
  const report = (fraction: number, message: string) => onProgress?.({ fraction: Math.min(1, fraction), bestSheets: doneSheets + bestSoFar, message });

  for (const pr of prepared.problems) {
    const share = itemsLeft > 0 ? (timeLeft * pr.items.length) / itemsLeft : 0;
    const started = now ? now() : 0;
    const doneItems = totalItems - itemsLeft;
    let budget!: Budget;
    // The work share depends on the job only (not on how fast earlier groups ran): same layout every run.
    const workShare = ((job.timeLimitMs - reserve) * pr.items.length) / Math.max(1, totalItems);
    budget = new Budget(
      Math.max(0, share),
      now,
      shouldStop,
      undefined,
      () => report((doneItems + pr.items.length * budget.fraction()) / Math.max(1, totalItems), 'searching'),
      workShare,
    );
    const ctxFor = (lb: number, roll: boolean): SearchContext => ({
      rng,
      budget,
      lowerBound: lb,
      onImprove: (v) => {
        bestSoFar = roll ? 1 : v;
        report((doneItems + pr.items.length * budget.fraction()) / Math.max(1, totalItems), 'improved');
      },
    });
    const sheetTypes: number[] = [];
    const rollTypes: number[] = [];
    pr.types.forEach((t, i) => (t.kind === 'roll' ? rollTypes : sheetTypes).push(i));
    let rest: number[] = pr.items.map((_, i) => i);
    const take = (sub: Problem, packing: Packing, itemMap: number[]) => {
      solved.push({ pr: sub, packing });
      packing.binTypes.forEach((t) => {
        sub.types[t]!.available -= 1;
      });
      const left = new Set(packing.leftover.map((i) => itemMap[i]!));
      rest = rest.filter((i) => left.has(i));
    };
    if (sheetTypes.length > 0) {
      const usable = rest.filter((i) => sheetTypes.some((t) => pr.orient[t]![i]! !== 0));
      if (usable.length > 0) {
        const sub = restrict(pr, sheetTypes, usable);
        const lb = sheetLowerBound(sub);
        lowerBound += lb;
        const packing = solveBins(sub, ctxFor(lb, false));
        take(sub, packing, usable);
        doneSheets += primaryOf(sub, packing);
        bestSoFar = 0;
      }
    }
    for (const t of rollTypes) {
      const usable = rest.filter((i) => pr.orient[t]![i]! !== 0);
      if (usable.length === 0 || pr.types[t]!.available <= 0) continue;
      const sub = restrict(pr, [t], usable);
      let packing = solveStrip(sub, 0, ctxFor(stripLowerBound(sub, 0), true));
      if (packing.leftover.length > 0 && sub.types[0]!.H !== Infinity) packing = solveBins(sub, ctxFor(0, false));
      take(sub, packing, usable);
    }
    for (const i of rest) addUnplaced(pr.items[i]!.part, 1, 'not enough stock');
    itemsLeft -= pr.items.length;
    const used = now ? now() - started : share;
    timeLeft = Math.max(0, timeLeft - used);
  }

  const sheets: LayoutSheet[] = [];
  for (const s of solved) {
    const { bins, binTypes } = s.packing;
    const typeOf = (b: number) => s.pr.types[binTypes[b]!]!;
    const fill = (b: number) => bins[b]!.usedArea / (typeOf(b).W * Math.min(typeOf(b).H, bins[b]!.topY()));
    const order = bins.map((_, b) => b).filter((b) => bins[b]!.placements.length > 0);
    // Fullest sheets first, so the partly used sheet (with the big offcut) comes last.
    order.sort((a, b) => fill(b) - fill(a) || a - b);
    for (const b of order) sheets.push(toSheet(job, s.pr, bins[b]!, typeOf(b), typeOf(b).kind === 'roll'));
  }
  let partArea = 0;
  let stockArea = 0;
  let rollLength = 0;
  let cost = 0;
  let anyCost = false;
  for (const sh of sheets) {
    for (const p of sh.placements) partArea += p.width * p.height;
    stockArea += sh.width * sh.height;
    const stock = job.stock.find((x) => x.id === sh.stockId)!;
    if (stock.cost !== undefined) anyCost = true;
    if (sh.kind === 'roll') {
      rollLength += sh.height;
      cost += ((stock.cost ?? 0) * sh.height) / 1000;
    } else cost += stock.cost ?? 0;
  }
  const layout: Layout = {
    sheets,
    unplaced: [...unplaced.entries()]
      .sort((a, b) => a[0] - b[0])
      .map(([p, u]) => ({ partId: job.parts[p]!.id, quantity: u.n, reason: u.reason })),
    stats: {
      sheetsUsed: sheets.length,
      utilisation: stockArea > 0 ? partArea / stockArea : 0,
      elapsedMs: now ? Math.round(now() - t0) : 0,
      lowerBound,
    },
  };
  if (sheets.some((s) => s.kind === 'roll')) layout.stats.rollLengthUsed = rollLength;
  if (anyCost) layout.stats.cost = Math.round(cost * 100) / 100;
  onProgress?.({ fraction: 1, bestSheets: sheets.length, message: 'done' });
  return layout;
}
