/**
 * Starting values for new designs and for items added to a design. Plain trade defaults (common practice):
 * 18 mm MDF, 50 mm polyester lining on every face but the baffle with a 5 mm crush allowance.
 */
import { AXES, FACE_COORDS, type Axis, type DesignInput, type Face } from '../../../shared/schemas/design.schema';
import { MM_PER_INCH, type LengthUnit } from '../../../shared/units/index';

export type BraceInput = NonNullable<DesignInput['braces']>[number];
export type OpeningInput = NonNullable<DesignInput['openings']>[number];
export type WindowInput = NonNullable<Extract<BraceInput, { type: 'shelf' }>['windows']>[number];
export type LiningInput = NonNullable<DesignInput['lining']>;
export type OuterInput = DesignInput['outer'];

export const DEFAULT_LINING: LiningInput = {
  thickness: 50,
  faces: ['left', 'right', 'top', 'bottom', 'back'],
  crush: 5,
  density: 20,
  minSliver: 20,
  portClearance: 5,
};

/** The New design dialog's starting size, round in the user's unit: 250 × 400 × 300 mm, or 10 × 16 × 12 in. */
export function startingOuter(unit: LengthUnit): OuterInput {
  if (unit === 'mm') return { width: 250, height: 400, depth: 300 };
  return { width: 10 * MM_PER_INCH, height: 16 * MM_PER_INCH, depth: 12 * MM_PER_INCH };
}

export function newDesign(name: string, outer: OuterInput): DesignInput {
  return {
    name,
    outer,
    material: { name: 'MDF', thickness: 18 },
    joinery: ['frontBack', 'sides', 'topBottom'],
    braces: [],
    openings: [],
    lining: { ...DEFAULT_LINING },
    airTemperatureC: 20,
  };
}

/** The middle of a face in its two box coordinates (PRODUCT.md §3), so a new opening starts on the face. */
export function faceCentre(face: Face, outer: OuterInput): Partial<Record<'x' | 'y' | 'z', number>> {
  const half = { x: outer.width / 2, y: outer.height / 2, z: outer.depth / 2 };
  const [a, b] = FACE_COORDS[face];
  return { [a]: Math.round(half[a]), [b]: Math.round(half[b]) };
}

export function newOpening(type: OpeningInput['type'], outer: OuterInput): OpeningInput {
  switch (type) {
    case 'driver':
      return { type, face: 'front', ...faceCentre('front', outer), diameter: 100, displacementLitres: 0 };
    case 'port':
      return { type, face: 'back', ...faceCentre('back', outer), shape: 'round', diameter: 50, wall: 3, length: 120 };
    case 'terminal':
      return { type, face: 'back', ...faceCentre('back', outer), width: 60, height: 60 };
    case 'lead':
      return { type, face: 'back', ...faceCentre('back', outer), diameter: 10 };
  }
}

export function newBrace(type: BraceInput['type'], outer: OuterInput, thicknessMm: number): BraceInput {
  if (type === 'shelf') {
    return { type, axis: 'y', position: Math.round(outer.height / 2), thickness: thicknessMm, windows: [] };
  }
  const [a, b] = otherAxes('x');
  return { type, axis: 'x', at: [Math.round(outerAlong(a, outer) / 2), Math.round(outerAlong(b, outer) / 2)], section: [20, 20] };
}

/** The two box axes a brace across `axis` spans, in alphabetical order (PRODUCT.md §8: across y → u = x, v = z). */
export function otherAxes(axis: Axis): [Axis, Axis] {
  return AXES.filter((a) => a !== axis) as [Axis, Axis];
}

function outerAlong(axis: Axis, outer: OuterInput): number {
  return axis === 'x' ? outer.width : axis === 'y' ? outer.height : outer.depth;
}

/** A new window in the middle of a shelf brace across `axis`. */
export function newWindow(shape: WindowInput['shape'], axis: Axis, outer: OuterInput): WindowInput {
  const [a, b] = otherAxes(axis);
  const u = Math.round(outerAlong(a, outer) / 2);
  const v = Math.round(outerAlong(b, outer) / 2);
  return shape === 'rect' ? { shape, u, v, width: 80, height: 80 } : { shape, u, v, diameter: 60 };
}

/** Keeps only the two coordinates an opening's face uses; the third would be meaningless. */
export function keepFaceCoords<T extends { face: Face; x?: number; y?: number; z?: number }>(opening: T): T {
  const used = new Set(FACE_COORDS[opening.face]);
  const out = { ...opening };
  for (const axis of ['x', 'y', 'z'] as const) if (!used.has(axis)) delete out[axis];
  return out;
}
