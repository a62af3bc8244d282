/**
 * Turns a parsed nest job into packing problems: parts expanded by quantity, grouped by the stock they
 * may go on (material and thickness), sizes grown by one kerf (see bins.ts), and the orientations each
 * part may take on each stock (grain and canRotate).
 */
import type { NestJob, PartItem, StockItem } from '../schemas/nest.schema.js';

/** Bit set of allowed orientations: 1 = as given, 2 = turned 90°. */
export const ORIENT_AS_GIVEN = 1;
export const ORIENT_TURNED = 2;

export interface StockType {
  /** Index into job.stock. */
  stock: number;
  id: string;
  kind: StockItem['kind'];
  /** Inflated usable size: real size − 2·trim + kerf; H is Infinity for a roll without a length. */
  W: number;
  H: number;
  trim: number;
  /** Sheets of this size still available (Infinity when unlimited). */
  available: number;
  /** Cost of one sheet, or of one mm of roll (cost per metre / 1000). */
  cost: number;
  /** The sheet's length (grain and rip direction) runs along y. */
  lengthAlongY: boolean;
}

export interface ProblemItem {
  /** Index into job.parts. */
  part: number;
  /** Inflated size as given (real + kerf). */
  w: number;
  h: number;
  area: number;
}

export interface Problem {
  items: ProblemItem[];
  /** Stock types these items may use, in order of preference (remnants first). */
  types: StockType[];
  /** orient[t][i]: allowed orientations of item i on types[t] (0 = does not fit there). */
  orient: Uint8Array[];
  guillotine: boolean;
  kerf: number;
  /** Smallest inflated side of any item: free space narrower than this is useless. */
  minSide: number;
  objective: NestJob['objective'];
}

export interface PreparedJob {
  problems: Problem[];
  /** Parts that fit no stock at all, with the reason. */
  unfit: { part: number; quantity: number; reason: string }[];
  stockTypes: StockType[];
}

/** The sheet's length runs along its longer side; a roll's along its length (y). */
export function stockLengthAlongY(s: StockItem): boolean {
  if (s.kind === 'roll') return true;
  return (s.height ?? 0) >= s.width;
}

function matches(part: PartItem, s: StockItem): boolean {
  if (part.material !== undefined && s.material !== undefined && part.material.trim().toLowerCase() !== s.material.trim().toLowerCase()) return false;
  if (part.thickness !== undefined && s.thickness !== undefined && Math.abs(part.thickness - s.thickness) > 1e-6) return false;
  return true;
}

/** Orientations allowed by grain and canRotate (before checking the size). */
export function allowedTurns(part: PartItem, s: StockItem): number {
  if (s.grain === 'length' && part.grain !== 'none') {
    // The part's grain must run along the sheet's length.
    const grainAlongYAsGiven = part.grain === 'height';
    const need = grainAlongYAsGiven === stockLengthAlongY(s) ? ORIENT_AS_GIVEN : ORIENT_TURNED;
    if (need === ORIENT_TURNED && !part.canRotate) return 0;
    return need;
  }
  return part.canRotate ? ORIENT_AS_GIVEN | ORIENT_TURNED : ORIENT_AS_GIVEN;
}

export function makeStockTypes(job: NestJob): StockType[] {
  const k = job.kerf;
  const order = (s: StockItem) => (s.kind === 'remnant' ? 0 : s.kind === 'sheet' ? 1 : 2);
  const types = job.stock.map((s, stock): StockType => {
    const realH = s.kind === 'roll' ? (s.length ?? Infinity) : (s.height ?? 0);
    return {
      stock,
      id: s.id,
      kind: s.kind,
      W: s.width - 2 * s.trim + k,
      H: realH === Infinity ? Infinity : realH - 2 * s.trim + k,
      trim: s.trim,
      available: s.quantity === null || s.quantity === undefined ? Infinity : s.quantity,
      cost: s.kind === 'roll' ? (s.cost ?? 0) / 1000 : (s.cost ?? (s.kind === 'remnant' ? 0 : 1)),
      lengthAlongY: stockLengthAlongY(s),
    };
  });
  // Preference: remnants (smallest first, so they are used up), then sheets (the largest first when
  // counting sheets, the cheapest per area when counting cost), then rolls.
  return types.sort((a, b) => {
    const oa = order(job.stock[a.stock]!);
    const ob = order(job.stock[b.stock]!);
    if (oa !== ob) return oa - ob;
    const areaA = a.W * (a.H === Infinity ? 1e12 : a.H);
    const areaB = b.W * (b.H === Infinity ? 1e12 : b.H);
    if (oa === 0) return areaA - areaB || a.stock - b.stock;
    if (job.objective === 'cost') return a.cost / areaA - b.cost / areaB || areaB - areaA || a.stock - b.stock;
    return areaB - areaA || a.cost - b.cost || a.stock - b.stock;
  });
}

export function fitOrientations(allowed: number, w: number, h: number, W: number, H: number): number {
  let o = 0;
  if (allowed & ORIENT_AS_GIVEN && w <= W + 1e-7 && h <= H + 1e-7) o |= ORIENT_AS_GIVEN;
  if (allowed & ORIENT_TURNED && h <= W + 1e-7 && w <= H + 1e-7) o |= ORIENT_TURNED;
  // A square part turned is the same part as given: keep one orientation.
  if (o === (ORIENT_AS_GIVEN | ORIENT_TURNED) && Math.abs(w - h) <= 1e-9) o = ORIENT_AS_GIVEN;
  return o;
}

export function prepareJob(job: NestJob): PreparedJob {
  const k = job.kerf;
  const stockTypes = makeStockTypes(job);
  const unfit: PreparedJob['unfit'] = [];
  const groups = new Map<string, { types: StockType[]; orient: number[][]; items: ProblemItem[] }>();
  job.parts.forEach((part, p) => {
    const w = part.width + k;
    const h = part.height + k;
    const usable: StockType[] = [];
    const orients: number[] = [];
    let grainConflict = false;
    let fitsAcrossGrain = false;
    let materialMatch = false;
    for (const t of stockTypes) {
      const s = job.stock[t.stock]!;
      if (!matches(part, s)) continue;
      materialMatch = true;
      const allowed = allowedTurns(part, s);
      if (allowed === 0) {
        grainConflict = true;
        continue;
      }
      const o = fitOrientations(allowed, w, h, t.W, t.H);
      if (o === 0) {
        if (fitOrientations(ORIENT_AS_GIVEN | ORIENT_TURNED, w, h, t.W, t.H) !== 0) fitsAcrossGrain = true;
        continue;
      }
      usable.push(t);
      orients.push(o);
    }
    if (usable.length === 0) {
      const reason = !materialMatch
        ? 'no stock of this material and thickness'
        : grainConflict
          ? 'grain and canRotate allow no orientation that fits the stock'
          : fitsAcrossGrain
            ? 'fits only turned against its grain or canRotate'
            : 'larger than every usable stock size (after trim)';
      unfit.push({ part: p, quantity: part.quantity, reason });
      return;
    }
    const key = usable.map((t) => t.stock).join(',');
    let g = groups.get(key);
    if (!g) {
      g = { types: usable, orient: usable.map(() => []), items: [] };
      groups.set(key, g);
    }
    for (let q = 0; q < part.quantity; q++) {
      const idx = g.items.length;
      g.items.push({ part: p, w, h, area: w * h });
      usable.forEach((_, ti) => {
        g!.orient[ti]![idx] = orients[ti]!;
      });
    }
  });
  const problems: Problem[] = [];
  for (const g of groups.values()) {
    let minSide = Infinity;
    for (const it of g.items) minSide = Math.min(minSide, it.w, it.h);
    problems.push({
      items: g.items,
      types: g.types,
      orient: g.orient.map((o) => Uint8Array.from(o)),
      guillotine: job.mode === 'guillotine',
      kerf: k,
      minSide,
      objective: job.objective,
    });
  }
  return { problems, unfit, stockTypes };
}
