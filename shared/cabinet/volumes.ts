/**
 * Volumes (PRODUCT.md §3): gross internal − braces (solid, windows excluded) − port tubes' outer volume
 * inside the cavity − drivers' stated displacement − the lining's fibre volume = net. Litres.
 */
import type { Design } from '../schemas/design.schema.js';
import type { LiningTotals, Volumes } from '../schemas/plan.types.js';
import { fibreVolumeM3, apparentVolumeLeachM3 } from '../acoustics/fill.js';
import { airDensityKgM3 } from '../acoustics/air.js';
import { AXIS_INDEX, cavitySize, type Frame } from './frame.js';
import { OTHER_AXES, cutoutArea, portTube, windowCutout } from './elements.js';

const MM3_PER_LITRE = 1e6;

export function grossLitres(frame: Frame): number {
  const [a, b, c] = cavitySize(frame);
  return (a * b * c) / MM3_PER_LITRE;
}

export function bracesLitres(design: Design, frame: Frame): number {
  const size = cavitySize(frame);
  let mm3 = 0;
  for (const b of design.braces) {
    if (b.type === 'shelf') {
      const [ua, va] = OTHER_AXES[b.axis];
      let area = size[AXIS_INDEX[ua]] * size[AXIS_INDEX[va]];
      for (const w of b.windows) area -= cutoutArea(windowCutout(frame, b, w));
      mm3 += Math.max(0, area) * b.thickness;
    } else {
      mm3 += b.section[0] * b.section[1] * size[AXIS_INDEX[b.axis]];
    }
  }
  return mm3 / MM3_PER_LITRE;
}

export function portsLitres(design: Design, frame: Frame): number {
  let mm3 = 0;
  for (const o of design.openings) {
    if (o.type === 'port') {
      const tube = portTube(frame, o);
      mm3 += tube.outerAreaMm2 * tube.insideLengthMm;
    }
  }
  return mm3 / MM3_PER_LITRE;
}

export function driversLitres(design: Design): number {
  let l = 0;
  for (const o of design.openings) if (o.type === 'driver') l += o.displacementLitres;
  return l;
}

/** Fibre volume of the lining: lining volume × fill density / fibre density (polyester 1380 kg/m³, REFERENCES.md §5). */
export function liningFibreLitres(design: Design, totals: LiningTotals): number {
  if (!design.lining) return 0;
  return fibreVolumeM3(totals.volumeLitres / 1000, design.lining.density) * 1000;
}

export function computeVolumes(design: Design, frame: Frame, lining: LiningTotals): Volumes {
  const gross = grossLitres(frame);
  const braces = bracesLitres(design, frame);
  const port = portsLitres(design, frame);
  const drivers = driversLitres(design);
  const fibre = liningFibreLitres(design, lining);
  const net = gross - braces - port - drivers - fibre;
  const volumes: Volumes = {
    grossLitres: gross,
    bracesLitres: braces,
    portLitres: port,
    driversLitres: drivers,
    liningFibreLitres: fibre,
    netLitres: net,
  };
  if (design.lining && lining.massKg > 0 && net > 0) {
    // Estimate (Leach model, REFERENCES.md §5), applied only to the layer the lining fills: the air inside
    // the batt is pushed towards isothermal compression, the open air in the middle of the box stays
    // adiabatic. Compliances of the two parts add, so their apparent volumes add.
    const layerLitres = Math.min(lining.volumeLitres, net + fibre);
    const openAirLitres = net + fibre - layerLitres;
    volumes.apparentLitresEstimate =
      openAirLitres +
      apparentVolumeLeachM3({
        boxVolumeM3: layerLitres / 1000,
        fillMassKg: lining.massKg,
        airDensityKgM3: airDensityKgM3(design.airTemperatureC),
      }) *
        1000;
  }
  return volumes;
}
