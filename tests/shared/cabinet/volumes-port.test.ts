import { describe, expect, it } from 'vitest';
import { DEMO_BOOKSHELF } from '../../../shared/demo/designs.js';
import { codes, mustPlan, plainBox } from './helpers.js';

/** Speed of sound at T °C, c = 331.3·sqrt(1 + T/273.15) (REFERENCES §2). */
const c = (T: number) => 331.3 * Math.sqrt(1 + T / 273.15);
/** Helmholtz fb = (c/2π)·sqrt(Σ S/Leff / V) (Kinsler, Frey et al. 4th ed.; REFERENCES §1). SI units. */
const fb = (cMs: number, vM3: number, ports: { S: number; Leff: number }[]) =>
  (cMs / (2 * Math.PI)) * Math.sqrt(ports.reduce((s, p) => s + p.S / p.Leff, 0) / vM3);

describe('volumes (PRODUCT §3)', () => {
  it('bookshelf: gross, brace (window excluded), port tube outside, drivers, fibre and net, by hand', () => {
    const plan = mustPlan(DEMO_BOOKSHELF);
    const v = plan.volumes;
    // 220 × 360 × 260 outside, 18 mm everywhere: cavity 184 × 324 × 224 mm
    expect(v.grossLitres).toBeCloseTo((184 * 324 * 224) / 1e6, 9);
    // shelf brace: (184 × 224 − 110 × 120 window) × 18
    expect(v.bracesLitres).toBeCloseTo(((184 * 224 - 110 * 120) * 18) / 1e6, 9);
    // port: outer radius 25 + 3, inside length 120 − 18 (the back panel)
    expect(v.portLitres).toBeCloseTo((Math.PI * 28 * 28 * (120 - 18)) / 1e6, 9);
    expect(v.driversLitres).toBeCloseTo(0.35, 12);
    // fibre: lining volume × 20 kg/m³ / 1380 kg/m³ (polyester fibre, REFERENCES §5)
    expect(v.liningFibreLitres).toBeCloseTo((plan.lining!.volumeLitres * 20) / 1380, 9);
    expect(v.netLitres).toBeCloseTo(v.grossLitres - v.bracesLitres - v.portLitres - v.driversLitres - v.liningFibreLitres, 12);
  });

  it('bar braces count their full length across the cavity; round windows count πd²/4', () => {
    const plan = mustPlan(
      plainBox({
        braces: [
          { type: 'bar', axis: 'z', at: [150, 250], section: [30, 20] },
          { type: 'shelf', axis: 'y', position: 200, thickness: 18, windows: [{ shape: 'round', u: 150, v: 175, diameter: 100 }] },
        ],
      }),
    );
    expect(plan.volumes.bracesLitres).toBeCloseTo((30 * 20 * 314 + (264 * 314 - (Math.PI * 100 * 100) / 4) * 18) / 1e6, 9);
  });

  it('apparent volume with lining is an estimate (Leach model): above net, below γ = 1.4 times the air volume', () => {
    const v = mustPlan(DEMO_BOOKSHELF).volumes;
    expect(v.apparentLitresEstimate).toBeDefined();
    expect(v.apparentLitresEstimate!).toBeGreaterThan(v.netLitres);
    expect(v.apparentLitresEstimate! / v.netLitres).toBeLessThan(1.4);
    // no lining → no estimate
    expect(mustPlan(plainBox()).volumes.apparentLitresEstimate).toBeUndefined();
  });

  it('only the lined layer gains: the open air in the middle of the box stays adiabatic', () => {
    // Leach model applied to the lining layer only (REFERENCES §5). A thin lining in a large box gains
    // little, as reported for wall linings in vented boxes (REFERENCES §5, common practice).
    const big = mustPlan(
      plainBox({ outer: { width: 500, height: 800, depth: 500 }, lining: { thickness: 10, faces: ['left', 'right', 'top', 'bottom', 'back'] } }),
    ).volumes;
    const gain = big.apparentLitresEstimate! / big.netLitres - 1;
    expect(gain).toBeGreaterThan(0);
    expect(gain).toBeLessThan(0.1);
    // the gain of the layer never exceeds γ − 1 = 0.4 of the layer's own volume (adiabatic → isothermal limit)
    const plan = mustPlan(DEMO_BOOKSHELF);
    expect(plan.volumes.apparentLitresEstimate! - plan.volumes.netLitres).toBeLessThan(0.4 * plan.lining!.volumeLitres);
  });
});

describe('port tuning in the plan', () => {
  const portBox = (over: Record<string, unknown> = {}) =>
    plainBox({ openings: [{ type: 'port', face: 'back', x: 150, y: 120, diameter: 70, wall: 3, length: 160, ...over }] });

  it('Helmholtz with the net volume; default end corrections 0.8216a (Norris–Sheng) + 0.6133a (Levine–Schwinger)', () => {
    const plan = mustPlan(portBox());
    const v = plan.volumes.netLitres / 1000;
    const a = 0.035;
    const exp = fb(c(20), v, [{ S: Math.PI * a * a, Leff: 0.16 + (0.8216 + 0.6133) * a }]);
    expect(plan.port!.tuningHz).toBeCloseTo(exp, 9);
    expect(plan.port!.effectiveLengthMm).toBeCloseTo(160 + 1.4349 * 35, 9);
    expect(plan.port!.speedOfSoundMs).toBeCloseTo(343.2146, 3);
  });

  it('the 0.732·d convention stays selectable (Dickason, Loudspeaker Design Cookbook, from memory)', () => {
    const plan = mustPlan(portBox(), { endCorrection: 'flanged-free-0.732d' });
    expect(plan.port!.effectiveLengthMm).toBeCloseTo(160 + 0.732 * 70, 9);
    const exp = fb(c(20), plan.volumes.netLitres / 1000, [{ S: Math.PI * 0.035 ** 2, Leff: 0.16 + 0.732 * 0.07 }]);
    expect(plan.port!.tuningHz).toBeCloseTo(exp, 9);
  });

  it('air temperature changes c and the tuning in proportion (REFERENCES §2)', () => {
    const cold = mustPlan({ ...portBox(), airTemperatureC: 0 }).port!;
    const warm = mustPlan({ ...portBox(), airTemperatureC: 35 }).port!;
    expect(warm.tuningHz / cold.tuningHz).toBeCloseTo(c(35) / c(0), 9);
    expect(cold.speedOfSoundMs).toBeCloseTo(331.3, 9);
  });

  it('a slot port: S = w·h, end correction from the equal-area round diameter (common practice, REFERENCES §1)', () => {
    const plan = mustPlan(plainBox({ openings: [{ type: 'port', face: 'front', shape: 'slot', x: 150, y: 60, width: 200, height: 40, length: 150 }] }));
    const a = Math.sqrt((0.2 * 0.04) / Math.PI);
    const exp = fb(c(20), plan.volumes.netLitres / 1000, [{ S: 0.2 * 0.04, Leff: 0.15 + 1.4349 * a }]);
    expect(plan.port!.tuningHz).toBeCloseTo(exp, 9);
    expect(plan.port!.areaMm2).toBeCloseTo(8000, 9);
  });

  it('several ports: parallel, Σ S/Leff (N·S for identical ports)', () => {
    const two = plainBox({
      openings: [
        { type: 'port', face: 'back', x: 80, y: 120, diameter: 60, length: 150 },
        { type: 'port', face: 'back', x: 220, y: 120, diameter: 60, length: 150 },
      ],
    });
    const plan = mustPlan(two);
    const a = 0.03;
    const one = { S: Math.PI * a * a, Leff: 0.15 + 1.4349 * a };
    expect(plan.port!.tuningHz).toBeCloseTo(fb(c(20), plan.volumes.netLitres / 1000, [one, one]), 9);
    expect(plan.port!.effectiveLengthMm).toBeCloseTo(one.Leff * 1000, 9);
  });

  it('length for a target tuning: planning again with that length hits the target (tube volume included)', () => {
    const plan = mustPlan(portBox({ targetHz: 45 }));
    const L = plan.port!.lengthForTargetMm!;
    expect(L).toBeGreaterThan(18);
    const again = mustPlan(portBox({ length: L }));
    expect(again.port!.tuningHz).toBeCloseTo(45, 6);
    expect(plan.port!.targetHz).toBe(45);
  });

  it('a target no length can reach is a warning, not silence', () => {
    expect(codes(mustPlan(portBox({ targetHz: 5 })))).toContain('target_unreachable');
    expect(codes(mustPlan(portBox({ targetHz: 400 })))).toContain('target_unreachable');
  });

  it('peak air speed from cone area and excursion, lumped model at fb/2 (REFERENCES §6); warning above 5 % of c', () => {
    const driver = { type: 'driver', face: 'front', x: 150, y: 330, diameter: 180, coneAreaCm2: 220, excursionMm: 8 } as const;
    const small = mustPlan(plainBox({ openings: [driver, { type: 'port', face: 'back', x: 150, y: 120, diameter: 30, length: 100 }] }));
    const fbHz = small.port!.tuningHz;
    const f = fbHz / 2;
    const expSpeed = (0.022 * 0.008 * 2 * Math.PI * f) / (Math.PI * 0.015 ** 2 * Math.abs(1 - 0.25));
    expect(small.port!.peakAirSpeedMs).toBeCloseTo(expSpeed, 9);
    expect(expSpeed).toBeGreaterThan(0.05 * c(20));
    expect(codes(small)).toContain('port_air_speed');
    const big = mustPlan(plainBox({ openings: [driver, { type: 'port', face: 'back', x: 150, y: 120, diameter: 100, length: 200 }] }));
    expect(big.port!.peakAirSpeedMs!).toBeLessThan(0.05 * c(20));
    expect(codes(big)).not.toContain('port_air_speed');
  });

  it('no port → port is null', () => {
    expect(mustPlan(plainBox()).port).toBeNull();
  });
});
