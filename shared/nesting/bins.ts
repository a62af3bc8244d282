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
}

function better(s1: number, s2: number, cand: Candidate): boolean {
  return s1 < cand.s1 - EPS || (s1 <= cand.s1 + EPS && s2 < cand.s2 - EPS);
}

function overlapLength(a0: number, a1: number, b0: number, b1: number): number {
  const lo = a0 > b0 ? a0 : b0;
  const hi = a1 < b1 ? a1 : b1;
  return hi > lo ? hi - lo : 0;
}

abstract class BaseBin implements PackBin {
  usedArea = 0;
  readonly placements: Placed[] = [];
  protected fx: number[] = [];
  protected fy: number[] = [];
  protected fw: number[] = [];
  protected fh: number[] = [];
  protected top = 0;

  constructor(
    readonly width: number,
    readonly height: number,
    /** Free rectangles narrower than this in either side can never hold a part and are dropped. */
    protected readonly minSide: number,
  ) {
    this.fx.push(0);
    this.fy.push(0);
    this.fw.push(width);
    this.fh.push(height);
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
    const { fx, fy, fw, fh } = this;
    const n = fx.length;
    work.n += n;
    for (let i = 0; i < n; i++) {
      const rw = fw[i]!;
      const rh = fh[i]!;
      if (w > rw + EPS || h > rh + EPS) continue;
      const x = fx[i]!;
      const y = fy[i]!;
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
      if (better(s1, s2, cand)) {
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
    for (let i = 0; i < this.fx.length; i++) out.push([this.fx[i]!, this.fy[i]!, this.fw[i]!, this.fh[i]!]);
    return out;
  }

  topY(): number {
    return this.top;
  }
}

/** Maximal-rectangles free space: every part sits at a corner of a maximal free rectangle. */
export class MaxRectsBin extends BaseBin {
  private nx: number[] = [];
  private ny: number[] = [];
  private nw: number[] = [];
  private nh: number[] = [];

  place(cand: Candidate, item: number): void {
    this.record(cand, item);
    const x = cand.x;
    const y = cand.y;
    const x2 = x + cand.w;
    const y2 = y + cand.h;
    const { fx, fy, fw, fh, nx, ny, nw, nh, minSide } = this;
    nx.length = 0;
    ny.length = 0;
    nw.length = 0;
    nh.length = 0;
    let keep = 0;
    const n = fx.length;
    for (let i = 0; i < n; i++) {
      const rx = fx[i]!;
      const ry = fy[i]!;
      const rw = fw[i]!;
      const rh = fh[i]!;
      const rx2 = rx + rw;
      const ry2 = ry + rh;
      if (x >= rx2 - EPS || x2 <= rx + EPS || y >= ry2 - EPS || y2 <= ry + EPS) {
        fx[keep] = rx;
        fy[keep] = ry;
        fw[keep] = rw;
        fh[keep] = rh;
        keep++;
        continue;
      }
      if (x > rx + EPS && x - rx >= minSide - EPS && rh >= minSide - EPS) {
        nx.push(rx); ny.push(ry); nw.push(x - rx); nh.push(rh);
      }
      if (x2 < rx2 - EPS && rx2 - x2 >= minSide - EPS && rh >= minSide - EPS) {
        nx.push(x2); ny.push(ry); nw.push(rx2 - x2); nh.push(rh);
      }
      if (y > ry + EPS && y - ry >= minSide - EPS && rw >= minSide - EPS) {
        nx.push(rx); ny.push(ry); nw.push(rw); nh.push(y - ry);
      }
      if (y2 < ry2 - EPS && ry2 - y2 >= minSide - EPS && rw >= minSide - EPS) {
        nx.push(rx); ny.push(y2); nw.push(rw); nh.push(ry2 - y2);
      }
    }
    fx.length = keep;
    fy.length = keep;
    fw.length = keep;
    fh.length = keep;
    // Keep a new rectangle only if no other rectangle contains it. Old rectangles were maximal, so
    // none of them can lie inside a new one (a new one lies inside a removed old one).
    const m = nx.length;
    for (let i = 0; i < m; i++) {
      const ax = nx[i]!;
      const ay = ny[i]!;
      const ax2 = ax + nw[i]!;
      const ay2 = ay + nh[i]!;
      let contained = false;
      for (let j = 0; j < keep; j++) {
        if (ax >= fx[j]! - EPS && ay >= fy[j]! - EPS && ax2 <= fx[j]! + fw[j]! + EPS && ay2 <= fy[j]! + fh[j]! + EPS) {
          contained = true;
          break;
        }
      }
      if (!contained) {
        for (let j = 0; j < m; j++) {
          if (j === i || nw[j]! < 0) continue;
          const bx = nx[j]!;
          const by = ny[j]!;
          const bx2 = bx + nw[j]!;
          const by2 = by + nh[j]!;
          if (ax >= bx - EPS && ay >= by - EPS && ax2 <= bx2 + EPS && ay2 <= by2 + EPS) {
            // Equal rectangles: keep the later one only.
            const equal = ax <= bx + EPS && ay <= by + EPS && ax2 >= bx2 - EPS && ay2 >= by2 - EPS;
            if (!equal || j > i) {
              contained = true;
              break;
            }
          }
        }
      }
      if (contained) nw[i] = -1;
    }
    for (let i = 0; i < m; i++) {
      if (nw[i]! < 0) continue;
      fx.push(nx[i]!);
      fy.push(ny[i]!);
      fw.push(nw[i]!);
      fh.push(nh[i]!);
    }
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
    const { fx, fy, fw, fh } = this;
    const rx = fx[i]!;
    const ry = fy[i]!;
    const rw = fw[i]!;
    const rh = fh[i]!;
    const last = fx.length - 1;
    fx[i] = fx[last]!;
    fy[i] = fy[last]!;
    fw[i] = fw[last]!;
    fh[i] = fh[last]!;
    fx.length = last;
    fy.length = last;
    fw.length = last;
    fh.length = last;
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
    if (rightW >= m && rightH >= m && rightW > EPS) {
      fx.push(rx + w); fy.push(ry); fw.push(rightW); fh.push(rightH);
    }
    if (topW >= m && topH >= m && topH > EPS) {
      fx.push(rx); fy.push(ry + h); fw.push(topW); fh.push(topH);
    }
  }
}

export function makeBin(guillotine: boolean, width: number, height: number, minSide: number, split: number): PackBin {
  return guillotine ? new GuillotineBin(width, height, minSide, split) : new MaxRectsBin(width, height, minSide);
}
