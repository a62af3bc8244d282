import { describe, expect, it } from 'vitest';
import type { FacePair } from '../../../shared/schemas/design.schema.js';
import { DEMO_BOOKSHELF } from '../../../shared/demo/designs.js';
import { referenceCase, num } from '../acoustics/reference-cases.js';
import { mustPlan, panel, plainBox } from './helpers.js';

describe('internal geometry', () => {
  it('box-internal-geometry: 300 × 500 × 350 outside, 18 mm walls → 264 × 464 × 314, 38.4637 L (REFERENCES §7, rectangular solid geometry)', () => {
    const c = referenceCase('box-internal-geometry');
    const [W, H, D] = c.inputs.external_mm as number[];
    const t = num(c.inputs.thickness_mm);
    const exp = c.expected as { internal_mm: number[]; V_L: number };
    const plan = mustPlan(plainBox({ outer: { width: W!, height: H!, depth: D! }, material: { name: 'MDF', thickness: t } }));
    // The reference prints V to 4 decimals (38.4637 for 38.463744), so compare within half its last digit.
    expect(Math.abs(plan.volumes.grossLitres - exp.V_L)).toBeLessThanOrEqual(0.00005);
    expect(plan.volumes.grossLitres).toBeCloseTo((exp.internal_mm[0]! * exp.internal_mm[1]! * exp.internal_mm[2]!) / 1e6, 9);
    // the top panel (with the default joinery) is exactly the internal width × internal depth
    expect([panel(plan, 'Top').width, panel(plan, 'Top').height]).toEqual([exp.internal_mm[0], exp.internal_mm[2]]);
    expect(panel(plan, 'Left side').height).toBe(H);
  });
});

describe('panels from the joinery precedence (PRODUCT §3)', () => {
  // 300 × 500 × 350 outside, t = 18, baffle tf = 25: internal 264 × 464 × 307. Sizes worked out by hand
  // from the rule "an earlier pair runs through the full outer size; a later pair fits between it".
  const cases: { order: FacePair[]; front: number[]; side: number[]; top: number[] }[] = [
    { order: ['frontBack', 'sides', 'topBottom'], front: [300, 500], side: [307, 500], top: [264, 307] }, // PRODUCT §3 example
    { order: ['frontBack', 'topBottom', 'sides'], front: [300, 500], side: [307, 464], top: [300, 307] },
    { order: ['sides', 'frontBack', 'topBottom'], front: [264, 500], side: [350, 500], top: [264, 307] },
    { order: ['sides', 'topBottom', 'frontBack'], front: [264, 464], side: [350, 500], top: [264, 350] },
    { order: ['topBottom', 'frontBack', 'sides'], front: [300, 464], side: [307, 464], top: [300, 350] },
    { order: ['topBottom', 'sides', 'frontBack'], front: [264, 464], side: [350, 464], top: [300, 350] },
  ];
  for (const c of cases) {
    it(`${c.order.join(' > ')}`, () => {
      const plan = mustPlan(plainBox({ baffleThickness: 25, joinery: c.order }));
      const size = (n: string) => [panel(plan, n).width, panel(plan, n).height];
      expect(size('Front (baffle)')).toEqual(c.front);
      expect(size('Back')).toEqual(c.front);
      expect(size('Left side')).toEqual(c.side);
      expect(size('Right side')).toEqual(c.side);
      expect(size('Top')).toEqual(c.top);
      expect(size('Bottom')).toEqual(c.top);
      expect(panel(plan, 'Front (baffle)').thickness).toBe(25);
      expect(panel(plan, 'Back').thickness).toBe(18);
      // The internal cavity does not depend on the joinery: (W−2t)(H−2t)(D−tf−t).
      expect(plan.volumes.grossLitres).toBeCloseTo((264 * 464 * 307) / 1e6, 9);
      // The six panels and the cavity fill the outer box exactly (rectangular solid geometry).
      const shell = plan.panels.reduce((s, p) => s + p.width * p.height * p.thickness * p.quantity, 0);
      expect(shell + 264 * 464 * 307).toBeCloseTo(300 * 500 * 350, 3);
    });
  }

  it('names a builder understands, one of each face per cabinet, grain along the height (top/bottom along the width)', () => {
    const plan = mustPlan(DEMO_BOOKSHELF);
    expect(plan.panels.map((p) => p.name)).toEqual(['Front (baffle)', 'Back', 'Left side', 'Right side', 'Top', 'Bottom', 'Shelf brace 1']);
    for (const p of plan.panels.slice(0, 6)) expect(p.quantity).toBe(1);
    expect(plan.panels.slice(0, 6).map((p) => p.grain)).toEqual(['height', 'height', 'height', 'height', 'width', 'width']);
    expect(panel(plan, 'Shelf brace 1').grain).toBe('none');
  });
});

describe('holes in panel coordinates (origin lower-left as seen from outside)', () => {
  it('a driver: through cut-out, rebate with its depth, screw holes on the pitch circle', () => {
    const plan = mustPlan(DEMO_BOOKSHELF);
    const holes = panel(plan, 'Front (baffle)').holes.filter((h) => h.ref === 'openings[0]');
    const through = holes.find((h) => h.source === 'driver' && h.operation === 'through');
    const rebate = holes.find((h) => h.operation === 'rebate');
    expect(through).toMatchObject({ shape: 'round', x: 110, y: 135, diameter: 118 });
    expect(rebate).toMatchObject({ shape: 'round', x: 110, y: 135, diameter: 134, depth: 5 });
    const screws = holes.filter((h) => h.source === 'screw');
    expect(screws).toHaveLength(4);
    for (const s of screws) {
      expect(s.shape).toBe('round');
      expect(Math.hypot(s.x - 110, s.y - 135)).toBeCloseTo(63, 6);
    }
  });

  it('a round port tube makes a hole of its OUTER diameter d + 2·wall; the back is seen from behind (x mirrored)', () => {
    const plan = mustPlan(
      plainBox({ openings: [{ type: 'port', face: 'back', x: 60, y: 100, diameter: 50, wall: 3, length: 120 }] }),
    );
    const hole = panel(plan, 'Back').holes[0]!;
    expect(hole).toMatchObject({ shape: 'round', x: 300 - 60, y: 100, diameter: 56, source: 'port' });
  });

  it('openings on the sides, top and bottom follow the face views of DEVELOPERS.md', () => {
    // default joinery: sides fit between front (25) and back (18): they span z 25…332
    const plan = mustPlan(
      plainBox({
        baffleThickness: 25,
        openings: [
          { type: 'lead', face: 'left', z: 100, y: 150, diameter: 10 },
          { type: 'lead', face: 'right', z: 100, y: 150, diameter: 10 },
          { type: 'lead', face: 'top', x: 100, z: 200, diameter: 10 },
          { type: 'lead', face: 'bottom', x: 100, z: 200, diameter: 10 },
        ],
      }),
    );
    // left: u = D − z, panel from u = 18 → x = 350 − 100 − 18
    expect(panel(plan, 'Left side').holes[0]).toMatchObject({ x: 232, y: 150 });
    // right: u = z, panel from z = 25
    expect(panel(plan, 'Right side').holes[0]).toMatchObject({ x: 75, y: 150 });
    // top: u = x from x = 18, v = z from z = 25
    expect(panel(plan, 'Top').holes[0]).toMatchObject({ x: 82, y: 175 });
    // bottom: seen from below, u = W − x
    expect(panel(plan, 'Bottom').holes[0]).toMatchObject({ x: 300 - 100 - 18, y: 175 });
  });

  it('terminal as a rectangle (given by its centre) or a round cut-out; slot port as its rectangle', () => {
    const plan = mustPlan(
      plainBox({
        joinery: ['sides', 'frontBack', 'topBottom'],
        openings: [
          { type: 'terminal', face: 'front', x: 150, y: 60, width: 60, height: 40 },
          { type: 'terminal', face: 'front', x: 150, y: 160, diameter: 50 },
          { type: 'port', face: 'front', shape: 'slot', x: 150, y: 300, width: 150, height: 30, length: 100 },
        ],
      }),
    );
    const holes = panel(plan, 'Front (baffle)').holes;
    // the front fits between the sides here, so x is measured from x = 18
    expect(holes[0]).toMatchObject({ shape: 'rect', x: 132, y: 60, width: 60, height: 40, source: 'terminal' });
    expect(holes[1]).toMatchObject({ shape: 'round', x: 132, y: 160, diameter: 50 });
    expect(holes[2]).toMatchObject({ shape: 'rect', x: 132, y: 300, width: 150, height: 30, source: 'port' });
  });
});

describe('braces as parts', () => {
  it('a shelf brace is a panel of the internal cross-section with its windows as holes', () => {
    const plan = mustPlan(DEMO_BOOKSHELF);
    const b = panel(plan, 'Shelf brace 1');
    // 220 × 360 × 260 outside, 18 mm: internal x 18…202, z 18…242
    expect([b.width, b.height, b.thickness]).toEqual([184, 224, 18]);
    expect(b.holes).toEqual([
      { shape: 'rect', x: 110 - 18, y: 130 - 18, width: 110, height: 120, operation: 'through', source: 'window', ref: 'braces[0].windows[0]' },
    ]);
  });

  it('a shelf brace across x spans (y, z); across z spans (x, y)', () => {
    const plan = mustPlan(
      plainBox({
        braces: [
          { type: 'shelf', axis: 'x', position: 150, thickness: 18 },
          { type: 'shelf', axis: 'z', position: 200, thickness: 12 },
        ],
      }),
    );
    expect([panel(plan, 'Shelf brace 1').width, panel(plan, 'Shelf brace 1').height]).toEqual([464, 314]);
    expect([panel(plan, 'Shelf brace 2').width, panel(plan, 'Shelf brace 2').height, panel(plan, 'Shelf brace 2').thickness]).toEqual([264, 464, 12]);
  });

  it('a bar brace is a strip of the sheet, as long as the cavity along its axis; thicker bars are laminated strips', () => {
    const plan = mustPlan(
      plainBox({
        braces: [
          { type: 'bar', axis: 'x', at: [250, 175], section: [40, 18] },
          { type: 'bar', axis: 'y', at: [150, 175], section: [36, 36] },
        ],
      }),
    );
    expect(panel(plan, 'Bar brace 1')).toMatchObject({ width: 264, height: 40, thickness: 18, quantity: 1, role: 'bar' });
    expect(panel(plan, 'Bar brace 2')).toMatchObject({ width: 464, height: 36, thickness: 18, quantity: 2 });
  });
});
