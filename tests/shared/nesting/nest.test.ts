import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { runBinpackingjs, runMaxrectsPacker } from '../../../bench/nest/npm-packers.js';
import { describe, expect, it } from 'vitest';
import { nest, parseNestJob } from '../../../shared/nesting/index.js';
import type { NestProgress } from '../../../shared/schemas/nest.schema.js';
import { job, nestChecked, placedCount } from './helpers.js';

// Panels of the demo bookshelf pair (shared/demo, PRODUCT.md §9) on 2440 × 1220 MDF; sheet size, a
// 3.2 mm kerf and 10 mm trim are common practice (REFERENCES.md §7).
const cabinet = {
  kerf: 3.2,
  timeLimitMs: 200,
  stock: [{ id: 'mdf18', kind: 'sheet', width: 2440, height: 1220, trim: 10, material: 'MDF', thickness: 18 }],
  parts: [
    { id: 'front', width: 220, height: 360, quantity: 2, material: 'MDF', thickness: 18 },
    { id: 'back', width: 220, height: 360, quantity: 2, material: 'MDF', thickness: 18 },
    { id: 'side', width: 224, height: 360, quantity: 4, material: 'MDF', thickness: 18 },
    { id: 'top', width: 184, height: 224, quantity: 6, material: 'MDF', thickness: 18 },
    { id: 'big', width: 1300, height: 700, quantity: 3, material: 'MDF', thickness: 18 },
  ],
};

describe('nest: layouts (each one checked by the independent validator)', () => {
  it.each(['free', 'guillotine'] as const)('%s mode places every part of a cabinet job', (mode) => {
    const l = nestChecked(job({ ...cabinet, mode }));
    expect(l.unplaced).toEqual([]);
    expect(placedCount(l)).toBe(17);
    // Three 1300 × 700 panels cannot share a sheet (each is over half the sheet both ways), so 3 is optimal.
    expect(l.stats.sheetsUsed).toBe(3);
    expect(l.stats.lowerBound).toBe(3);
  });

  it('guillotine mode lists numbered rip and cross cuts; free mode lists none', () => {
    const g = nestChecked(job({ ...cabinet, mode: 'guillotine' }));
    const cuts = g.sheets.flatMap((s) => s.cuts);
    expect(cuts.length).toBeGreaterThan(0);
    expect(new Set(cuts.map((c) => c.kind))).toEqual(new Set(['rip', 'cross']));
    for (const s of g.sheets) expect(s.cuts.map((c) => c.order)).toEqual(s.cuts.map((_, i) => i + 1));
    expect(nestChecked(job({ ...cabinet, mode: 'free' })).sheets.every((s) => s.cuts.length === 0)).toBe(true);
  });

  it.each(['free', 'guillotine'] as const)('%s mode: offcuts are at least the minimum size, inside the trim and clear of parts (by one kerf)', (mode) => {
    const j = job({ ...cabinet, mode, minOffcut: { width: 300, height: 300 } });
    const l = nestChecked(j);
    const all = l.sheets.flatMap((s) => (s.offcuts ?? []).map((o) => ({ o, s })));
    expect(all.length).toBeGreaterThan(0);
    for (const { o, s } of all) {
      expect(Math.min(o.width, o.height)).toBeGreaterThanOrEqual(300);
      expect(o.x).toBeGreaterThanOrEqual(10);
      expect(o.x + o.width).toBeLessThanOrEqual(s.width - 10 + 1e-6);
      for (const p of s.placements) {
        const apart = o.x >= p.x + p.width + 3.2 - 1e-6 || p.x >= o.x + o.width + 3.2 - 1e-6 || o.y >= p.y + p.height + 3.2 - 1e-6 || p.y >= o.y + o.height + 3.2 - 1e-6;
        expect(apart).toBe(true);
      }
    }
  });

  it('kerf exactly used up: four parts fill one sheet when each is (sheet − kerf) / 2', () => {
    // 2 × 1218.4 + 3.2 = 2440 and 2 × 608.4 + 3.2 = 1220 (arithmetic): no kerf needed at the edges.
    const l = nestChecked(job({ kerf: 3.2, mode: 'guillotine', timeLimitMs: 100, stock: [{ id: 's', kind: 'sheet', width: 2440, height: 1220 }], parts: [{ id: 'q', width: 1218.4, height: 608.4, quantity: 4 }] }));
    expect(l.stats.sheetsUsed).toBe(1);
    // With a part 0.1 mm larger they no longer fit four to a sheet.
    const l2 = nestChecked(job({ kerf: 3.2, mode: 'guillotine', timeLimitMs: 100, stock: [{ id: 's', kind: 'sheet', width: 2440, height: 1220 }], parts: [{ id: 'q', width: 1218.5, height: 608.4, quantity: 4, canRotate: false }] }));
    expect(l2.stats.sheetsUsed).toBe(2);
  });

  it('grain: grained parts on grained stock are turned to follow the sheet length, never across it', () => {
    const j = job({
      ...cabinet,
      mode: 'guillotine',
      stock: [{ ...cabinet.stock[0], grain: 'length' }],
      // (1300 × 700 turned would need 1300 mm across a 1200 mm trimmed width: left out here.)
      parts: cabinet.parts.filter((p) => p.id !== 'big').map((p) => ({ ...p, grain: 'height' })),
    });
    const l = nestChecked(j);
    // The sheet's length runs along x (2440 > 1220), so every part's height must lie along x.
    for (const p of l.sheets.flatMap((s) => s.placements)) expect(p.rotated).toBe(true);
    expect(l.unplaced).toEqual([]);
  });

  it('grain: a grained part too long to lie along the sheet length is unplaced, not turned across the grain', () => {
    const l = nestChecked(job({ ...cabinet, stock: [{ ...cabinet.stock[0], grain: 'length' }], parts: [{ id: 'big', width: 1300, height: 700, grain: 'height', material: 'MDF', thickness: 18 }] }));
    expect(l.unplaced).toEqual([{ partId: 'big', quantity: 1, reason: 'fits only turned against its grain or canRotate' }]);
  });

  it('grain with canRotate false that would need a turn: the part is unplaced with a reason', () => {
    const l = nestChecked(job({ ...cabinet, stock: [{ ...cabinet.stock[0], grain: 'length' }], parts: [{ id: 'x', width: 200, height: 300, grain: 'height', canRotate: false, material: 'MDF', thickness: 18 }] }));
    expect(l.unplaced).toEqual([{ partId: 'x', quantity: 1, reason: expect.stringMatching(/grain/) }]);
  });

  it('remnants are used before new sheets', () => {
    const l = nestChecked(
      job({
        kerf: 3,
        mode: 'free',
        timeLimitMs: 100,
        stock: [
          { id: 'sheet', kind: 'sheet', width: 2440, height: 1220 },
          { id: 'rem', kind: 'remnant', width: 800, height: 600, quantity: 1 },
        ],
        parts: [{ id: 'p', width: 300, height: 250, quantity: 4 }],
      }),
    );
    expect(l.sheets.map((s) => s.stockId)).toEqual(['rem']);
  });

  it('with a remnant, parts too big for it still count toward the new sheets that must be bought', () => {
    // A 1300 × 700 part is longer than half a 2440 × 1220 sheet (1300 > 1220) and wider than half of it
    // (700 > 610), so no two share a sheet: the big-item count (Martello & Vigo 1998, REFERENCES §10) is 3.
    // None fits the 800 × 600 remnant, so the remnant cannot stand in for one of those sheets.
    const l = nestChecked(
      job({
        kerf: 0,
        mode: 'free',
        timeLimitMs: 100,
        stock: [
          { id: 'sheet', kind: 'sheet', width: 2440, height: 1220 },
          { id: 'rem', kind: 'remnant', width: 800, height: 600, quantity: 1 },
        ],
        parts: [{ id: 'big', width: 1300, height: 700, quantity: 3, canRotate: false }, { id: 'small', width: 300, height: 250, quantity: 2 }],
      }),
    );
    expect(l.stats.lowerBound).toBe(3);
    expect(l.sheets.filter((s) => s.kind !== 'remnant')).toHaveLength(3);
  });

  it('limited stock: quantities are respected and what does not fit is reported unplaced', () => {
    const l = nestChecked(job({ kerf: 0, mode: 'free', timeLimitMs: 100, stock: [{ id: 's', kind: 'sheet', width: 1000, height: 1000, quantity: 1 }], parts: [{ id: 'p', width: 600, height: 600, quantity: 3 }] }));
    expect(l.stats.sheetsUsed).toBe(1);
    expect(l.unplaced).toEqual([{ partId: 'p', quantity: 2, reason: 'not enough stock' }]);
  });

  it('several sheet sizes: the cost objective picks the cheaper way', () => {
    const stock = [
      { id: 'large', kind: 'sheet', width: 2440, height: 1220, cost: 60 },
      { id: 'small', kind: 'sheet', width: 1220, height: 1220, cost: 20 },
    ];
    const parts = [{ id: 'p', width: 500, height: 500, quantity: 4 }];
    const byCost = nestChecked(job({ kerf: 0, mode: 'free', timeLimitMs: 200, objective: 'cost', stock, parts }));
    expect(byCost.sheets.map((s) => s.stockId)).toEqual(['small']);
    expect(byCost.stats.cost).toBe(20);
  });

  it('parts only go on stock of their own material and thickness; others are unplaced with a reason', () => {
    const l = nestChecked(
      job({
        kerf: 3,
        mode: 'free',
        timeLimitMs: 100,
        stock: [
          { id: 'mdf18', kind: 'sheet', width: 2440, height: 1220, material: 'MDF', thickness: 18 },
          { id: 'mdf25', kind: 'sheet', width: 2440, height: 1220, material: 'MDF', thickness: 25 },
        ],
        parts: [
          { id: 'side', width: 300, height: 400, quantity: 2, material: 'MDF', thickness: 18 },
          { id: 'baffle', width: 300, height: 400, material: 'MDF', thickness: 25 },
          { id: 'ply', width: 300, height: 400, material: 'plywood', thickness: 18 },
        ],
      }),
    );
    const on = (id: string) => l.sheets.filter((s) => s.placements.some((p) => p.partId === id)).map((s) => s.stockId);
    expect(on('side')).toEqual(['mdf18']);
    expect(on('baffle')).toEqual(['mdf25']);
    expect(l.unplaced).toEqual([{ partId: 'ply', quantity: 1, reason: 'no stock of this material and thickness' }]);
  });

  it('a part larger than every sheet (after trim) is unplaced with a reason', () => {
    const l = nestChecked(job({ kerf: 3, timeLimitMs: 50, stock: [{ id: 's', kind: 'sheet', width: 2440, height: 1220, trim: 10 }], parts: [{ id: 'huge', width: 2430, height: 500 }] }));
    expect(l.unplaced[0]).toMatchObject({ partId: 'huge', quantity: 1 });
    expect(l.unplaced[0]!.reason).toMatch(/larger than every usable stock/);
  });

  it('roll: lining pieces on a 1200 mm roll use at least the continuous bound of length', () => {
    const parts = [
      { id: 'back', width: 189, height: 193, quantity: 4 },
      { id: 'side', width: 179, height: 193, quantity: 8 },
      { id: 'top', width: 89, height: 179, quantity: 8 },
    ];
    const l = nestChecked(job({ kerf: 0, mode: 'free', timeLimitMs: 200, stock: [{ id: 'batt', kind: 'roll', width: 1200, cost: 6 }], parts }));
    const area = parts.reduce((a, p) => a + p.width * p.height * p.quantity, 0);
    expect(l.sheets).toHaveLength(1);
    expect(l.stats.rollLengthUsed).toBeGreaterThanOrEqual(area / 1200);
    expect(l.sheets[0]!.height).toBe(l.stats.rollLengthUsed);
    expect(l.stats.cost).toBeCloseTo((6 * l.stats.rollLengthUsed!) / 1000, 2);
  });

  it('a roll with a length and quantity is cut into pieces when one length is not enough', () => {
    const l = nestChecked(job({ kerf: 0, mode: 'guillotine', timeLimitMs: 100, stock: [{ id: 'r', kind: 'roll', width: 1000, length: 1000, quantity: 3 }], parts: [{ id: 'p', width: 1000, height: 600, quantity: 3, canRotate: false }] }));
    expect(l.sheets).toHaveLength(3);
    expect(l.unplaced).toEqual([]);
  });
});

describe('nest: determinism, progress, cancellation and the time limit', () => {
  it('the same job and seed give the same layout', () => {
    const j = job({ ...cabinet, mode: 'guillotine', seed: 42 });
    expect(JSON.stringify(nestChecked(j))).toBe(JSON.stringify(nestChecked(j)));
  });

  it('a clock that does not cut the search changes nothing: the work budget decides (two material groups)', () => {
    const j = job({
      ...cabinet,
      mode: 'guillotine',
      stock: [...cabinet.stock, { id: 'mdf25', kind: 'sheet', width: 2440, height: 1220, trim: 10, material: 'MDF', thickness: 25 }],
      parts: [...cabinet.parts, { id: 'baffle', width: 220, height: 360, quantity: 6, material: 'MDF', thickness: 25 }],
    });
    expect(JSON.stringify(nestChecked(j, { now: () => 0 }))).toBe(JSON.stringify(nestChecked(j)));
  });

  it('reports progress from 0 to 1 and finishes with fraction 1', () => {
    const seen: NestProgress[] = [];
    nestChecked(job({ ...cabinet, mode: 'free', parts: [...cabinet.parts, { id: 'x', width: 500, height: 450, quantity: 5, material: 'MDF', thickness: 18 }] }), { onProgress: (p) => seen.push(p) });
    expect(seen.length).toBeGreaterThan(0);
    for (const p of seen) expect(p.fraction).toBeGreaterThanOrEqual(0);
    for (const p of seen) expect(p.fraction).toBeLessThanOrEqual(1);
    expect(seen.at(-1)).toMatchObject({ fraction: 1, message: 'done' });
  });

  it('stops when asked (shouldStop) and still returns a complete, valid layout', () => {
    const l = nestChecked(job({ ...cabinet, timeLimitMs: 60_000 }), { shouldStop: () => true });
    expect(l.unplaced).toEqual([]);
  });

  it('stops at the time limit of the injected clock', () => {
    // A fake clock that advances 1 ms each time it is read: the search must end by the limit
    // (plus the final layout work, a few reads).
    let t = 0;
    const l = nestChecked(job({ ...cabinet, timeLimitMs: 50, parts: [...cabinet.parts, { id: 'x', width: 333, height: 222, quantity: 30, material: 'MDF', thickness: 18 }] }), { now: () => t++ });
    expect(l.stats.elapsedMs).toBeLessThanOrEqual(60);
  });
});

// Published instances (fixture: copied from ../shared/benchmarks, sources in the file).
const published = JSON.parse(readFileSync(fileURLToPath(new URL('../../fixtures/nesting/published-instances.json', import.meta.url)), 'utf8')) as {
  bins: { name: string; W: number; H: number; items: [number, number][] }[];
  strips: { name: string; W: number; optimalHeight: number; items: [number, number][] }[];
};

describe('nest on published benchmark instances', () => {
  for (const inst of published.bins) {
    it(`${inst.name} (2BP, no turning): at or above our lower bound and never more bins than maxrects-packer or binpackingjs`, () => {
      const l = nestChecked(
        job({ kerf: 0, mode: 'free', timeLimitMs: 300, stock: [{ id: 'bin', kind: 'sheet', width: inst.W, height: inst.H }], parts: inst.items.map(([w, h], i) => ({ id: `p${i}`, width: w, height: h, canRotate: false })) }),
      );
      // General-purpose npm packers (maxrects-packer, binpackingjs) as the outside reference.
      const simple = { W: inst.W, H: inst.H, kerf: 0, trim: 0, items: inst.items.map(([w, h]) => ({ w, h, turn: false })) };
      const mr = runMaxrectsPacker(simple);
      const bp = runBinpackingjs(simple);
      expect(mr.unplaced + bp.unplaced).toBe(0);
      expect(l.stats.sheetsUsed).toBeGreaterThanOrEqual(l.stats.lowerBound!);
      expect(l.stats.sheetsUsed).toBeLessThanOrEqual(mr.bins);
      expect(l.stats.sheetsUsed).toBeLessThanOrEqual(bp.bins);
    });
  }

  for (const inst of published.strips) {
    it(`${inst.name} (strip, turning allowed): within 5 % of the published optimum ${inst.optimalHeight}`, () => {
      const l = nestChecked(job({ kerf: 0, mode: 'free', timeLimitMs: 300, stock: [{ id: 'roll', kind: 'roll', width: inst.W }], parts: inst.items.map(([w, h], i) => ({ id: `p${i}`, width: w, height: h })) }));
      expect(l.stats.rollLengthUsed).toBeGreaterThanOrEqual(inst.optimalHeight);
      expect(l.stats.rollLengthUsed).toBeLessThanOrEqual(1.05 * inst.optimalHeight);
    });
  }
});

describe('parseNestJob: clear errors naming the field', () => {
  const ok = { stock: [{ id: 's', kind: 'sheet', width: 100, height: 100 }], parts: [{ id: 'p', width: 10, height: 10 }] };
  it.each([
    ['kerf', { ...ok, kerf: -1 }, /kerf must be 0 or more/],
    ['mode', { ...ok, mode: 'laser' }, /mode must be guillotine or free/],
    ['stock[0].height', { ...ok, stock: [{ id: 's', kind: 'sheet', width: 100 }] }, /needs a height/],
    ['parts[0].width', { ...ok, parts: [{ id: 'p', width: 0, height: 10 }] }, /greater than 0/],
    ['parts[0].quantity', { ...ok, parts: [{ id: 'p', width: 10, height: 10, quantity: 0 }] }, /at least 1/],
    ['stock', { ...ok, stock: [] }, /at least one stock item/],
    ['parts', { stock: ok.stock }, /parts is required/],
    ['stock[0].trim', { ...ok, stock: [{ id: 's', kind: 'sheet', width: 100, height: 100, trim: 50 }] }, /no usable width/],
    ['parts[1].id', { ...ok, parts: [ok.parts[0], ok.parts[0]] }, /used twice/],
  ])('%s', (field, input, message) => {
    const r = parseNestJob(input);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.fields[field]).toMatch(message);
      expect(r.message).toContain(field);
    }
  });

  it('nest never throws for a valid job with nothing that fits', () => {
    const j = job({ ...ok, parts: [{ id: 'p', width: 1000, height: 1000 }] });
    expect(() => nest(j)).not.toThrow();
  });
});

describe('nest: several stock sizes', () => {
  it('a sheet that would be mostly empty moves to a smaller size in stock, and remnants are used up', () => {
    // Four 1100 × 600 panels fill a 2440 × 1220 sheet two by two; the fifth fits a 1220 × 1220 sheet,
    // and the small parts a remnant (used before new sheets).
    const l = nestChecked(
      job({
        kerf: 3,
        mode: 'guillotine',
        timeLimitMs: 300,
        stock: [
          { id: 'big', kind: 'sheet', width: 2440, height: 1220 },
          { id: 'half', kind: 'sheet', width: 1220, height: 1220 },
          { id: 'rem', kind: 'remnant', width: 700, height: 500, quantity: 1 },
        ],
        parts: [
          { id: 'a', width: 1100, height: 600, quantity: 5 },
          { id: 'b', width: 300, height: 200, quantity: 3 },
        ],
      }),
    );
    expect(l.sheets.map((s) => s.stockId).sort()).toEqual(['big', 'half', 'rem']);
  });
});
