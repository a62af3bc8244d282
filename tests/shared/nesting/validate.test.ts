import { describe, expect, it } from 'vitest';
import { validateLayout } from '../../../shared/nesting/index.js';
import type { Layout, LayoutSheet, Placement } from '../../../shared/schemas/nest.schema.js';
import { job } from './helpers.js';

// The validator is the tests' independent referee: it shares no code with the engine. These cases
// check that it catches each kind of broken layout, built by hand.

const base = {
  kerf: 4,
  mode: 'free',
  stock: [{ id: 'S', kind: 'sheet', width: 1000, height: 500, trim: 10, quantity: 2 }],
  parts: [
    { id: 'a', width: 300, height: 200, quantity: 2 },
    { id: 'b', width: 100, height: 400, canRotate: false },
  ],
};

const pl = (partId: string, x: number, y: number, width: number, height: number, rotated = false): Placement => ({ partId, x, y, width, height, rotated });

function layout(placements: Placement[], extra: Partial<LayoutSheet> = {}): Layout {
  return {
    sheets: [{ stockId: 'S', width: 1000, height: 500, placements, cuts: [], ...extra }],
    unplaced: [],
    stats: { sheetsUsed: 1, utilisation: 0, elapsedMs: 0 },
  };
}

// a at (10,10), a at (314,10): 4 mm apart (one kerf); b at (618,10).
const good = [pl('a', 10, 10, 300, 200), pl('a', 314, 10, 300, 200), pl('b', 618, 10, 100, 400)];

describe('validateLayout (independent checks)', () => {
  it('accepts a correct layout', () => {
    expect(validateLayout(job(base), layout(good))).toEqual([]);
  });

  it('rejects parts closer than one kerf', () => {
    const bad = [pl('a', 10, 10, 300, 200), pl('a', 312, 10, 300, 200), pl('b', 618, 10, 100, 400)];
    expect(validateLayout(job(base), layout(bad)).join()).toMatch(/closer than one kerf/);
  });

  it('rejects overlapping parts', () => {
    const bad = [pl('a', 10, 10, 300, 200), pl('a', 100, 100, 300, 200), pl('b', 618, 10, 100, 400)];
    expect(validateLayout(job(base), layout(bad)).join()).toMatch(/closer than one kerf/);
  });

  it('rejects a part in the edge trim', () => {
    const bad = [pl('a', 5, 10, 300, 200), pl('a', 314, 10, 300, 200), pl('b', 618, 10, 100, 400)];
    expect(validateLayout(job(base), layout(bad)).join()).toMatch(/outside the trimmed sheet/);
  });

  it('rejects a missing part and a part placed twice', () => {
    expect(validateLayout(job(base), layout(good.slice(0, 2))).join()).toMatch(/part b: 0 placed/);
    expect(validateLayout(job(base), layout([...good, pl('b', 800, 10, 100, 400)])).join()).toMatch(/part b: 2 placed/);
  });

  it('counts unplaced parts as accounted for', () => {
    const l = layout(good.slice(0, 2));
    l.unplaced = [{ partId: 'b', quantity: 1 }];
    expect(validateLayout(job(base), l)).toEqual([]);
  });

  it('rejects turning a part with canRotate false', () => {
    const bad = [pl('a', 10, 10, 300, 200), pl('a', 314, 10, 300, 200), pl('b', 10, 214, 400, 100, true)];
    expect(validateLayout(job(base), layout(bad)).join()).toMatch(/canRotate forbids/);
  });

  it('rejects a size that does not match the rotated flag', () => {
    const bad = [pl('a', 10, 10, 200, 300), pl('a', 314, 10, 300, 200), pl('b', 618, 10, 100, 400)];
    expect(validateLayout(job(base), layout(bad)).join()).toMatch(/wrong size/);
  });

  it('rejects turning a grained part across the grain of grained stock', () => {
    // Sheet 1000 × 500: its length runs along x. A part whose grain runs along its height must be
    // turned so that its height lies along x.
    const j = job({ ...base, stock: [{ ...base.stock[0], grain: 'length' }], parts: [{ id: 'g', width: 100, height: 300, grain: 'height' }] });
    expect(validateLayout(j, layout([pl('g', 10, 10, 100, 300)])).join()).toMatch(/grain/);
    expect(validateLayout(j, layout([pl('g', 10, 10, 300, 100, true)]))).toEqual([]);
  });

  it('rejects stock of another material, a wrong sheet size and more sheets than in stock', () => {
    const j = job({ ...base, stock: [{ ...base.stock[0], material: 'MDF', quantity: 1 }], parts: [{ id: 'p', width: 100, height: 100, quantity: 2, material: 'plywood' }] });
    const l: Layout = {
      sheets: [
        { stockId: 'S', width: 1000, height: 500, placements: [pl('p', 10, 10, 100, 100)], cuts: [] },
        { stockId: 'S', width: 900, height: 500, placements: [pl('p', 10, 10, 100, 100)], cuts: [] },
      ],
      unplaced: [],
      stats: { sheetsUsed: 2, utilisation: 0, elapsedMs: 0 },
    };
    const errors = validateLayout(j, l).join('\n');
    expect(errors).toMatch(/another material/);
    expect(errors).toMatch(/width 900/);
    expect(errors).toMatch(/2 used but only 1 available/);
  });

  describe('guillotine mode', () => {
    const g = { ...base, mode: 'guillotine', kerf: 0, stock: [{ id: 'S', kind: 'sheet', width: 1000, height: 500 }] };

    it('accepts a layout whose numbered cuts free every part', () => {
      const j = job({ ...g, parts: [{ id: 'p', width: 400, height: 500, quantity: 2 }] });
      const l = layout([pl('p', 0, 0, 400, 500), pl('p', 400, 0, 400, 500)], {
        cuts: [
          { order: 1, kind: 'cross', x1: 400, y1: 0, x2: 400, y2: 500 },
          { order: 2, kind: 'cross', x1: 800, y1: 0, x2: 800, y2: 500 },
        ],
      });
      expect(validateLayout(j, l)).toEqual([]);
    });

    it('rejects a cut through a part, a cut that stops short, and parts left together', () => {
      const j = job({ ...g, parts: [{ id: 'p', width: 400, height: 500, quantity: 2 }] });
      const through = layout([pl('p', 0, 0, 400, 500), pl('p', 400, 0, 400, 500)], { cuts: [{ order: 1, kind: 'cross', x1: 200, y1: 0, x2: 200, y2: 500 }] });
      expect(validateLayout(j, through).join()).toMatch(/runs through a part/);
      const short = layout([pl('p', 0, 0, 400, 500), pl('p', 400, 0, 400, 500)], { cuts: [{ order: 1, kind: 'cross', x1: 400, y1: 0, x2: 400, y2: 300 }] });
      expect(validateLayout(j, short).join()).toMatch(/edge to edge/);
      const none = layout([pl('p', 0, 0, 400, 500), pl('p', 400, 0, 400, 500)]);
      expect(validateLayout(j, none).join()).toMatch(/still holds 2 parts/);
    });

    it('rejects a rip cut labelled as a cross cut (rip runs along the sheet length)', () => {
      const j = job({ ...g, parts: [{ id: 'p', width: 1000, height: 200, quantity: 2 }] });
      const l = layout([pl('p', 0, 0, 1000, 200), pl('p', 0, 200, 1000, 200)], {
        cuts: [
          { order: 1, kind: 'cross', x1: 0, y1: 200, x2: 1000, y2: 200 },
          { order: 2, kind: 'rip', x1: 0, y1: 400, x2: 1000, y2: 400 },
        ],
      });
      expect(validateLayout(j, l).join()).toMatch(/cut 1 should be a rip cut/);
    });

    it('rejects the pinwheel, a classic layout no sequence of guillotine cuts can produce', () => {
      // Four 2 × 1 / 1 × 2 blocks around a 1 × 1 centre in a 3 × 3 square (scaled by 100).
      const j = job({
        ...g,
        stock: [{ id: 'S', kind: 'sheet', width: 300, height: 300 }],
        parts: [
          { id: 'h', width: 200, height: 100, quantity: 2, canRotate: false },
          { id: 'v', width: 100, height: 200, quantity: 2, canRotate: false },
          { id: 'c', width: 100, height: 100 },
        ],
      });
      const pin: Layout = {
        sheets: [
          {
            stockId: 'S',
            width: 300,
            height: 300,
            placements: [pl('h', 0, 0, 200, 100), pl('v', 200, 0, 100, 200), pl('h', 100, 200, 200, 100), pl('v', 0, 100, 100, 200), pl('c', 100, 100, 100, 100)],
            cuts: [],
          },
        ],
        unplaced: [],
        stats: { sheetsUsed: 1, utilisation: 1, elapsedMs: 0 },
      };
      expect(validateLayout(j, pin).join()).toMatch(/still holds 5 parts/);
      // The same placements are fine in free mode.
      expect(validateLayout({ ...j, mode: 'free' }, pin)).toEqual([]);
    });
  });
});
