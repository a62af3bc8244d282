import { describe, expect, it } from 'vitest';
import { DEMO_BOOKSHELF, DEMO_FLOORSTANDER } from '../../../shared/demo/designs.js';
import { planDesign } from '../../../shared/cabinet/index.js';
import { panelsLargerThanStock } from '../../../shared/cabinet/warnings.js';
import { codes, mustFail, mustPlan, plainBox } from './helpers.js';

describe('errors name their field (PRODUCT §3)', () => {
  it('a missing or non-positive size', () => {
    expect(Object.keys(mustFail(plainBox({ outer: { width: 0, height: 500, depth: 350 } })))).toContain('outer.width');
    expect(Object.keys(mustFail({ name: 'x', outer: { height: 500, depth: 350 }, material: { name: 'MDF', thickness: 18 } }))).toContain('outer.width');
    expect(Object.keys(mustFail(plainBox({ material: { name: 'MDF', thickness: -18 } })))).toContain('material.thickness');
  });

  it('a panel thickness of half an outer size or more', () => {
    expect(mustFail(plainBox({ outer: { width: 36, height: 500, depth: 350 } }))).toHaveProperty(['material.thickness']);
    expect(mustFail(plainBox({ baffleThickness: 175 }))).toHaveProperty(['baffleThickness']);
    expect(mustFail(plainBox({ baffleThickness: 340 }))).toHaveProperty(['baffleThickness']);
  });

  it('a brace outside the cavity: braces[1].position, a bar: braces[0].at[1], a window off its brace', () => {
    const shelf = { type: 'shelf', axis: 'y', thickness: 18 } as const;
    const f = mustFail(plainBox({ braces: [{ ...shelf, position: 200 }, { ...shelf, position: 480 }] }));
    expect(Object.keys(f)).toEqual(['braces[1].position']);
    expect(f['braces[1].position']).toMatch(/outside the cavity/);
    const g = mustFail(plainBox({ braces: [{ type: 'bar', axis: 'x', at: [250, 340], section: [20, 20] }] }));
    expect(Object.keys(g)).toEqual(['braces[0].at[1]']);
    const h = mustFail(plainBox({ braces: [{ ...shelf, position: 200, windows: [{ shape: 'round', u: 20, v: 150, diameter: 60 }] }] }));
    expect(Object.keys(h)).toEqual(['braces[0].windows[0].u']);
  });

  it('an opening whose cut-out does not fit on its face: openings[0].x / .y / .z', () => {
    expect(Object.keys(mustFail(plainBox({ openings: [{ type: 'driver', face: 'front', x: 30, y: 200, diameter: 100 }] })))).toEqual(['openings[0].x']);
    expect(Object.keys(mustFail(plainBox({ openings: [{ type: 'lead', face: 'back', x: 150, y: 498, diameter: 10 }] })))).toEqual(['openings[0].y']);
    expect(Object.keys(mustFail(plainBox({ openings: [{ type: 'lead', face: 'left', z: 400, y: 200, diameter: 10 }] })))).toEqual(['openings[0].z']);
    // the rebate is part of the cut-out
    const rebated = { type: 'driver', face: 'front', x: 60, y: 200, diameter: 100, rebate: { diameter: 130, depth: 5 } } as const;
    expect(Object.keys(mustFail(plainBox({ openings: [rebated] })))).toEqual(['openings[0].x']);
  });

  it('a port that runs through the box or is shorter than its panel: openings[0].length', () => {
    expect(Object.keys(mustFail(plainBox({ openings: [{ type: 'port', face: 'back', x: 150, y: 100, diameter: 50, length: 400 }] })))).toEqual([
      'openings[0].length',
    ]);
    expect(Object.keys(mustFail(plainBox({ openings: [{ type: 'port', face: 'back', x: 150, y: 100, diameter: 50, length: 10 }] })))).toEqual([
      'openings[0].length',
    ]);
  });

  it('lining thicker than half an internal dimension: lining.thickness', () => {
    // smallest internal size 264 mm → at most 132
    expect(Object.keys(mustFail(plainBox({ lining: { thickness: 133 } })))).toEqual(['lining.thickness']);
    expect(mustPlan(plainBox({ lining: { thickness: 100 } })).liningPieces.length).toBeGreaterThan(0);
  });

  it('an unknown face or axis', () => {
    expect(mustFail(plainBox({ openings: [{ type: 'lead', face: 'side' as never, x: 1, y: 1, diameter: 5 }] }))).toHaveProperty(['openings[0].face']);
    expect(mustFail(plainBox({ braces: [{ type: 'shelf', axis: 'w' as never, position: 100, thickness: 18 }] }))).toHaveProperty(['braces[0].axis']);
    expect(mustFail(plainBox({ lining: { thickness: 50, faces: ['left', 'inside' as never] } }))).toHaveProperty(['lining.faces[1]']);
  });

  it('not a design at all: a clear message, never an exception', () => {
    for (const bad of [null, 42, 'box', [], {}, { name: 'x' }]) {
      const r = planDesign(bad);
      expect(r.ok).toBe(false);
      if (!r.ok) {
        expect(r.message.length).toBeGreaterThan(0);
        expect(Object.keys(r.fields).length).toBeGreaterThan(0);
      }
    }
  });

  it('the message names the first field', () => {
    const r = planDesign(plainBox({ braces: [{ type: 'shelf', axis: 'y', position: 10, thickness: 18 }] }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/^braces\[0\]\.position: /);
  });
});

describe('warnings, never silent (PRODUCT §3)', () => {
  it('the demo designs plan without warnings', () => {
    expect(mustPlan(DEMO_BOOKSHELF).warnings).toEqual([]);
    expect(mustPlan(DEMO_FLOORSTANDER).warnings).toEqual([]);
  });

  it('port inner end closer to a wall than one port diameter (common practice)', () => {
    // back port 50 mm, 292 long: inner end at z = 350 − 292 = 58, 40 mm from the front panel (z = 18)
    const near = mustPlan(plainBox({ openings: [{ type: 'port', face: 'back', x: 150, y: 100, diameter: 50, length: 292 }] }));
    expect(codes(near)).toContain('port_end_too_close');
    expect(near.warnings.find((w) => w.code === 'port_end_too_close')!.field).toBe('openings[0].length');
    const far = mustPlan(plainBox({ openings: [{ type: 'port', face: 'back', x: 150, y: 100, diameter: 50, length: 200 }] }));
    expect(codes(far)).not.toContain('port_end_too_close');
  });

  it('port inner end closer to a brace than one port diameter (common practice)', () => {
    const plan = mustPlan(
      plainBox({
        braces: [{ type: 'shelf', axis: 'z', position: 150, thickness: 18, windows: [{ shape: 'rect', u: 150, v: 400, width: 150, height: 80 }] }],
        openings: [{ type: 'port', face: 'back', x: 150, y: 100, diameter: 50, length: 150 }],
      }),
    );
    // inner end at z = 350 − 150 = 200; brace back face at 159 → 41 mm < 50 mm
    expect(plan.warnings.find((w) => w.code === 'port_end_too_close')?.message).toMatch(/shelf brace 1/);
  });

  it('a port tube crossing a brace', () => {
    const plan = mustPlan(
      plainBox({
        braces: [{ type: 'shelf', axis: 'y', position: 100, thickness: 18, windows: [{ shape: 'rect', u: 150, v: 100, width: 150, height: 100 }] }],
        openings: [{ type: 'port', face: 'back', x: 150, y: 110, diameter: 50, length: 150 }],
      }),
    );
    expect(codes(plan)).toContain('port_crosses_brace');
  });

  it('a port tube passing through a window of a brace across it does not cross the brace', () => {
    const design = (window: { u: number; v: number; diameter: number }) =>
      plainBox({
        braces: [{ type: 'shelf', axis: 'z', position: 250, thickness: 18, windows: [{ shape: 'round', ...window }] }],
        openings: [{ type: 'port', face: 'back', x: 150, y: 150, diameter: 50, wall: 3, length: 200 }],
      });
    expect(codes(mustPlan(design({ u: 150, v: 150, diameter: 70 })))).not.toContain('port_crosses_brace');
    // a window too small for the tube's outer diameter (56 mm)
    expect(codes(mustPlan(design({ u: 150, v: 150, diameter: 50 })))).toContain('port_crosses_brace');
  });

  it('a cut-out crossing a panel edge (into an adjoining panel) or a brace', () => {
    // front runs through (default joinery); the sides sit behind x 0…18: a driver reaching x < 18 crosses that edge
    const edge = mustPlan(plainBox({ openings: [{ type: 'driver', face: 'front', x: 60, y: 200, diameter: 100 }] }));
    expect(codes(edge)).toContain('cutout_crosses_edge');
    const brace = mustPlan(
      plainBox({
        braces: [{ type: 'shelf', axis: 'y', position: 250, thickness: 18, windows: [{ shape: 'round', u: 150, v: 175, diameter: 100 }] }],
        openings: [{ type: 'driver', face: 'front', x: 150, y: 290, diameter: 120 }],
      }),
    );
    expect(codes(brace)).toContain('cutout_crosses_brace');
    expect(codes(brace)).not.toContain('cutout_crosses_edge');
  });

  it('openings overlapping, braces crossing, bar sections that are not whole sheets', () => {
    const plan = mustPlan(
      plainBox({
        braces: [
          { type: 'shelf', axis: 'y', position: 250, thickness: 18 },
          { type: 'bar', axis: 'z', at: [150, 250], section: [25, 25] },
        ],
        openings: [
          { type: 'lead', face: 'back', x: 150, y: 100, diameter: 20 },
          { type: 'terminal', face: 'back', x: 160, y: 100, width: 40, height: 40 },
        ],
      }),
    );
    expect(codes(plan)).toEqual(expect.arrayContaining(['openings_overlap', 'braces_cross', 'bar_section']));
  });

  it('a panel larger than every sheet in stock (a helper for the cut plan)', () => {
    const panels = mustPlan(plainBox({ outer: { width: 600, height: 2600, depth: 500 } })).panels;
    const w = panelsLargerThanStock(panels, [{ width: 2440, height: 1220 }]);
    expect(w.map((x) => x.field)).toEqual(['Front (baffle)', 'Back', 'Left side', 'Right side']);
    expect(panelsLargerThanStock(panels, [{ width: 2440, height: 1220 }, { width: 1250, height: 2800 }])).toEqual([]);
  });
});
