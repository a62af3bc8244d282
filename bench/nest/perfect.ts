/**
 * Perfect packings of our own: each of `sheets` sheets is cut into pieces by random guillotine cuts
 * (no kerf), so the pieces fill the sheets exactly and the optimum is known: `sheets` bins (the
 * continuous bound), or a roll length of sheets × H when the sheets are stacked on a roll of width W.
 */
import { mulberry32, randomInt } from '../../shared/nesting/rng.js';
import type { RectInstance } from './loaders.js';

export interface PerfectInstance extends RectInstance {
  sheets: number;
  turn: boolean;
}

export function perfectInstance(seed: number, sheets: number, piecesPerSheet: number, W: number, H: number, turn: boolean): PerfectInstance {
  const rng = mulberry32(seed);
  const items: { w: number; h: number }[] = [];
  const minSide = Math.max(1, Math.round(Math.min(W, H) / 20));
  for (let s = 0; s < sheets; s++) {
    let pieces: { w: number; h: number }[] = [{ w: W, h: H }];
    let guard = 0;
    while (pieces.length < piecesPerSheet && guard++ < 10_000) {
      // Cut the largest piece across its longer side at 20–80 % (integer sizes).
      pieces.sort((a, b) => b.w * b.h - a.w * a.h);
      const p = pieces[0]!;
      const alongW = p.w > p.h ? true : p.w < p.h ? false : rng() < 0.5;
      const side = alongW ? p.w : p.h;
      if (side < 2 * minSide) break;
      const lo = Math.max(minSide, Math.ceil(side * 0.2));
      const hi = Math.min(side - minSide, Math.floor(side * 0.8));
      const at = lo + randomInt(rng, Math.max(1, hi - lo + 1));
      pieces = pieces.slice(1);
      if (alongW) pieces.push({ w: at, h: p.h }, { w: p.w - at, h: p.h });
      else pieces.push({ w: p.w, h: at }, { w: p.w, h: p.h - at });
    }
    items.push(...pieces);
  }
  return { name: `perfect-${sheets}x${piecesPerSheet}${turn ? '-turn' : ''}-s${seed}`, W, H, items, sheets, turn };
}

/** The bench's set: 1–6 sheets of 2440 × 1220, 6–40 pieces each, with and without turning. */
export function perfectSet(): PerfectInstance[] {
  const out: PerfectInstance[] = [];
  let seed = 100;
  for (const sheets of [1, 2, 3, 4, 6]) {
    for (const pieces of [6, 12, 20, 40]) {
      out.push(perfectInstance(seed++, sheets, pieces, 2440, 1220, false));
      out.push(perfectInstance(seed++, sheets, pieces, 2440, 1220, true));
    }
  }
  return out;
}
