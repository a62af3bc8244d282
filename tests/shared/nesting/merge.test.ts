import { describe, expect, it } from 'vitest';
import { perfectInstance } from '../../../bench/nest/perfect.js';
import { mergeItems } from '../../../shared/nesting/merge.js';
import { prepareJob } from '../../../shared/nesting/problem.js';
import { mulberry32 } from '../../../shared/nesting/rng.js';
import { job, nestChecked, placedCount } from './helpers.js';

// Perfect packings: one 2440 × 1220 sheet cut into pieces by random guillotine cuts, so the pieces
// fill exactly one sheet and the optimum (1 sheet) is known by construction (bench/nest/perfect.ts).
// Each part is made one kerf smaller: grown by the kerf again (DEVELOPERS.md, kerf rule) the pieces
// tile the sheet with every pair of neighbours one kerf apart.
const perfectJob = (seed: number, pieces: number, turn: boolean, mode: 'free' | 'guillotine', kerf: number) => {
  const inst = perfectInstance(seed, 1, pieces, 2440, 1220, turn);
  return job({
    kerf,
    mode,
    seed: 1,
    timeLimitMs: 2000,
    stock: [{ id: 'sheet', kind: 'sheet', width: 2440, height: 1220 }],
    parts: inst.items.map((it, k) => ({ id: `p${k}`, width: it.w - kerf, height: it.h - kerf, canRotate: turn })),
  });
};

describe('nest: super-items (parts joined along a common side)', () => {
  it.each([
    [104, 20, false, 'free', 0],
    [105, 20, true, 'guillotine', 0],
    [104, 20, false, 'guillotine', 3.2],
  ] as const)('fills one sheet exactly with the pieces cut from it (seed %i, %i pieces, turn %s, %s, kerf %f)', (seed, pieces, turn, mode, kerf) => {
    const j = perfectJob(seed, pieces, turn, mode, kerf);
    const l = nestChecked(j);
    expect(l.unplaced).toEqual([]);
    expect(placedCount(l)).toBe(j.parts.length);
    expect(l.stats.sheetsUsed).toBe(1);
  });

  it('gives the same layout for the same job and seed (work budget, no clock)', () => {
    const j = perfectJob(105, 20, true, 'free', 0);
    expect(JSON.stringify(nestChecked(j))).toBe(JSON.stringify(nestChecked(j)));
  });

  it('joins only parts with a common side into a rectangle of their total area that fits the stock', () => {
    const j = perfectJob(106, 40, false, 'free', 0);
    const pr = prepareJob(j).problems[0]!;
    const m = mergeItems(pr, mulberry32(7), 1)!;
    expect(m.pr.items.length).toBeLessThan(pr.items.length);
    expect(m.members.flat().map((x) => x.item).sort((a, b) => a - b)).toEqual(pr.items.map((_, i) => i));
    m.pr.items.forEach((s, k) => {
      const members = m.members[k]!;
      expect(s.area).toBeCloseTo(members.reduce((a, x) => a + pr.items[x.item]!.area, 0), 6);
      for (const x of members) {
        const it = pr.items[x.item]!;
        expect(x.dx + it.w).toBeLessThanOrEqual(s.w + 1e-7);
        expect(x.dy + it.h).toBeLessThanOrEqual(s.h + 1e-7);
      }
      expect(s.w <= pr.types[0]!.W + 1e-7 && s.h <= pr.types[0]!.H + 1e-7).toBe(true);
    });
  });
});
