/**
 * The design JSON of PRODUCT.md §8, as one zod schema shared by the client, the server and the CLI.
 *
 * This schema checks *shape* (types, positive sizes, known faces and axes, required coordinates per
 * face). Rules that need geometry (a brace outside the cavity, a cut-out that does not fit its face,
 * lining thicker than half an internal size) live in the cabinet engine, which reports them with the
 * same field paths (`braces[1].position`).
 *
 * All lengths are millimetres. Box coordinates: origin at the outer front-bottom-left corner,
 * x to the right (width), y up (height), z from the front towards the back (depth).
 */
import { z } from 'zod';

export const FACES = ['front', 'back', 'left', 'right', 'top', 'bottom'] as const;
export type Face = (typeof FACES)[number];
export const AXES = ['x', 'y', 'z'] as const;
export type Axis = (typeof AXES)[number];
export const FACE_PAIRS = ['frontBack', 'sides', 'topBottom'] as const;
export type FacePair = (typeof FACE_PAIRS)[number];

/** Which two box coordinates place an opening on each face (PRODUCT.md §3). */
export const FACE_COORDS: Record<Face, readonly [Axis, Axis]> = {
  front: ['x', 'y'],
  back: ['x', 'y'],
  left: ['z', 'y'],
  right: ['z', 'y'],
  top: ['x', 'z'],
  bottom: ['x', 'z'],
};

const mm = (what: string) =>
  z.number({ error: `${what} must be a number (mm)` }).refine(Number.isFinite, `${what} must be a finite number`);
const positiveMm = (what: string) => mm(what).refine((v) => v > 0, `${what} must be greater than 0`);
const nonNegativeMm = (what: string) => mm(what).refine((v) => v >= 0, `${what} must be 0 or more`);

export const faceSchema = z.enum(FACES, { error: `face must be one of ${FACES.join(', ')}` });
export const axisSchema = z.enum(AXES, { error: 'axis must be x, y or z' });

export const outerSchema = z.object({
  width: positiveMm('width'),
  height: positiveMm('height'),
  depth: positiveMm('depth'),
});

export const materialSchema = z.object({
  name: z.string().trim().min(1, 'material name is required').max(80),
  thickness: positiveMm('thickness'),
  /** kg/m³, used for weight estimates; MDF about 750 (REFERENCES.md §7, common practice). */
  density: z.number().positive().optional(),
});

export const joinerySchema = z
  .array(z.enum(FACE_PAIRS, { error: 'joinery entries are frontBack, sides and topBottom' }))
  .length(3, 'joinery lists the three face pairs in order')
  .refine((a) => new Set(a).size === 3, 'joinery must name each face pair once');

export const windowSchema = z.discriminatedUnion('shape', [
  z.object({ shape: z.literal('rect'), u: mm('u'), v: mm('v'), width: positiveMm('width'), height: positiveMm('height') }),
  z.object({ shape: z.literal('round'), u: mm('u'), v: mm('v'), diameter: positiveMm('diameter') }),
]);

export const shelfBraceSchema = z.object({
  type: z.literal('shelf'),
  axis: axisSchema,
  /** Box coordinate of the brace's centre plane along `axis`. */
  position: mm('position'),
  thickness: positiveMm('thickness'),
  windows: z.array(windowSchema).default([]),
});

export const barBraceSchema = z.object({
  type: z.literal('bar'),
  /** The axis the bar runs along, from one internal face to the opposite one. */
  axis: axisSchema,
  /** Box coordinates of the bar's centre line in the two other axes, in alphabetical order (axis x: [y, z]). */
  at: z.tuple([mm('at[0]'), mm('at[1]')]),
  /** Cross-section sizes along the two other axes, same order as `at`. */
  section: z.tuple([positiveMm('section[0]'), positiveMm('section[1]')]),
});

export const braceSchema = z.discriminatedUnion('type', [shelfBraceSchema, barBraceSchema], {
  error: 'brace type must be shelf or bar',
});

/** Optional coordinates; which two are required depends on the face (checked below). */
const placed = {
  face: faceSchema,
  x: mm('x').optional(),
  y: mm('y').optional(),
  z: mm('z').optional(),
};

export const rebateSchema = z.object({
  diameter: positiveMm('rebate diameter'),
  depth: positiveMm('rebate depth'),
});

export const screwHolesSchema = z.object({
  count: z.number().int().min(1).max(24),
  /** Diameter of the circle the screw holes sit on (pitch circle). */
  circleDiameter: positiveMm('screw circle diameter'),
  holeDiameter: positiveMm('screw hole diameter'),
});

export const driverSchema = z.object({
  type: z.literal('driver'),
  ...placed,
  /** Cut-out diameter through the baffle. */
  diameter: positiveMm('diameter'),
  displacementLitres: z.number().min(0).default(0),
  rebate: rebateSchema.optional(),
  screwHoles: screwHolesSchema.optional(),
  /** Effective cone area Sd in cm², for port air speed. */
  coneAreaCm2: z.number().positive().optional(),
  /** Peak one-way linear excursion Xmax in mm, for port air speed. */
  excursionMm: z.number().positive().optional(),
});

export const portSchema = z.object({
  type: z.literal('port'),
  ...placed,
  shape: z.enum(['round', 'slot']).default('round'),
  /** Round port: inner diameter. */
  diameter: positiveMm('diameter').optional(),
  /** Tube wall thickness (round port). */
  wall: nonNegativeMm('wall').default(0),
  /** Slot port: inner width and height on the face. */
  width: positiveMm('width').optional(),
  height: positiveMm('height').optional(),
  /** Total length, measured from the outer face. */
  length: positiveMm('length'),
  /** Optional tuning the designer aims for; the plan then reports the length that reaches it. */
  targetHz: z.number().positive().optional(),
});

export const terminalSchema = z.object({
  type: z.literal('terminal'),
  ...placed,
  width: positiveMm('width').optional(),
  height: positiveMm('height').optional(),
  diameter: positiveMm('diameter').optional(),
});

export const leadSchema = z.object({
  type: z.literal('lead'),
  ...placed,
  diameter: positiveMm('diameter'),
});

export const openingSchema = z
  .discriminatedUnion('type', [driverSchema, portSchema, terminalSchema, leadSchema], {
    error: 'opening type must be driver, port, terminal or lead',
  })
  .superRefine((o, ctx) => {
    for (const axis of FACE_COORDS[o.face]) {
      if (o[axis] === undefined) {
        ctx.addIssue({ code: 'custom', path: [axis], message: `${axis} is required for an opening on the ${o.face} face` });
      }
    }
    if (o.type === 'port') {
      if (o.shape === 'round' && o.diameter === undefined) {
        ctx.addIssue({ code: 'custom', path: ['diameter'], message: 'a round port needs a diameter' });
      }
      if (o.shape === 'slot') {
        if (o.width === undefined) ctx.addIssue({ code: 'custom', path: ['width'], message: 'a slot port needs a width' });
        if (o.height === undefined) ctx.addIssue({ code: 'custom', path: ['height'], message: 'a slot port needs a height' });
      }
    }
    if (o.type === 'terminal') {
      const rect = o.width !== undefined && o.height !== undefined;
      if (!rect && o.diameter === undefined) {
        ctx.addIssue({ code: 'custom', path: ['width'], message: 'a terminal needs a width and height, or a diameter' });
      }
    }
  });

export const liningSchema = z.object({
  thickness: positiveMm('lining thickness'),
  faces: z.array(faceSchema).default(['left', 'right', 'top', 'bottom', 'back']),
  /** Crush allowance: pieces are cut this much larger in each direction. */
  crush: nonNegativeMm('crush').default(5),
  /** Fill density in kg/m³ (polyester batt about 10–40, common practice). */
  density: z.number().positive().default(20),
  /** Pieces narrower than this are dropped with a warning. */
  minSliver: nonNegativeMm('minimum sliver').default(20),
  /** Clearance added around a port tube's outer diameter when cutting the lining hole. */
  portClearance: nonNegativeMm('port clearance').default(5),
});

export const designSchema = z.object({
  name: z.string().trim().min(1, 'name is required').max(120, 'name is at most 120 characters'),
  outer: outerSchema,
  material: materialSchema,
  /** Front panel thickness; defaults to the material thickness. */
  baffleThickness: positiveMm('baffle thickness').optional(),
  joinery: joinerySchema.default(['frontBack', 'sides', 'topBottom']),
  braces: z.array(braceSchema).default([]),
  openings: z.array(openingSchema).default([]),
  lining: liningSchema.nullable().optional(),
  airTemperatureC: z.number().min(-40).max(60).default(20),
});

/** What a client or file may send (defaults not yet applied). */
export type DesignInput = z.input<typeof designSchema>;
/** A parsed design with every default filled in. */
export type Design = z.output<typeof designSchema>;
export type Brace = Design['braces'][number];
export type ShelfBrace = z.output<typeof shelfBraceSchema>;
export type BarBrace = z.output<typeof barBraceSchema>;
export type BraceWindow = z.output<typeof windowSchema>;
export type Opening = Design['openings'][number];
export type DriverOpening = z.output<typeof driverSchema>;
export type PortOpening = z.output<typeof portSchema>;
export type TerminalOpening = z.output<typeof terminalSchema>;
export type LeadOpening = z.output<typeof leadSchema>;
export type Lining = z.output<typeof liningSchema>;
