import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import polygonClipping from 'polygon-clipping';
import { DEMO_BOOKSHELF, DEMO_FLOORSTANDER } from '../../../shared/demo/designs.js';
import type { DesignInput } from '../../../shared/schemas/design.schema.js';
import type { LiningPiecePlan, Plan, Point } from '../../../shared/schemas/plan.types.js';
import { CIRCLE_SEGMENTS } from '../../../shared/geometry/polygon.js';
import { codes, mustPlan, plainBox } from '../cabinet/helpers.js';
import { referenceCase, repoRoot } from '../acoustics/reference-cases.js';

/** Area of outline minus holes, recomputed with the npm package polygon-clipping (a general polygon library). */
function clippedArea(p: LiningPiecePlan): number {
  const ring = (pts: Point[]) => [...pts.map(([x, y]) => [x, y] as [number, number]), [pts[0]![0], pts[0]![1]] as [number, number]];
  const result = polygonClipping.difference([ring(p.outline)], ...p.holes.map((h) => [ring(h)]));
  let area = 0;
  for (const poly of result) {
    poly.forEach((r, i) => {
      let s = 0;
      for (let k = 0; k + 1 < r.length; k++) s += r[k]![0] * r[k + 1]![1] - r[k + 1]![0] * r[k]![1];
      area += (i === 0 ? 1 : -1) * Math.abs(s / 2);
    });
  }
  return area;
}

function pieces(plan: Plan, face: string) {
  return plan.liningPieces.filter((p) => p.face === face);
}

/** A lined box with a configurable list of braces and openings. 300 × 500 × 350, 18 mm: cavity 264 × 464 × 314. */
function linedBox(over: Partial<DesignInput> = {}, lining: Record<string, unknown> = {}): DesignInput {
  return plainBox({ lining: { thickness: 50, crush: 5, ...lining }, ...over });
}

const fixtureDir = path.join(repoRoot, 'tests/fixtures/designs');
const fixtureDesigns = readdirSync(fixtureDir)
  .filter((f) => f.endsWith('.json'))
  .map((f) => ({ name: f, input: JSON.parse(readFileSync(path.join(fixtureDir, f), 'utf8')) as unknown }));

const special: { name: string; input: DesignInput }[] = [
  {
    name: 'port hole crossing the lining edge (notch)',
    input: linedBox({ openings: [{ type: 'port', face: 'back', x: 40, y: 100, diameter: 50, wall: 3, length: 120 }] }),
  },
  {
    name: 'bar brace against the back wall (splits the back lining)',
    input: linedBox({ braces: [{ type: 'bar', axis: 'x', at: [250, 312], section: [40, 40] }] }),
  },
  {
    name: 'overlapping holes and a bar end',
    input: linedBox({
      braces: [{ type: 'bar', axis: 'z', at: [150, 260], section: [30, 30] }],
      openings: [
        { type: 'lead', face: 'back', x: 150, y: 250, diameter: 40 },
        { type: 'terminal', face: 'back', x: 150, y: 280, width: 50, height: 50 },
      ],
    }),
  },
];

const allDesigns = [
  { name: 'bookshelf demo', input: DEMO_BOOKSHELF as unknown },
  { name: 'floorstander demo', input: DEMO_FLOORSTANDER as unknown },
  ...fixtureDesigns,
  ...special,
];

describe('lining piece areas recomputed with polygon-clipping (npm)', () => {
  for (const d of allDesigns) {
    it(d.name, () => {
      const plan = mustPlan(d.input);
      for (const p of plan.liningPieces) {
        expect(Math.abs(p.area - clippedArea(p)), p.name).toBeLessThan(1e-6 * p.width * p.height + 1e-6);
        // every point of the outline within the piece's cut size
        for (const [x, y] of p.outline) {
          expect(x).toBeGreaterThanOrEqual(-1e-9);
          expect(y).toBeGreaterThanOrEqual(-1e-9);
          expect(x).toBeLessThanOrEqual(p.width + 1e-9);
          expect(y).toBeLessThanOrEqual(p.height + 1e-9);
        }
      }
      const total = plan.liningPieces.reduce((s, p) => s + p.area * p.quantity, 0);
      expect(plan.lining?.areaM2 ?? 0).toBeCloseTo(total / 1e6, 12);
    });
  }
});

describe('facts of the trade (common practice)', () => {
  it('a lining of about 50 mm polyester plans, and its fibre volume uses polyester fibre at 1380 kg/m³ (REFERENCES §5)', () => {
    const plan = mustPlan(linedBox({}, { density: 16 }));
    expect(plan.liningPieces.every((p) => p.thickness === 50)).toBe(true);
    expect(plan.volumes.liningFibreLitres).toBeCloseTo((plan.lining!.volumeLitres * 16) / 1380, 12);
  });

  it('every face is lined but the baffle (the default faces)', () => {
    const plan = mustPlan(linedBox());
    expect(new Set(plan.liningPieces.map((p) => p.face))).toEqual(new Set(['back', 'left', 'right', 'top', 'bottom']));
  });

  it('a horizontal brace splits each side lining and the back lining in two', () => {
    const plan = mustPlan(linedBox({ braces: [{ type: 'shelf', axis: 'y', position: 250, thickness: 18 }] }));
    for (const face of ['left', 'right', 'back']) expect(pieces(plan, face), face).toHaveLength(2);
    for (const face of ['top', 'bottom']) expect(pieces(plan, face), face).toHaveLength(1);
    // lower piece: y 18…241 → 223 + 5 crush; upper: 259…482 → 223 + 5
    expect(pieces(plan, 'back').map((p) => p.height)).toEqual([228, 228]);
  });

  it('the back lining gets a hole over a rear port: the tube outer diameter plus the clearance all round', () => {
    const plan = mustPlan(linedBox({ openings: [{ type: 'port', face: 'back', x: 100, y: 120, diameter: 50, wall: 3, length: 120 }] }));
    const back = pieces(plan, 'back')[0]!;
    expect(back.holes).toHaveLength(1);
    const hole = back.holes[0]!;
    expect(hole).toHaveLength(CIRCLE_SEGMENTS);
    // back seen from behind: u = W − x = 200; piece origin at the cavity corner (18) minus crush/2
    const cx = hole.reduce((s, p) => s + p[0], 0) / hole.length;
    const cy = hole.reduce((s, p) => s + p[1], 0) / hole.length;
    expect(cx).toBeCloseTo(200 - 18 + 2.5, 3);
    expect(cy).toBeCloseTo(120 - 18 + 2.5, 3);
    const r = Math.max(...hole.map((p) => Math.hypot(p[0] - cx, p[1] - cy)));
    // points are rounded to 0.001 mm
    expect(r).toBeCloseTo((50 + 2 * 3 + 2 * 5) / 2, 2);
  });
});

describe('corner order and crush allowance (PRODUCT §3)', () => {
  it('back covers the whole back; sides stop at the back lining; top and bottom fit between the side linings', () => {
    const plan = mustPlan(linedBox());
    const size = (face: string) => [pieces(plan, face)[0]!.width, pieces(plan, face)[0]!.height];
    // cavity 264 × 464 × 314, f = 50, crush 5 in each direction
    expect(size('back')).toEqual([264 + 5, 464 + 5]);
    expect(size('left')).toEqual([314 - 50 + 5, 464 + 5]);
    expect(size('right')).toEqual([314 - 50 + 5, 464 + 5]);
    expect(size('top')).toEqual([264 - 100 + 5, 314 - 50 + 5]);
    expect(size('bottom')).toEqual([264 - 100 + 5, 314 - 50 + 5]);
  });

  it('an unlined neighbour gives its room to the next lining', () => {
    const plan = mustPlan(linedBox({}, { faces: ['left', 'top'] }));
    expect([pieces(plan, 'left')[0]!.width, pieces(plan, 'top')[0]!.width, pieces(plan, 'top')[0]!.height]).toEqual([314 + 5, 264 - 50 + 5, 314 + 5]);
  });

  it('box-internal-geometry: a vanishing lining on all six faces covers 2(wh + wd + hd) = 0.702176 m² (REFERENCES §7)', () => {
    const c = referenceCase('box-internal-geometry');
    const plan = mustPlan(
      plainBox({ lining: { thickness: 0.001, crush: 0, minSliver: 0, faces: ['front', 'back', 'left', 'right', 'top', 'bottom'] } }),
    );
    const areaM2 = plan.liningPieces.reduce((s, p) => s + p.area, 0) / 1e6;
    expect(Math.abs(areaM2 - (c.expected as { internal_area_m2: number }).internal_area_m2) / 0.702176).toBeLessThan(2e-5);
  });

  it('totals: area, volume = area × thickness, mass = volume × fill density', () => {
    const plan = mustPlan(linedBox({}, { density: 25 }));
    const area = plan.liningPieces.reduce((s, p) => s + p.area, 0);
    expect(plan.lining!.areaM2).toBeCloseTo(area / 1e6, 12);
    expect(plan.lining!.volumeLitres).toBeCloseTo((area * 50) / 1e6, 9);
    expect(plan.lining!.massKg).toBeCloseTo(((area * 50) / 1e9) * 25, 12);
  });
});

describe('splits, holes, notches and slivers', () => {
  it('shelf braces on any axis split the faces their plane crosses', () => {
    const plan = mustPlan(
      linedBox({
        braces: [
          { type: 'shelf', axis: 'x', position: 150, thickness: 18 },
          { type: 'shelf', axis: 'z', position: 180, thickness: 18 },
        ],
      }),
    );
    // x-brace crosses back, top, bottom; z-brace crosses left, right, top, bottom
    expect(pieces(plan, 'back')).toHaveLength(2);
    expect(pieces(plan, 'left')).toHaveLength(2);
    expect(pieces(plan, 'right')).toHaveLength(2);
    expect(pieces(plan, 'top')).toHaveLength(4);
    expect(pieces(plan, 'bottom')).toHaveLength(4);
    expect(pieces(plan, 'top').map((p) => p.name)).toEqual(['Top lining 1', 'Top lining 2', 'Top lining 3', 'Top lining 4']);
  });

  it('a bar brace makes a hole where it meets a lined face (its section, placed as seen from outside)', () => {
    const plan = mustPlan(linedBox({ braces: [{ type: 'bar', axis: 'x', at: [250, 150], section: [40, 20] }] }));
    for (const face of ['left', 'right']) {
      const p = pieces(plan, face)[0]!;
      expect(p.holes, face).toHaveLength(1);
      const xs = p.holes[0]!.map((q) => q[0]);
      const ys = p.holes[0]!.map((q) => q[1]);
      expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(20, 6); // along z
      expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(40, 6); // along y
      const cx = (Math.max(...xs) + Math.min(...xs)) / 2;
      // left: u = D − z, right: u = z; side linings start at z = 18 (the front) and stop at the back lining
      // left lining spans z 18…282, i.e. u = 350 − z from 68 to 332
      const expected = face === 'left' ? 350 - 150 - (350 - 282) + 2.5 : 150 - 18 + 2.5;
      expect(cx, face).toBeCloseTo(expected, 6);
      expect(p.area).toBeCloseTo(p.width * p.height - 40 * 20, 6);
    }
  });

  it('a bar lying in the back lining layer cuts the back lining into two pieces', () => {
    const plan = mustPlan(special[1]!.input);
    expect(pieces(plan, 'back')).toHaveLength(2);
  });

  it('a hole crossing a piece edge becomes a notch in the outline', () => {
    const plan = mustPlan(special[0]!.input);
    const back = pieces(plan, 'back')[0]!;
    expect(back.holes).toHaveLength(0);
    expect(back.outline.length).toBeGreaterThan(4);
    expect(back.area).toBeLessThan(back.width * back.height);
    expect(back.area).toBeCloseTo(clippedArea(back), 6);
  });

  it('slivers narrower than minSliver are dropped with a warning', () => {
    // brace top face at 470: the strip above it to 482 is 12 mm
    const plan = mustPlan(linedBox({ braces: [{ type: 'shelf', axis: 'y', position: 461, thickness: 18 }] }));
    expect(codes(plan)).toContain('lining_sliver');
    expect(pieces(plan, 'back')).toHaveLength(1);
    const kept = mustPlan(linedBox({ braces: [{ type: 'shelf', axis: 'y', position: 461, thickness: 18 }] }, { minSliver: 10 }));
    expect(pieces(kept, 'back')).toHaveLength(2);
  });

  it('terminal and lead holes are their cut-outs', () => {
    const plan = mustPlan(
      linedBox({
        openings: [
          { type: 'terminal', face: 'back', x: 150, y: 300, width: 60, height: 40 },
          { type: 'lead', face: 'back', x: 150, y: 150, diameter: 12 },
        ],
      }),
    );
    const back = pieces(plan, 'back')[0]!;
    const n = CIRCLE_SEGMENTS;
    const circle = (n / 2) * 6 * 6 * Math.sin((2 * Math.PI) / n); // area of the inscribed 64-gon of radius 6
    // points are rounded to 0.001 mm: agree within 0.05 mm²
    expect(back.area).toBeCloseTo(back.width * back.height - 60 * 40 - circle, 1);
  });
});
