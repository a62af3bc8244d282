/**
 * Demo designs of the invented scenario in PRODUCT.md §9 (Harbour Lane Audio). Invented data, for
 * the demo seed, examples and benchmarks only; tests check the engine against outside sources.
 */
import type { DesignInput } from '../schemas/design.schema.js';

/** Two-way bookshelf cabinet, built as a pair: rear port, one horizontal shelf brace. */
export const DEMO_BOOKSHELF: DesignInput = {
  name: 'Harbour bookshelf (two-way, rear port)',
  outer: { width: 220, height: 360, depth: 260 },
  material: { name: 'MDF', thickness: 18, density: 750 },
  baffleThickness: 18,
  joinery: ['frontBack', 'sides', 'topBottom'],
  braces: [
    {
      type: 'shelf',
      axis: 'y',
      position: 215,
      thickness: 18,
      windows: [{ shape: 'rect', u: 110, v: 130, width: 110, height: 120 }],
    },
  ],
  openings: [
    {
      type: 'driver',
      face: 'front',
      x: 110,
      y: 135,
      diameter: 118,
      displacementLitres: 0.3,
      rebate: { diameter: 134, depth: 5 },
      screwHoles: { count: 4, circleDiameter: 126, holeDiameter: 4 },
      coneAreaCm2: 85,
      excursionMm: 4,
    },
    { type: 'driver', face: 'front', x: 110, y: 285, diameter: 75, displacementLitres: 0.05, rebate: { diameter: 104, depth: 4 } },
    { type: 'port', face: 'back', shape: 'round', x: 110, y: 90, diameter: 50, wall: 3, length: 120, targetHz: 55 },
    { type: 'terminal', face: 'back', x: 110, y: 290, width: 60, height: 60 },
  ],
  lining: { thickness: 50, faces: ['left', 'right', 'top', 'bottom', 'back'], crush: 5, density: 20 },
  airTemperatureC: 20,
};

/** Slim floor-standing cabinet, built as a batch of four: two shelf braces, front port, double baffle. */
export const DEMO_FLOORSTANDER: DesignInput = {
  name: 'Harbour slim floorstander',
  outer: { width: 200, height: 1000, depth: 300 },
  material: { name: 'MDF', thickness: 18, density: 750 },
  baffleThickness: 25,
  joinery: ['frontBack', 'sides', 'topBottom'],
  braces: [
    {
      type: 'shelf',
      axis: 'y',
      position: 380,
      thickness: 18,
      windows: [
        { shape: 'round', u: 100, v: 110, diameter: 90 },
        { shape: 'round', u: 100, v: 220, diameter: 70 },
      ],
    },
    {
      type: 'shelf',
      axis: 'y',
      position: 620,
      thickness: 18,
      windows: [
        { shape: 'round', u: 100, v: 110, diameter: 90 },
        { shape: 'round', u: 100, v: 220, diameter: 70 },
      ],
    },
  ],
  openings: [
    { type: 'driver', face: 'front', x: 100, y: 880, diameter: 75, displacementLitres: 0.05, rebate: { diameter: 104, depth: 4 } },
    {
      type: 'driver',
      face: 'front',
      x: 100,
      y: 760,
      diameter: 118,
      displacementLitres: 0.3,
      rebate: { diameter: 134, depth: 5 },
      screwHoles: { count: 4, circleDiameter: 126, holeDiameter: 4 },
      coneAreaCm2: 85,
      excursionMm: 4,
    },
    {
      type: 'driver',
      face: 'front',
      x: 100,
      y: 500,
      diameter: 118,
      displacementLitres: 0.3,
      rebate: { diameter: 134, depth: 5 },
      screwHoles: { count: 4, circleDiameter: 126, holeDiameter: 4 },
      coneAreaCm2: 85,
      excursionMm: 4,
    },
    { type: 'port', face: 'front', shape: 'round', x: 100, y: 150, diameter: 70, wall: 3, length: 150, targetHz: 40 },
    { type: 'terminal', face: 'back', x: 100, y: 120, width: 60, height: 60 },
  ],
  lining: { thickness: 50, faces: ['left', 'right', 'top', 'bottom', 'back'], crush: 5, density: 20 },
  airTemperatureC: 20,
};

export const DEMO_DESIGNS: readonly DesignInput[] = [DEMO_BOOKSHELF, DEMO_FLOORSTANDER];
