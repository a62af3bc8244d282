import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { binLowerBounds } from '../../../shared/nesting/index.js';
import { job, nestChecked } from './helpers.js';

// Worked cases binlb-1..3 of ../shared/reference-check-cases.json, copied into the fixture with
// their source: S. Martello & D. Vigo, Management Science 44(3):388–399, 1998 (L0, L1, L2, L3).
const fixture = JSON.parse(readFileSync(fileURLToPath(new URL('../../fixtures/nesting/binlb-cases.json', import.meta.url)), 'utf8')) as {
  cases: { id: string; inputs: { bin_W: number; bin_H: number; items_wxh: [number, number][] }; expected: Record<string, number> }[];
};

describe('lower bounds (Martello & Vigo 1998, REFERENCES.md §10)', () => {
  for (const c of fixture.cases) {
    it(`${c.id}: L0, L1, L2, L3 match the worked case`, () => {
      const b = binLowerBounds(c.inputs.bin_W, c.inputs.bin_H, c.inputs.items_wxh.map(([w, h]) => ({ w, h, turn: false })));
      expect(b.L0).toBe(c.expected.L0);
      expect(b.L1).toBe(c.expected.L1);
      expect(b.L2).toBe(c.expected.L2);
      expect(b.L3).toBe(c.expected.L3);
      expect(b.best).toBe(c.expected.optimum_by_inspection);
    });

    it(`${c.id}: the engine reaches the optimum found by inspection, never below the bounds`, () => {
      const j = job({
        kerf: 0,
        mode: 'free',
        timeLimitMs: 200,
        stock: [{ id: 'bin', kind: 'sheet', width: c.inputs.bin_W, height: c.inputs.bin_H }],
        parts: c.inputs.items_wxh.map(([w, h], i) => ({ id: `p${i}`, width: w, height: h, canRotate: false })),
      });
      const layout = nestChecked(j);
      expect(layout.stats.sheetsUsed).toBe(c.expected.optimum_by_inspection);
      expect(layout.stats.lowerBound).toBe(c.expected.optimum_by_inspection);
    });
  }

  it('L0 is the continuous bound ⌈Σ w·h / (W·H)⌉ (REFERENCES.md §10)', () => {
    // 7 × (5 × 5) = 175 in 10 × 10 bins → ⌈1.75⌉ = 2.
    expect(binLowerBounds(10, 10, Array.from({ length: 7 }, () => ({ w: 5, h: 5, turn: false }))).L0).toBe(2);
  });

  it('when parts may turn, the bound stays at or below what the engine packs (random small jobs)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ w: fc.integer({ min: 1, max: 10 }), h: fc.integer({ min: 1, max: 10 }), turn: fc.boolean() }), { minLength: 1, maxLength: 12 }),
        (items) => {
          const b = binLowerBounds(10, 10, items);
          const j = job({
            kerf: 0,
            mode: 'free',
            timeLimitMs: 20,
            stock: [{ id: 'bin', kind: 'sheet', width: 10, height: 10 }],
            parts: items.map((it, i) => ({ id: `p${i}`, width: it.w, height: it.h, canRotate: it.turn })),
          });
          const layout = nestChecked(j);
          expect(b.best).toBeLessThanOrEqual(layout.stats.sheetsUsed);
        },
      ),
      { numRuns: 40, seed: 7 },
    );
  });

  it('a turnable part wider than half the sheet only one way is not counted as "wide" (bound stays valid)', () => {
    // Two 6 × 4 parts on 10 × 10: turned, each is 4 wide, so they can sit side by side: one bin.
    const turn = binLowerBounds(10, 10, [{ w: 6, h: 4, turn: true }, { w: 6, h: 4, turn: true }]);
    expect(turn.best).toBe(1);
    // 6 × 6 cannot share a 10 × 10 bin in any orientation: the big-item count is 2.
    expect(binLowerBounds(10, 10, [{ w: 6, h: 6, turn: true }, { w: 6, h: 6, turn: true }]).big).toBe(2);
  });

  it('grid-point count: five 4 × 4 squares, turnable, need two 10 × 10 bins although their area fits one', () => {
    // Five unit squares need a square of side 2 + 1/√2 ≈ 2.707 even when turned freely (Göbel 1979, in
    // E. Friedman, "Packing Unit Squares in Squares", Electronic J. Combinatorics DS7; from memory), and
    // 10 / 4 = 2.5 < 2.707, so one bin cannot hold them. L0 = ⌈80 / 100⌉ = 1; the count is
    // ⌈5 / (⌊10/4⌋·⌊10/4⌋)⌉ = ⌈5 / 4⌉ = 2.
    const items = Array.from({ length: 5 }, () => ({ w: 4, h: 4, turn: true }));
    const b = binLowerBounds(10, 10, items);
    expect(b.L0).toBe(1);
    expect(b.count).toBe(2);
    expect(b.best).toBe(2);
    // Four fit (a 2 × 2 grid): the count gives 1 there, so it does not overstate.
    expect(binLowerBounds(10, 10, items.slice(0, 4)).count).toBe(1);
    // Turning does not help an item past the bound: its shorter side counts (4 × 9 items: ⌊10/4⌋² = 4 per bin).
    expect(binLowerBounds(10, 10, Array.from({ length: 5 }, () => ({ w: 9, h: 4, turn: true }))).count).toBe(2);
  });

  it('grid-point count stays at or below what the engine packs (random jobs of large parts, kerf)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ w: fc.integer({ min: 20, max: 60 }), h: fc.integer({ min: 20, max: 60 }), turn: fc.boolean() }), { minLength: 1, maxLength: 14 }),
        (items) => {
          const j = job({
            kerf: 2,
            mode: 'free',
            timeLimitMs: 20,
            stock: [{ id: 'bin', kind: 'sheet', width: 120, height: 90 }],
            parts: items.map((it, i) => ({ id: `p${i}`, width: it.w, height: it.h, canRotate: it.turn })),
          });
          const layout = nestChecked(j);
          expect(layout.stats.lowerBound).toBeLessThanOrEqual(layout.stats.sheetsUsed);
          // The same bound computed here on kerf-grown sizes (bins.ts: usable = size + kerf).
          const grown = items.map((it) => ({ w: it.w + 2, h: it.h + 2, turn: it.turn }));
          expect(binLowerBounds(122, 92, grown).count).toBeLessThanOrEqual(layout.stats.sheetsUsed);
        },
      ),
      { numRuns: 40, seed: 11 },
    );
  });
});
