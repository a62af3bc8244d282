/**
 * The two general-purpose npm packers the engine is measured against, run with their documented
 * defaults (maxrects-packer: MAX_EDGE ordering, smart sizing, no power-of-two/square bins;
 * binpackingjs: BestShortSideFit). Kerf is given the way each package supports it: maxrects-packer's
 * `padding` (space between rectangles, none at the border); for binpackingjs, every box and the bin
 * grow by one kerf (the same trick our engine uses). Trim shrinks the bin.
 */
import { MaxRectsPacker, Rectangle as MaxRectsRectangle } from 'maxrects-packer/dist/maxrects-packer.mjs';
import { pack2D, type Box2D } from 'binpackingjs/2d';


export interface SimpleItem {
  w: number;
  h: number;
  /** May be turned 90°. */
  turn: boolean;
}

export interface SimpleJob {
  /** Sheet (or roll) size before trim; H = Infinity for an open strip. */
  W: number;
  H: number;
  kerf: number;
  trim: number;
  items: SimpleItem[];
}

export interface NpmResult {
  bins: number;
  /** Strip: length used (including trim at both ends). */
  length?: number;
  /** Parts the packer could not place. */
  unplaced: number;
  ms: number;
}

/** Items that fit the trimmed sheet in an allowed orientation; the rest count as unplaced. */
function fitting(job: SimpleJob): { items: SimpleItem[]; tooBig: number } {
  const W = job.W - 2 * job.trim;
  const H = job.H - 2 * job.trim;
  const items = job.items.filter((it) => (it.w <= W && it.h <= H) || (it.turn && it.h <= W && it.w <= H));
  return { items, tooBig: job.items.length - items.length };
}

function stripHeight(job: SimpleJob): number {
  let h = 0;
  for (const it of job.items) h += Math.max(it.w, it.h) + job.kerf;
  return h;
}

export function runMaxrectsPacker(input: SimpleJob): NpmResult {
  const t = performance.now();
  const { items, tooBig } = fitting(input);
  const job = { ...input, items };
  const strip = job.H === Infinity;
  const W = job.W - 2 * job.trim;
  const H = strip ? stripHeight(job) : job.H - 2 * job.trim;
  const packer = new MaxRectsPacker(W, H, job.kerf, {
    smart: true,
    pot: false,
    square: false,
    allowRotation: job.items.some((i) => i.turn),
    border: 0,
  });
  packer.addArray(job.items.map((it) => new MaxRectsRectangle(it.w, it.h, 0, 0, false, it.turn)));
  let unplaced = tooBig;
  let length = 0;
  const bins = packer.bins.filter((b) => {
    const over = b.rects.some((r) => r.oversized);
    if (over) unplaced += b.rects.length;
    return !over;
  });
  if (strip) for (const b of bins) for (const r of b.rects) length = Math.max(length, r.y + r.height);
  return { bins: bins.length, unplaced, ms: performance.now() - t, ...(strip ? { length: length + 2 * job.trim } : {}) };
}

export function runBinpackingjs(input: SimpleJob): NpmResult {
  const t = performance.now();
  const { items, tooBig: oversized } = fitting(input);
  const job = { ...input, items };
  const strip = job.H === Infinity;
  const k = job.kerf;
  const W = job.W - 2 * job.trim + k;
  const H = strip ? stripHeight(job) + k : job.H - 2 * job.trim + k;
  const boxes: Box2D[] = job.items.map((it) => ({ width: it.w + k, height: it.h + k, constrainRotation: !it.turn }));
  // Empty bins are identical, so offering more bins than needed does not change its choices.
  let offered = strip ? 1 : Math.min(job.items.length, 8);
  for (;;) {
    const r = pack2D({ bins: Array.from({ length: offered }, () => ({ width: W, height: H })), boxes });
    const used = r.packedBins.filter((b) => b.boxes.length > 0);
    const tooBig = r.unpackedBoxes.filter((b) => !((b.width <= W && b.height <= H) || (!b.constrainRotation && b.height <= W && b.width <= H))).length;
    if (r.unpackedBoxes.length > tooBig && offered < job.items.length) {
      offered = Math.min(job.items.length, offered * 2);
      continue;
    }
    let length = 0;
    if (strip) for (const b of used) for (const x of b.boxes) length = Math.max(length, x.y + x.height - k);
    return { bins: used.length, unplaced: oversized + r.unpackedBoxes.length, ms: performance.now() - t, ...(strip ? { length: length + 2 * job.trim } : {}) };
  }
}
