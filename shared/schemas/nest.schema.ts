/**
 * Nest job JSON and layout JSON of PRODUCT.md §8. Field names in the contract are fixed; extra
 * optional fields are additions the contract allows. Lengths in the job's units (mm).
 */
import { z } from 'zod';

const size = (what: string) =>
  z.number({ error: `${what} must be a number` }).refine((v) => Number.isFinite(v) && v > 0, `${what} must be greater than 0`);

export const stockSchema = z
  .object({
    id: z.string().min(1, 'stock id is required'),
    kind: z.enum(['sheet', 'remnant', 'roll'], { error: 'kind must be sheet, remnant or roll' }),
    width: size('width'),
    /** Sheet or remnant height. */
    height: size('height').optional(),
    /** Roll: available length (omit for an unlimited roll). */
    length: size('length').optional(),
    /** Count available; omit or null for unlimited. */
    quantity: z.number().int().min(0).nullable().optional(),
    /** Edge trim on every side. */
    trim: z.number().min(0).default(0),
    grain: z.enum(['none', 'length']).default('none'),
    /** Cost per sheet, or per metre for a roll. */
    cost: z.number().min(0).optional(),
    /** Parts only go on stock of their own material and thickness; omitted means "any". */
    material: z.string().optional(),
    thickness: z.number().positive().optional(),
  })
  .superRefine((s, ctx) => {
    if (s.kind !== 'roll' && s.height === undefined) {
      ctx.addIssue({ code: 'custom', path: ['height'], message: 'a sheet or remnant needs a height' });
    }
  });

export const partSchema = z.object({
  id: z.string().min(1, 'part id is required'),
  width: size('width'),
  height: size('height'),
  quantity: z.number().int().min(1, 'quantity must be at least 1').default(1),
  /**
   * May the part be turned 90°? A part with grain may not be turned across it; with grain-free
   * stock every part may turn unless this says false.
   */
  canRotate: z.boolean().default(true),
  /** When the part has grain, its grain runs along its height ("height") or width ("width"). */
  grain: z.enum(['none', 'height', 'width']).default('none'),
  material: z.string().optional(),
  thickness: z.number().positive().optional(),
  /** Free label carried to the layout (e.g. cabinet and panel name). */
  label: z.string().optional(),
});

export const nestJobSchema = z.object({
  units: z.literal('mm').default('mm'),
  kerf: z.number().min(0, 'kerf must be 0 or more').default(3.2),
  mode: z.enum(['guillotine', 'free'], { error: 'mode must be guillotine or free' }).default('guillotine'),
  seed: z.number().int().default(1),
  timeLimitMs: z.number().int().min(0).max(600_000).default(2000),
  objective: z.enum(['sheets', 'cost']).default('sheets'),
  /** Offcuts at least this size on both sides are listed as worth keeping. */
  minOffcut: z.object({ width: z.number().min(0), height: z.number().min(0) }).default({ width: 200, height: 200 }),
  stock: z.array(stockSchema).min(1, 'at least one stock item is required'),
  parts: z.array(partSchema).min(1, 'at least one part is required'),
});

export type NestJobInput = z.input<typeof nestJobSchema>;
export type NestJob = z.output<typeof nestJobSchema>;
export type StockItem = z.output<typeof stockSchema>;
export type PartItem = z.output<typeof partSchema>;

export interface Placement {
  partId: string;
  x: number;
  y: number;
  /** Size as placed (after any turn). */
  width: number;
  height: number;
  rotated: boolean;
}

/** One guillotine cut, edge to edge of the piece it divides. */
export interface Cut {
  /** 1-based cut order on this sheet. */
  order: number;
  /** "rip" runs along the sheet's length, "cross" across it (as on a panel saw). */
  kind: 'rip' | 'cross';
  /** Cut line: from (x1, y1) to (x2, y2) in sheet coordinates; one of the two coordinates is constant. */
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}

export interface Offcut {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface LayoutSheet {
  stockId: string;
  kind?: 'sheet' | 'remnant' | 'roll';
  width: number;
  /** On a roll, the length used. */
  height: number;
  placements: Placement[];
  cuts: Cut[];
  offcuts?: Offcut[];
  utilisation?: number;
}

export interface Layout {
  sheets: LayoutSheet[];
  unplaced: { partId: string; quantity: number; reason?: string }[];
  stats: {
    sheetsUsed: number;
    utilisation: number;
    elapsedMs: number;
    rollLengthUsed?: number;
    cost?: number;
    lowerBound?: number;
  };
}

export interface NestProgress {
  /** 0..1 share of the time limit or search used so far. */
  fraction: number;
  bestSheets: number;
  message?: string;
}
