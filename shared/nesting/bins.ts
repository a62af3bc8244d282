/**
 * One open bin (sheet, remnant or a roll of fixed length) in the packer's inflated coordinates: every
 * part is grown by one kerf in width and height and the usable sheet by one kerf, so parts that touch
 * here are exactly one kerf apart on the real sheet and need no gap at the trimmed edge.
 *
 * Two kinds of free-space bookkeeping (J. Jylänki, "A Thousand Ways to Pack the Bin", 2010):
 * - MaxRectsBin keeps every maximal free rectangle (free mode: any layout a router can cut);
 * - GuillotineBin keeps disjoint free rectangles made by guillotine splits (guillotine mode).
 */

import { work } from './budget.js';

export const EPS = 1e-7;

/** Placement rules (lower score is better). */
export const RULE_BSSF = 0; // best short side fit
export const RULE_BLSF = 1; // best long side fit
export const RULE_BAF = 2; // best area fit
export const RULE_BL = 3; // bottom-left (lowest top edge, then leftmost)
export const RULE_CP = 4; // contact point: longest perimeter touching placed parts or bin edges
export const RULE_COUNT = 5;

/** Guillotine split rules for the space left beside a placed part. */
export const SPLIT_SHORTER_LEFTOVER = 0;
export const SPLIT_LONGER_LEFTOVER = 1;
export const SPLIT_MIN_AREA = 2;
export const SPLIT_MAX_AREA = 3;
export const SPLIT_HORIZONTAL = 4;
export const SPLIT_VERTICAL = 5;
export const SPLIT_COUNT = 6;

export interface Placed {
  item: number;
  x: number;
  y: number;
  w: number;
  h: number;
  rotated: boolean;
}

/** The best position found so far for one part; reused to avoid allocation. */
export class Candidate {
  s1 = Infinity;
  s2 = Infinity;
  x = 0;
  y = 0;
  w = 0;
  h = 0;
  rotated = false;
  free = -1;
  bin = -1;
  reset(): void {
    this.s1 = Infinity;
    this.s2 = Infinity;
    this.free = -1;
    this.bin = -1;
  }
  get found(): boolean {
    return this.free >= 0;
  }
}

export interface PackBin {
  readonly width: number;
  readonly height: number;
  usedArea: number;
  readonly placements: Placed[];
  /** Looks at every free rectangle; updates `cand` when this position scores better. */
  consider(w: number, h: number, rotated: boolean, rule: number, cand: Candidate, binIndex: number): void;
  place(cand: Candidate, item: number): void;
  /** Free rectangles as [x, y, w, h] (maximal ones for MaxRectsBin). */
  freeRects(): [number, number, number, number][];
  /** Highest top edge of any placement (roll length used). */
  topY(): number;
  /** Widest and tallest free rectangle: a part larger than both cannot fit. */
  maxFreeW: number;
  maxFreeH: number;
  largestFreeArea(): number;
}

function overlapLength(a0: number, a1: number, b0: number, b1: number): number {
  const lo = a0 > b0 ? a0 : b0;
  const hi = a1 < b1 ? a1 : b1;
  return hi > lo ? hi - lo : 0;
}

abstract class BaseBin implements PackBin {
  usedArea = 0;
  readonly placements: Placed[] = [];
  /** Free rectangles: x, y, w, h at 4·i … 4·i+3; `count` of them. */
  protected r: number[] = [];
  protected count = 0;
  protected top = 0;
  maxFreeW = 0;
  maxFreeH = 0;

  constructor(
    readonly width: number,
    readonly height: number,
    /** Free rectangles narrower than this in either side can never hold a part and are dropped. */
    protected readonly minSide: number,
  ) {
    this.push(0, 0, width, height);
    this.maxFreeW = width;
    this.maxFreeH = height;
  }

  /** Recomputes maxFreeW / maxFreeH after the free list changed. */
  protected refreshMax(): void {
    const r = this.r;
    let mw = 0;
    let mh = 0;
    for (let i = 0; i < this.count; i++) {
      if (r[4 * i + 2]! > mw) mw = r[4 * i + 2]!;
      if (r[4 * i + 3]! > mh) mh = r[4 * i + 3]!;
    }
    this.maxFreeW = mw;
    this.maxFreeH = mh;
  }

  largestFreeArea(): number {
    const r = this.r;
    let best = 0;
    for (let i = 0; i < this.count; i++) {
      const a = r[4 * i + 2]! * r[4 * i + 3]!;
      if (a > best) best = a;
    }
    return best;
  }

  protected push(x: number, y: number, w: number, h: number): void {
    const o = 4 * this.count++;
    const r = this.r;
    if (o >= r.length) {
      r.push(x, y, w, h);
    } else {
      r[o] = x;
      r[o + 1] = y;
      r[o + 2] = w;
      r[o + 3] = h;
    }
  }

  protected contactScore(x: number, y: number, w: number, h: number): number {
    let c = 0;
    if (x <= EPS) c += h;
    if (y <= EPS) c += w;
    if (x + w >= this.width - EPS) c += h;
    if (y + h >= this.height - EPS) c += w;
    for (const p of this.placements) {
      if (Math.abs(p.x - (x + w)) <= EPS || Math.abs(p.x + p.w - x) <= EPS) c += overlapLength(p.y, p.y + p.h, y, y + h);
      if (Math.abs(p.y - (y + h)) <= EPS || Math.abs(p.y + p.h - y) <= EPS) c += overlapLength(p.x, p.x + p.w, x, x + w);
    }
    return c;
  }

  consider(w: number, h: number, rotated: boolean, rule: number, cand: Candidate, binIndex: number): void {
    const r = this.r;
    const n = this.count;
    work.n += n + 6;
    for (let i = 0; i < n; i++) {
      const o = 4 * i;
      const rw = r[o + 2]!;
      const rh = r[o + 3]!;
      if (w > rw + EPS || h > rh + EPS) continue;
      const x = r[o]!;
      const y = r[o + 1]!;
      let s1: number;
      let s2: number;
      const lw = rw - w;
      const lh = rh - h;
      switch (rule) {
        case RULE_BSSF:
          s1 = lw < lh ? lw : lh;
          s2 = lw < lh ? lh : lw;
          break;
        case RULE_BLSF:
          s1 = lw < lh ? lh : lw;
          s2 = lw < lh ? lw : lh;
          break;
        case RULE_BAF:
          s1 = rw * rh - w * h;
          s2 = lw < lh ? lw : lh;
          break;
        case RULE_BL:
          s1 = y + h;
          s2 = x;
          break;
        default:
          s1 = -this.contactScore(x, y, w, h);
          s2 = y + h;
          break;
      }
      if (s1 < cand.s1 - EPS || (s1 <= cand.s1 + EPS && s2 < cand.s2 - EPS)) {
        cand.s1 = s1;
        cand.s2 = s2;
        cand.x = x;
        cand.y = y;
        cand.w = w;
        cand.h = h;
        cand.rotated = rotated;
        cand.free = i;
        cand.bin = binIndex;
      }
    }
  }

  abstract place(cand: Candidate, item: number): void;

  protected record(cand: Candidate, item: number): void {
    this.placements.push({ item, x: cand.x, y: cand.y, w: cand.w, h: cand.h, rotated: cand.rotated });
    this.usedArea += cand.w * cand.h;
    if (cand.y + cand.h > this.top) this.top = cand.y + cand.h;
  }

  freeRects(): [number, number, number, number][] {
    const out: [number, number, number, number][] = [];
    for (let i = 0; i < this.count; i++) out.push([this.r[4 * i]!, this.r[4 * i + 1]!, this.r[4 * i + 2]!, this.r[4 * i + 3]!]);
    return out;
  }

  topY(): number {
    return this.top;
  }
}

/** Scratch space for the rectangles a placement creates. */
let fresh = new Float64Array(256);

/** Maximal-rectangles free space: every part sits at a corner of a maximal free rectangle. */
export class MaxRectsBin extends BaseBin {
  place(cand: Candidate, item: number): void {
    this.record(cand, item);
    const x = cand.x;
    const y = cand.y;
    const x2 = x + cand.w;
    const y2 = y + cand.h;
    const minSide = this.minSide - EPS;
    const r = this.r;
    const n = this.count;
    if (fresh.length < 16 * n + 16) fresh = new Float64Array(32 * n + 32);
    const f = fresh;
    let m = 0;
    let keep = 0;
    for (let i = 0; i < n; i++) {
      const o = 4 * i;
      const rx = r[o]!;
      const ry = r[o + 1]!;
      const rw = r[o + 2]!;
      const rh = r[o + 3]!;
      const rx2 = rx + rw;
      const ry2 = ry + rh;
      if (x >= rx2 - EPS || x2 <= rx + EPS || y >= ry2 - EPS || y2 <= ry + EPS) {
        const k = 4 * keep++;
        r[k] = rx;
        r[k + 1] = ry;
        r[k + 2] = rw;
        r[k + 3] = rh;
        continue;
      }
      if (x > rx + EPS && x - rx >= minSide && rh >= minSide) {
        f[m] = rx; f[m + 1] = ry; f[m + 2] = x - rx; f[m + 3] = rh; m += 4;
      }
      if (x2 < rx2 - EPS && rx2 - x2 >= minSide && rh >= minSide) {
        f[m] = x2; f[m + 1] = ry; f[m + 2] = rx2 - x2; f[m + 3] = rh; m += 4;
      }
      if (y > ry + EPS && y - ry >= minSide && rw >= minSide) {
        f[m] = rx; f[m + 1] = ry; f[m + 2] = rw; f[m + 3] = y - ry; m += 4;
      }
      if (y2 < ry2 - EPS && ry2 - y2 >= minSide && rw >= minSide) {
        f[m] = rx; f[m + 1] = y2; f[m + 2] = rw; f[m + 3] = ry2 - y2; m += 4;
      }
    }
    this.count = keep;
    // Keep a new rectangle only if no other rectangle contains it. Old rectangles were maximal, so
    // none of them can lie inside a new one (a new one lies inside a removed old one).
    for (let a = 0; a < m; a += 4) {
      const ax = f[a]!;
      const ay = f[a + 1]!;
      const ax2 = ax + f[a + 2]!;
      const ay2 = ay + f[a + 3]!;
      let contained = false;
      for (let j = 0; j < keep; j++) {
        const o = 4 * j;
        if (ax >= r[o]! - EPS && ay >= r[o + 1]! - EPS && ax2 <= r[o]! + r[o + 2]! + EPS && ay2 <= r[o + 1]! + r[o + 3]! + EPS) {
          contained = true;
          break;
        }
      }
      if (!contained) {
        for (let b = 0; b < m; b += 4) {
          if (b === a || f[b + 2]! < 0) continue;
          const bx = f[b]!;
          const by = f[b + 1]!;
          const bx2 = bx + f[b + 2]!;
          const by2 = by + f[b + 3]!;
          if (ax >= bx - EPS && ay >= by - EPS && ax2 <= bx2 + EPS && ay2 <= by2 + EPS) {
            // Equal rectangles: keep the later one only.
            const equal = ax <= bx + EPS && ay <= by + EPS && ax2 >= bx2 - EPS && ay2 >= by2 - EPS;
            if (!equal || b > a) {
              contained = true;
              break;
            }
          }
        }
      }
      if (contained) f[a + 2] = -1;
    }
    for (let a = 0; a < m; a += 4) {
      if (f[a + 2]! < 0) continue;
      this.push(f[a]!, f[a + 1]!, f[a + 2]!, f[a + 3]!);
    }
    this.refreshMax();
  }
}

/** Guillotine free space: the placed part's free rectangle is split in two by one edge-to-edge cut. */
export class GuillotineBin extends BaseBin {
  constructor(width: number, height: number, minSide: number, private readonly split: number) {
    super(width, height, minSide);
  }

  place(cand: Candidate, item: number): void {
    this.record(cand, item);
    const i = cand.free;
    const r = this.r;
    const o = 4 * i;
    const rx = r[o]!;
    const ry = r[o + 1]!;
    const rw = r[o + 2]!;
    const rh = r[o + 3]!;
    const last = 4 * (this.count - 1);
    r[o] = r[last]!;
    r[o + 1] = r[last + 1]!;
    r[o + 2] = r[last + 2]!;
    r[o + 3] = r[last + 3]!;
    this.count--;
    const w = cand.w;
    const h = cand.h;
    const lw = rw - w;
    const lh = rh - h;
    let horizontal: boolean;
    switch (this.split) {
      case SPLIT_SHORTER_LEFTOVER:
        horizontal = lw <= lh;
        break;
      case SPLIT_LONGER_LEFTOVER:
        horizontal = lw > lh;
        break;
      case SPLIT_MIN_AREA:
        horizontal = w * lh > lw * h;
        break;
      case SPLIT_MAX_AREA:
        horizontal = w * lh <= lw * h;
        break;
      case SPLIT_HORIZONTAL:
        horizontal = true;
        break;
      default:
        horizontal = false;
        break;
    }
    // horizontal: the cut runs along the top edge of the part across the whole free rectangle.
    const rightW = lw;
    const rightH = horizontal ? h : rh;
    const topW = horizontal ? rw : w;
    const topH = lh;
    const m = this.minSide - EPS;
    if (rightW >= m && rightH >= m && rightW > EPS) this.push(rx + w, ry, rightW, rightH);
    if (topW >= m && topH >= m && topH > EPS) this.push(rx, ry + h, topW, topH);
    this.refreshMax();
  }
}

export function makeBin(guillotine: boolean, width: number, height: number, minSide: number, split: number): PackBin {
  return guillotine ? new GuillotineBin(width, height, minSide, split) : new MaxRectsBin(width, height, minSide);
}
