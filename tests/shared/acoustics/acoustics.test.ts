import { describe, expect, it } from 'vitest';
import { airDensityKgM3, speedOfSoundIso9613Ms, speedOfSoundMs } from '../../../shared/acoustics/air.js';
import {
  endCorrectionM,
  helmholtzHz,
  portLengthForTuningM,
  roundPort,
  slotEquivalentDiameter,
  type PortAcoustic,
} from '../../../shared/acoustics/helmholtz.js';
import { apparentVolumeLeachM3, fibreVolumeM3 } from '../../../shared/acoustics/fill.js';
import { audiblePortSpeedLimitMs, peakPortAirSpeedMs } from '../../../shared/acoustics/port-velocity.js';
import { fixtureCases, num, referenceCase, siblingCases, within } from './reference-cases.js';

describe('reference cases file', () => {
  it('the fixture copy matches ../shared/reference-check-cases.json for every case it holds', () => {
    if (siblingCases === null) return; // CI without the sibling folder: the copy is the source
    for (const c of fixtureCases) {
      expect(siblingCases.find((s) => s.id === c.id)).toEqual(c);
    }
  });
});

describe('speed of sound (REFERENCES §2)', () => {
  // c = 331.3·sqrt(1 + T/273.15): ideal gas, Kinsler, Frey et al., Fundamentals of Acoustics 4th ed. ch. 5.
  for (const id of ['sound-speed-331-0C', 'sound-speed-331-20C', 'sound-speed-331-25C']) {
    it(`${id}: ${referenceCase(id).source}`, () => {
      const c = referenceCase(id);
      const got = speedOfSoundMs(num(c.inputs.T_C));
      expect(within(c, got, num(c.expected)), `${got} vs ${String(c.expected)}`).toBe(true);
    });
  }
  // ISO 9613-1:1993 annex form c = 343.2·sqrt(T/293.15) (from memory per REFERENCES).
  for (const id of ['sound-speed-iso9613-0C', 'sound-speed-iso9613-20C', 'sound-speed-iso9613-25C']) {
    it(`${id}: ISO 9613-1 form`, () => {
      const c = referenceCase(id);
      const got = speedOfSoundIso9613Ms(num(c.inputs.T_C));
      expect(within(c, got, num(c.expected))).toBe(true);
    });
  }
  it('the two conventions agree within 0.05 % over -20…40 °C (REFERENCES §2 note)', () => {
    for (let t = -20; t <= 40; t += 5) {
      expect(Math.abs(speedOfSoundMs(t) / speedOfSoundIso9613Ms(t) - 1)).toBeLessThan(5e-4);
    }
  });
  it('air density by the ideal gas law (REFERENCES §2, sengpielaudio worked value at 15 °C)', () => {
    for (const id of ['air-density-20C', 'air-density-15C']) {
      const c = referenceCase(id);
      expect(within(c, airDensityKgM3(num(c.inputs.T_C)), num(c.expected))).toBe(true);
    }
  });
});

function port(c: ReturnType<typeof referenceCase>, endCorrection: number): PortAcoustic {
  const d = num(c.inputs.port_diameter_m);
  return { areaM2: (Math.PI * d * d) / 4, lengthM: num(c.inputs.port_length_m), endCorrectionM: endCorrection };
}

describe('Helmholtz tuning and end corrections (REFERENCES §1; Kinsler, Frey, Coppens & Sanders 4th ed.)', () => {
  it('helmholtz-A: one flanged + one free end, 0.732·d (Dickason, Loudspeaker Design Cookbook, from memory)', () => {
    const c = referenceCase('helmholtz-A-one-flanged');
    const d = num(c.inputs.port_diameter_m);
    const got = helmholtzHz(num(c.inputs.V_m3), [roundPort(d, num(c.inputs.port_length_m), 'flanged-free-0.732d')], num(c.inputs.c_m_s));
    expect(within(c, got, num(c.expected))).toBe(true);
    expect(endCorrectionM(d / 2, 'flanged-free-0.732d') + num(c.inputs.port_length_m)).toBeCloseTo(num(c.inputs.Leff_m), 6);
  });
  it('helmholtz-B: both ends flanged, 0.85·a each (Rayleigh, Theory of Sound §307)', () => {
    const c = referenceCase('helmholtz-B-both-flanged');
    const d = num(c.inputs.port_diameter_m);
    const got = helmholtzHz(num(c.inputs.V_m3), [roundPort(d, num(c.inputs.port_length_m), 'both-flanged-0.85a')], num(c.inputs.c_m_s));
    expect(within(c, got, num(c.expected))).toBe(true);
  });
  it('helmholtz-C: both ends free, 0.6133·a each (Levine & Schwinger, Phys. Rev. 73, 1948)', () => {
    const c = referenceCase('helmholtz-C-both-unflanged');
    const d = num(c.inputs.port_diameter_m);
    const got = helmholtzHz(num(c.inputs.V_m3), [roundPort(d, num(c.inputs.port_length_m), 'both-free-0.6133a')], num(c.inputs.c_m_s));
    expect(within(c, got, num(c.expected))).toBe(true);
  });
  it('helmholtz-D (the default): 0.8216·a flanged (Norris & Sheng, JSV 1989) + 0.6133·a free (Levine & Schwinger 1948)', () => {
    const c = referenceCase('helmholtz-D-LS-plus-flanged');
    const d = num(c.inputs.port_diameter_m);
    const got = helmholtzHz(num(c.inputs.V_m3), [roundPort(d, num(c.inputs.port_length_m))], num(c.inputs.c_m_s));
    expect(within(c, got, num(c.expected))).toBe(true);
    expect(roundPort(d, 0).endCorrectionM).toBeCloseTo(num(c.inputs.Leff_m) - num(c.inputs.port_length_m), 6);
  });
  it('two identical ports: parallel acoustic masses, N·S (REFERENCES case helmholtz-two-ports)', () => {
    const c = referenceCase('helmholtz-two-ports');
    const d = num(c.inputs.port_diameter_m);
    const one = roundPort(d, num(c.inputs.port_length_m), 'flanged-free-0.732d');
    const got = helmholtzHz(num(c.inputs.V_m3), [one, one], num(c.inputs.c_m_s));
    expect(within(c, got, num(c.expected))).toBe(true);
    expect(one.lengthM + one.endCorrectionM).toBeCloseTo(num(c.inputs.Leff_m), 6);
  });
  it('vent length for a target tuning (Helmholtz solved for L, k = 0.732, REFERENCES case vent-length-for-target)', () => {
    const c = referenceCase('vent-length-for-target');
    const d = num(c.inputs.port_diameter_m);
    const got = portLengthForTuningM(
      num(c.inputs.V_m3),
      num(c.inputs.fb_Hz),
      (Math.PI * d * d) / 4,
      endCorrectionM(d / 2, 'flanged-free-0.732d'),
      num(c.inputs.c_m_s),
    );
    expect(within(c, got, num(c.expected))).toBe(true);
    // and back: that length tunes to the target
    expect(helmholtzHz(num(c.inputs.V_m3), [roundPort(d, got, 'flanged-free-0.732d')], num(c.inputs.c_m_s))).toBeCloseTo(num(c.inputs.fb_Hz), 6);
  });
  it('slot port: equal-area round diameter 2·sqrt(w·h/π) (common practice, REFERENCES §1)', () => {
    const c = referenceCase('slot-equivalent-diameter');
    expect(within(c, slotEquivalentDiameter(num(c.inputs.w_m), num(c.inputs.h_m)), num(c.expected))).toBe(true);
  });
  it('the inverse uses the same port as the forward formula for any rule (round trip)', () => {
    for (const rule of ['norris-sheng+levine-schwinger', 'flanged-free-0.732d', 'both-flanged-0.85a', 'both-free-0.6133a'] as const) {
      const p = roundPort(0.07, 0, rule);
      const L = portLengthForTuningM(0.05, 30, p.areaM2, p.endCorrectionM, 343.2, 2);
      expect(helmholtzHz(0.05, [roundPort(0.07, L, rule), roundPort(0.07, L, rule)], 343.2)).toBeCloseTo(30, 9);
    }
  });
});

describe('port air speed (REFERENCES §6)', () => {
  it('port-velocity-lumped: v = Sd·ξ·2πf / (Sv·|1−(f/fb)²|) (lumped model, Beranek 1954 / Small 1973)', () => {
    const c = referenceCase('port-velocity-lumped');
    const d = num(c.inputs.port_diameter_m);
    const got = peakPortAirSpeedMs(num(c.inputs.Sd_m2), num(c.inputs.peak_cone_excursion_m), num(c.inputs.f_Hz), num(c.inputs.fb_Hz), (Math.PI * d * d) / 4);
    expect(within(c, got, num(c.expected))).toBe(true);
  });
  it('port-velocity-limit-5pct: warning threshold 5 % of c (forum attribution to Small; Salvatti et al. JAES 2002 use 10 m/s)', () => {
    const c = referenceCase('port-velocity-limit-5pct');
    expect(within(c, audiblePortSpeedLimitMs(num(c.inputs.c_m_s)), num(c.expected))).toBe(true);
  });
});

describe('fibre fill (REFERENCES §5)', () => {
  it('fill-leach-polyester: Leach model apparent volume (W.M. Leach Jr., Introduction to Electroacoustics)', () => {
    const c = referenceCase('fill-leach-polyester');
    const exp = c.expected as { V_AB_m3: number; ratio_V_AB_over_VB: number };
    const got = apparentVolumeLeachM3({
      boxVolumeM3: num(c.inputs.VB_m3),
      fillMassKg: num(c.inputs.fill_mass_kg),
      airDensityKgM3: num(c.inputs.rho0),
      fibreDensityKgM3: num(c.inputs.fibre_solid_density_kg_m3),
      fibreSpecificHeatJKgK: num(c.inputs.fibre_specific_heat_J_kgK),
      airSpecificHeatJKgK: num(c.inputs.cv_air_J_kgK),
      gamma: num(c.inputs.gamma),
    });
    expect(within(c, got, exp.V_AB_m3, 'rel')).toBe(true);
    expect(within(c, got / num(c.inputs.VB_m3), exp.ratio_V_AB_over_VB, 'rel')).toBe(true);
  });
  it('fill-isothermal-limit: at most γ = 1.4 times the volume (adiabatic → isothermal, Beranek 1954, from memory)', () => {
    const c = referenceCase('fill-isothermal-limit');
    const exp = c.expected as { ratio: number };
    // a fill with a huge heat capacity and negligible solid volume reaches the isothermal limit
    const got = apparentVolumeLeachM3({ boxVolumeM3: 0.05, fillMassKg: 1e-3, airDensityKgM3: 1.2041, fibreDensityKgM3: 1e9, fibreSpecificHeatJKgK: 1e12 });
    expect(got / 0.05).toBeCloseTo(exp.ratio, 6);
    // and never more, whatever the fill
    for (const m of [0.01, 0.1, 1, 5]) expect(apparentVolumeLeachM3({ boxVolumeM3: 0.05, fillMassKg: m, airDensityKgM3: 1.2 }) / 0.05).toBeLessThan(1.4);
  });
  it('fibre volume = lining volume × fill density / fibre density (PRODUCT §3; polyester 1380 kg/m³, REFERENCES §5)', () => {
    // 1 lb per cubic foot rule of thumb = 16.018 kg/m³ (REFERENCES case fill-rule-1lb-ft3)
    const c = referenceCase('fill-rule-1lb-ft3');
    const density = num(c.inputs.lb_kg) / num(c.inputs.ft3_m3);
    expect(within(c, density, num(c.expected))).toBe(true);
    expect(fibreVolumeM3(0.01, density)).toBeCloseTo((0.01 * 16.018) / 1380, 8);
  });
});
