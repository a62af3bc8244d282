/**
 * Damping fill (lining) and its effect on the box volume. SI units.
 */
import { CV_AIR, GAMMA_AIR } from './air.js';

/** Solid density of polyester fibre, kg/m³ (REFERENCES.md §5, typical value). */
export const POLYESTER_FIBRE_DENSITY_KG_M3 = 1380;
/** Specific heat of polyester fibre, J/(kg·K) (REFERENCES.md §5, typical value). */
export const POLYESTER_SPECIFIC_HEAT_J_KGK = 1200;

/** Solid volume of the fibres: lining volume × fill density / fibre density (PRODUCT.md §3). */
export function fibreVolumeM3(liningVolumeM3: number, fillDensityKgM3: number, fibreDensityKgM3 = POLYESTER_FIBRE_DENSITY_KG_M3): number {
  return (liningVolumeM3 * fillDensityKgM3) / fibreDensityKgM3;
}

export interface LeachInputs {
  /** Box volume holding air and fill, m³. */
  boxVolumeM3: number;
  /** Fill mass, kg. */
  fillMassKg: number;
  /** Air density ρ0, kg/m³. */
  airDensityKgM3: number;
  fibreDensityKgM3?: number;
  fibreSpecificHeatJKgK?: number;
  airSpecificHeatJKgK?: number;
  gamma?: number;
}

/**
 * Apparent (acoustic) volume of a box with fibre fill — an ESTIMATE, the ideal thermal-contact model of
 * W.M. Leach Jr., Introduction to Electroacoustics and Audio Amplifier Design (REFERENCES.md §5):
 * V_AB = VB·(1 − Vf/VB)·[1 + (γ−1) / (1 + γ·(VB/Vf − 1)·(ρ0·c_air)/(ρ_fill·c_fill))],
 * with Vf = fill mass / solid fibre density. It assumes the fill spreads through the box; a wall lining
 * gains less, so treat the result as an upper estimate.
 */
export function apparentVolumeLeachM3(inp: LeachInputs): number {
  const rhoFill = inp.fibreDensityKgM3 ?? POLYESTER_FIBRE_DENSITY_KG_M3;
  const cFill = inp.fibreSpecificHeatJKgK ?? POLYESTER_SPECIFIC_HEAT_J_KGK;
  const cAir = inp.airSpecificHeatJKgK ?? CV_AIR;
  const gamma = inp.gamma ?? GAMMA_AIR;
  const vb = inp.boxVolumeM3;
  const vf = inp.fillMassKg / rhoFill;
  if (vf <= 0) return vb;
  const factor = 1 + (gamma - 1) / (1 + gamma * (vb / vf - 1) * ((inp.airDensityKgM3 * cAir) / (rhoFill * cFill)));
  return vb * (1 - vf / vb) * factor;
}
