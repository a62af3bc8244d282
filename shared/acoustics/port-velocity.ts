/**
 * Peak air speed in a vent, lumped lossless vented-box model (Beranek, Acoustics 1954; Small, JAES 1973;
 * REFERENCES.md §6): the vent carries U_v = U_c / (1 − (f/fb)²) with U_c = Sd·ξ·2πf, so
 * v = Sd·ξ·2πf / (Sv·|1 − (f/fb)²|). SI units.
 */

export function peakPortAirSpeedMs(
  coneAreaM2: number,
  peakExcursionM: number,
  frequencyHz: number,
  tuningHz: number,
  portAreaM2: number,
): number {
  const ratio = frequencyHz / tuningHz;
  const denom = portAreaM2 * Math.abs(1 - ratio * ratio);
  if (denom === 0) return Infinity;
  return (coneAreaM2 * peakExcursionM * 2 * Math.PI * frequencyHz) / denom;
}

/**
 * Where the plan evaluates the air speed: one octave below the tuning (f = fb/2), with every driver that
 * states its cone area and excursion at its excursion limit. A stated estimate (the model has no driver
 * parameters; at fb itself it diverges).
 */
export const PORT_SPEED_FREQUENCY_RATIO = 0.5;

/**
 * Rule of thumb: keep the peak port air speed below about 5 % of the speed of sound (≈ 17 m/s at 20 °C),
 * or port noise becomes audible (REFERENCES.md §6: a 5 % rule attributed to Small in forum sources; more
 * cautious designers use ≈ 10 m/s, Salvatti, Devantier & Button, JAES 50(1/2), 2002). A warning, not a limit.
 */
export const AUDIBLE_PORT_SPEED_FRACTION_OF_C = 0.05;

export function audiblePortSpeedLimitMs(speedOfSoundMs: number): number {
  return AUDIBLE_PORT_SPEED_FRACTION_OF_C * speedOfSoundMs;
}
