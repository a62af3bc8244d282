/**
 * Property tests (fast-check): any valid design plans without an exception, its lining pieces lie inside
 * their faces and net ≤ gross; any invalid design is a field error, never an exception.
 * Designs are built from a seed with the project's deterministic generator (mulberry32 in shared/nesting/rng.ts),
 * so a failing seed can be replayed.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import polygonClipping from 'polygon-clipping';
import type { DesignInput, Face, FacePair, Axis } from '../../../shared/schemas/design.schema.js';
import { planDesign } from '../../../shared/cabinet/index.js';
import { mulberry32 } from '../../../shared/nesting/rng.js';

const FACES: Face[] = ['front', 'back', 'left', 'right', 'top', 'bottom'];
const AXES: Axis[] = ['x', 'y', 'z'];

/** A random design that meets every rule (its cut-outs fit their faces, braces lie in the cavity, ...). */
export function randomValidDesign(seed: number): DesignInput {
  const rnd = mulberry32(seed);
  const between = (lo: number, hi: number) => lo + (hi - lo) * rnd();
  const int = (lo: number, hi: number) => Math.floor(between(lo, hi + 1));
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rnd() * xs.length)]!;
  const t = int(6, 25);
  const tf = rnd() < 0.5 ? t : int(t, 40);
  const W = int(150, 900);
  const H = int(150, 1400);
  const D = int(tf + t + 100, 700);
  const cav = { min: [t, t, tf], max: [W - t, H - t, D - t] };
  const size = [W - 2 * t, H - 2 * t, D - tf - t];
  const outer = [W, H, D];
  const joinery = [...(['frontBack', 'sides', 'topBottom'] as FacePair[])].sort(() => rnd() - 0.5);
  const other: Record<Axis, [number, number]> = { x: [1, 2], y: [0, 2], z: [0, 1] };

  const braces: NonNullable<DesignInput['braces']> = [];
  const nBraces = int(0, 4);
  for (let i = 0; i < nBraces; i++) {
    const axis = pick(AXES);
    const ai = AXES.indexOf(axis);
    if (rnd() < 0.6) {
      const b = Math.min(int(6, 25), size[ai]! / 3);
      const position = between(cav.min[ai]! + b / 2, cav.max[ai]! - b / 2);
      const [ui, vi] = other[axis];
      const windows = [];
      for (let k = int(0, 2); k > 0; k--) {
        const wu = between(5, size[ui]! * 0.8);
        const wv = between(5, size[vi]! * 0.8);
        const u = between(cav.min[ui]! + wu / 2, cav.max[ui]! - wu / 2);
        const v = between(cav.min[vi]! + wv / 2, cav.max[vi]! - wv / 2);
        windows.push(rnd() < 0.5 ? { shape: 'rect' as const, u, v, width: wu, height: wv } : { shape: 'round' as const, u, v, diameter: Math.min(wu, wv) });
      }
      braces.push({ type: 'shelf', axis, position, thickness: b, windows });
    } else {
      const [ui, vi] = other[axis];
      const s0 = Math.min(between(8, 50), size[ui]!);
      const s1 = Math.min(between(8, 50), size[vi]!);
      braces.push({
        type: 'bar',
        axis,
        at: [between(cav.min[ui]! + s0 / 2, cav.max[ui]! - s0 / 2), between(cav.min[vi]! + s1 / 2, cav.max[vi]! - s1 / 2)],
        section: [s0, s1],
      });
    }
  }

  const faceAxes: Record<Face, [number, number]> = { front: [0, 1], back: [0, 1], left: [2, 1], right: [2, 1], top: [0, 2], bottom: [0, 2] };
  const normalAxis: Record<Face, number> = { front: 2, back: 2, left: 0, right: 0, top: 1, bottom: 1 };
  const openings: NonNullable<DesignInput['openings']> = [];
  for (let k = int(0, 6); k > 0; k--) {
    const face = pick(FACES);
    const [ua, va] = faceAxes[face];
    const fu = outer[ua]!;
    const fv = outer[va]!;
    const maxD = Math.min(fu, fv) * 0.8;
    const place = (wu: number, wv: number) => {
      const p: Record<string, number> = {};
      p[AXES[ua]!] = between(wu / 2, fu - wu / 2);
      p[AXES[va]!] = between(wv / 2, fv - wv / 2);
      return p;
    };
    const kind = pick(['driver', 'port', 'terminal', 'lead'] as const);
    if (kind === 'driver') {
      const d = between(10, maxD * 0.8);
      const rebate = rnd() < 0.5 ? { diameter: d + between(2, maxD - d), depth: between(1, (face === 'front' ? tf : t) - 0.5) } : undefined;
      const outerD = rebate ? rebate.diameter : d;
      openings.push({
        type: 'driver',
        face,
        ...place(outerD, outerD),
        diameter: d,
        displacementLitres: between(0, 0.2),
        ...(rebate ? { rebate } : {}),
        ...(rnd() < 0.5 ? { coneAreaCm2: between(10, 500), excursionMm: between(1, 12) } : {}),
      });
    } else if (kind === 'port') {
      const tp = face === 'front' ? tf : t;
      const length = between(tp, tp + size[normalAxis[face]]!);
      if (rnd() < 0.5) {
        const wall = between(0, 4);
        const d = between(10, maxD - 2 * wall);
        openings.push({ type: 'port', face, shape: 'round', ...place(d + 2 * wall, d + 2 * wall), diameter: d, wall, length, ...(rnd() < 0.5 ? { targetHz: between(20, 80) } : {}) });
      } else {
        const w = between(10, fu * 0.8);
        const h = between(10, fv * 0.8);
        openings.push({ type: 'port', face, shape: 'slot', ...place(w, h), width: w, height: h, length });
      }
    } else if (kind === 'terminal') {
      if (rnd() < 0.5) {
        const w = between(10, fu * 0.5);
        const h = between(10, fv * 0.5);
        openings.push({ type: 'terminal', face, ...place(w, h), width: w, height: h });
      } else {
        const d = between(10, maxD * 0.5);
        openings.push({ type: 'terminal', face, ...place(d, d), diameter: d });
      }
    } else {
      const d = between(3, Math.min(30, maxD));
      openings.push({ type: 'lead', face, ...place(d, d), diameter: d });
    }
  }

  const smallest = Math.min(...size);
  const lining =
    rnd() < 0.7
      ? {
          thickness: between(1, smallest / 2),
          faces: FACES.filter(() => rnd() < 0.8),
          crush: between(0, 10),
          density: between(5, 40),
          minSliver: between(0, 30),
          portClearance: between(0, 10),
        }
      : undefined;
  return {
    name: `random ${seed}`,
    outer: { width: W, height: H, depth: D },
    material: { name: 'MDF', thickness: t },
    ...(tf !== t ? { baffleThickness: tf } : {}),
    joinery,
    braces,
    openings,
    ...(lining ? { lining } : {}),
    airTemperatureC: between(-10, 40),
  };
}

function ringArea(r: [number, number][]): number {
  let s = 0;
  for (let k = 0; k + 1 < r.length; k++) s += r[k]![0] * r[k + 1]![1] - r[k + 1]![0] * r[k]![1];
  return Math.abs(s / 2);
}

describe('any valid design (fast-check)', () => {
  it('plans without an exception; pieces inside their faces; net ≤ gross; areas agree with polygon-clipping', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2 ** 31 - 1 }), (seed) => {
        const input = randomValidDesign(seed);
        const r = planDesign(input);
        if (!r.ok) throw new Error(`seed ${seed}: ${r.message}`);
        const { plan, design } = r;
        const v = plan.volumes;
        expect(v.netLitres).toBeLessThanOrEqual(v.grossLitres);
        for (const x of [v.bracesLitres, v.portLitres, v.driversLitres, v.liningFibreLitres]) expect(x).toBeGreaterThanOrEqual(0);
        const t = design.material.thickness;
        const tf = design.baffleThickness ?? t;
        const inner = { x: design.outer.width - 2 * t, y: design.outer.height - 2 * t, z: design.outer.depth - tf - t };
        const crush = design.lining?.crush ?? 0;
        const faceDims: Record<Face, [number, number]> = {
          front: [inner.x, inner.y],
          back: [inner.x, inner.y],
          left: [inner.z, inner.y],
          right: [inner.z, inner.y],
          top: [inner.x, inner.z],
          bottom: [inner.x, inner.z],
        };
        for (const p of plan.liningPieces) {
          const [fw, fh] = faceDims[p.face];
          // sizes and points are rounded to 0.001 mm in the plan
          const tol = 5e-4 + 1e-9;
          expect(p.width).toBeLessThanOrEqual(fw + crush + tol);
          expect(p.height).toBeLessThanOrEqual(fh + crush + tol);
          expect(p.area).toBeGreaterThan(0);
          expect(p.area).toBeLessThanOrEqual(p.width * p.height + tol * (p.width + p.height));
          for (const [x, y] of [...p.outline, ...p.holes.flat()]) {
            expect(x).toBeGreaterThanOrEqual(-tol);
            expect(y).toBeGreaterThanOrEqual(-tol);
            expect(x).toBeLessThanOrEqual(p.width + tol);
            expect(y).toBeLessThanOrEqual(p.height + tol);
          }
          const ring = (pts: [number, number][]) => [...pts, pts[0]!];
          const clipped = polygonClipping.difference([ring(p.outline)], ...p.holes.map((h) => [ring(h)]));
          const area = clipped.reduce((s, poly) => s + poly.reduce((a, rr, i) => a + (i === 0 ? 1 : -1) * ringArea(rr), 0), 0);
          expect(Math.abs(area - p.area)).toBeLessThan(1e-6 * p.width * p.height + 1e-3);
        }
        if (plan.port) expect(Number.isFinite(plan.port.tuningHz)).toBe(true);
        expect(JSON.parse(JSON.stringify(plan))).toEqual(plan);
      }),
      { numRuns: Number(process.env.PROPERTY_RUNS ?? 300) },
    );
  });
});

type Mutation = (d: Record<string, any>, rnd: () => number) => void; // eslint-disable-line @typescript-eslint/no-explicit-any

const mutations: [string, Mutation][] = [
  ['non-positive width', (d) => (d.outer.width = -Math.abs(d.outer.width))],
  ['missing depth', (d) => delete d.outer.depth],
  ['width as text', (d) => (d.outer.width = '300')],
  ['thickness half the width', (d) => (d.material.thickness = d.outer.width / 2)],
  ['baffle half the depth', (d) => (d.baffleThickness = d.outer.depth / 2 + 1)],
  ['brace outside the cavity', (d) => (d.braces = [...d.braces, { type: 'shelf', axis: 'y', position: d.outer.height + 10, thickness: 18 }])],
  ['bar outside the cavity', (d) => (d.braces = [{ type: 'bar', axis: 'z', at: [-50, 100], section: [20, 20] }])],
  ['opening off its face', (d) => (d.openings = [...d.openings, { type: 'lead', face: 'front', x: d.outer.width + 20, y: 50, diameter: 10 }])],
  ['lining too thick', (d) => (d.lining = { thickness: Math.max(d.outer.width, d.outer.height, d.outer.depth) })],
  ['unknown face', (d) => (d.openings = [{ type: 'lead', face: 'inside', x: 10, y: 10, diameter: 5 }])],
  ['unknown axis', (d) => (d.braces = [{ type: 'shelf', axis: 'q', position: 100, thickness: 18 }])],
  ['joinery repeated', (d) => (d.joinery = ['sides', 'sides', 'topBottom'])],
  ['no name', (d) => delete d.name],
];

describe('any invalid design (fast-check)', () => {
  it('one broken rule → ok: false with a field path, never an exception', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2 ** 31 - 1 }), fc.integer({ min: 0, max: mutations.length - 1 }), (seed, m) => {
        const d = JSON.parse(JSON.stringify(randomValidDesign(seed))) as Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
        mutations[m]![1](d, mulberry32(seed));
        const r = planDesign(d);
        expect(r.ok, mutations[m]![0]).toBe(false);
        if (!r.ok) {
          expect(Object.keys(r.fields).length).toBeGreaterThan(0);
          expect(r.message).toContain(Object.keys(r.fields)[0]!);
        }
      }),
      { numRuns: Number(process.env.PROPERTY_RUNS ?? 300) },
    );
  });

  it('anything that is not a design → ok: false, never an exception', () => {
    fc.assert(
      fc.property(fc.anything(), (x) => {
        const r = planDesign(x);
        expect(r.ok).toBe(false);
      }),
      { numRuns: Number(process.env.PROPERTY_RUNS ?? 300) },
    );
  });
});
