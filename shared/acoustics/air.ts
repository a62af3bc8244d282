/**
 * Properties of dry air. Inputs and outputs in SI units.
 * Sources: REFERENCES.md §2 (see each function).
 */

/** 0 °C in kelvin. */
export const KELVIN_OFFSET = 273.15;

/**
 * Speed of sound in dry air, c = 331.3·sqrt(1 + T/273.15) m/s, T in °C.
 * Ideal gas with γ = 1.4 (Kinsler, Frey, Coppens & Sanders, Fundamentals of Acoustics, 4th ed. 2000, ch. 5;
 * REFERENCES.md §2). The project's default formula.
 */
export function speedOfSoundMs(temperatureC: number): number {
  return 331.3 * Math.sqrt(1 + temperatureC / KELVIN_OFFSET);
}

/** Speed of sound by the ISO 9613-1:1993 annex form c = 343.2·sqrt(T/293.15 K) m/s (REFERENCES.md §2). */
export function speedOfSoundIso9613Ms(temperatureC: number): number {
  return 343.2 * Math.sqrt((temperatureC + KELVIN_OFFSET) / 293.15);
}

/** Specific gas constant of dry air, J/(kg·K) (REFERENCES.md §2). */
export const R_DRY_AIR = 287.05;
/** Standard sea-level pressure, Pa. */
export const STANDARD_PRESSURE_PA = 101_325;

/** Density of dry air ρ = p/(R·T), kg/m³ (ideal gas law; REFERENCES.md §2). */
export function airDensityKgM3(temperatureC: number, pressurePa = STANDARD_PRESSURE_PA): number {
  return pressurePa / (R_DRY_AIR * (temperatureC + KELVIN_OFFSET));
}

/** Ratio of specific heats of air, γ (REFERENCES.md §5). */
export const GAMMA_AIR = 1.4;
/** Specific heat of air at constant volume, J/(kg·K) (REFERENCES.md §5, typical value). */
export const CV_AIR = 718;
