/**
 * Helmholtz (vented-box) tuning of a box with one or more ports.
 *
 * fb = (c / 2π) · sqrt( Σ Sᵢ/Leffᵢ / V ), Leff = L + ΔL (sum of the two end corrections).
 * For N identical ports this is the textbook (c/2π)·sqrt(N·S/(V·Leff)).
 * Source: Kinsler, Frey, Coppens & Sanders, Fundamentals of Acoustics, 4th ed. (2000), Helmholtz-resonator
 * section; in vented-box form R.H. Small, JAES 1973 Part I (REFERENCES.md §1). Parallel ports add their
 * acoustic inertances in parallel (REFERENCES.md case helmholtz-two-ports).
 *
 * Inputs and outputs in SI units (m, m², m³, Hz, m/s).
 */

/** How the two ends of a port are corrected for the air moving with the port's air plug. */
export type EndCorrectionRule = 'norris-sheng+levine-schwinger' | 'flanged-free-0.732d' | 'both-flanged-0.85a' | 'both-free-0.6133a';

/** Flanged end (infinite baffle): 0.8216·a — A.N. Norris & I.C. Sheng, J. Sound Vib. 135(1):85–93 (1989). */
export const END_CORRECTION_FLANGED_NORRIS_SHENG = 0.8216;
/** Unflanged (free) end: 0.6133·a — H. Levine & J. Schwinger, Phys. Rev. 73(4):383–406 (1948). */
export const END_CORRECTION_FREE_LEVINE_SCHWINGER = 0.6133;
/** Flanged end, classic: 0.85·a (≈ 8/(3π)·a) — Lord Rayleigh, Theory of Sound (1896) §307; Beranek, Acoustics (1954). */
export const END_CORRECTION_FLANGED_RAYLEIGH = 0.85;
/** One flanged + one free end, total 0.732·d — V. Dickason, Loudspeaker Design Cookbook (vent-length equation, k = 0.732). */
export const END_CORRECTION_FLANGED_FREE_K = 0.732;

/**
 * The default: the port's outer end is flush with the panel (flanged, Norris–Sheng 0.8216·a) and its inner
 * end is free inside the box (Levine–Schwinger 0.6133·a): ΔL = 1.4349·a.
 */
export const DEFAULT_END_CORRECTION: EndCorrectionRule = 'norris-sheng+levine-schwinger';

/** Total end correction ΔL (both ends) for a port of radius `radiusM`, in metres. */
export function endCorrectionM(radiusM: number, rule: EndCorrectionRule = DEFAULT_END_CORRECTION): number {
  switch (rule) {
    case 'norris-sheng+levine-schwinger':
      return (END_CORRECTION_FLANGED_NORRIS_SHENG + END_CORRECTION_FREE_LEVINE_SCHWINGER) * radiusM;
    case 'flanged-free-0.732d':
      return END_CORRECTION_FLANGED_FREE_K * 2 * radiusM;
    case 'both-flanged-0.85a':
      return 2 * END_CORRECTION_FLANGED_RAYLEIGH * radiusM;
    case 'both-free-0.6133a':
      return 2 * END_CORRECTION_FREE_LEVINE_SCHWINGER * radiusM;
  }
}

/** Equal-area round diameter of a slot w × h: d = 2·sqrt(w·h/π) (common practice; REFERENCES.md §1). */
export function slotEquivalentDiameter(width: number, height: number): number {
  return 2 * Math.sqrt((width * height) / Math.PI);
}

export function circleArea(diameter: number): number {
  return (Math.PI * diameter * diameter) / 4;
}

/** One port as the Helmholtz formula sees it. */
export interface PortAcoustic {
  /** Inner cross-section area, m². */
  areaM2: number;
  /** Physical length, m. */
  lengthM: number;
  /** Total end correction ΔL, m. */
  endCorrectionM: number;
}

/** A round port of inner diameter d (m) and length L (m). */
export function roundPort(diameterM: number, lengthM: number, rule: EndCorrectionRule = DEFAULT_END_CORRECTION): PortAcoustic {
  return { areaM2: circleArea(diameterM), lengthM, endCorrectionM: endCorrectionM(diameterM / 2, rule) };
}

/** A slot port w × h (m): its end correction uses the equal-area round diameter. */
export function slotPort(widthM: number, heightM: number, lengthM: number, rule: EndCorrectionRule = DEFAULT_END_CORRECTION): PortAcoustic {
  return { areaM2: widthM * heightM, lengthM, endCorrectionM: endCorrectionM(slotEquivalentDiameter(widthM, heightM) / 2, rule) };
}

/** Σ S/Leff over the ports, m. */
export function portConductanceM(ports: readonly PortAcoustic[]): number {
  let g = 0;
  for (const p of ports) g += p.areaM2 / (p.lengthM + p.endCorrectionM);
  return g;
}

/** Helmholtz tuning fb (Hz) of volume V (m³) with the given ports, speed of sound c (m/s). */
export function helmholtzHz(volumeM3: number, ports: readonly PortAcoustic[], speedOfSoundMs: number): number {
  return (speedOfSoundMs / (2 * Math.PI)) * Math.sqrt(portConductanceM(ports) / volumeM3);
}

/**
 * Physical length (m) of each of N identical ports for a target tuning, with a fixed volume:
 * L = N·S·c²/(4π²·fb²·V) − ΔL (the Helmholtz formula solved for L).
 */
export function portLengthForTuningM(
  volumeM3: number,
  targetHz: number,
  areaM2: number,
  endCorrection: number,
  speedOfSoundMs: number,
  count = 1,
): number {
  const leff = (count * areaM2 * speedOfSoundMs * speedOfSoundMs) / (4 * Math.PI * Math.PI * targetHz * targetHz * volumeM3);
  return leff - endCorrection;
}
