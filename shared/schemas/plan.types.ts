/**
 * The plan JSON of PRODUCT.md §8: what the cabinet engine derives from one design.
 * Field names in the contract (`panels`, `liningPieces`, `volumes`, `port`, `warnings` and their
 * members) are fixed; the extra fields here are additions the contract allows.
 * Lengths in millimetres; a panel's or piece's own coordinates have their origin at its lower-left corner,
 * x along `width`, y along `height`.
 */
import type { Face } from './design.schema.js';

export type Point = [number, number];

/** What a hole in a panel is cut for; the DXF export puts each operation on its own layer. */
export type HoleOperation = 'through' | 'rebate';

export type PanelHole =
  | {
      shape: 'round';
      /** Centre in the panel's own coordinates. */
      x: number;
      y: number;
      diameter: number;
      operation: HoleOperation;
      /** Depth of a rebate (pocket) from the outer surface; absent for through holes. */
      depth?: number;
      /** What made the hole: "driver", "port", "terminal", "lead", "window", "screw", "bar". */
      source: string;
      /** Index into design.openings or design.braces that made it, if any. */
      ref?: string;
    }
  | {
      shape: 'rect';
      /** Centre in the panel's own coordinates (like round holes). */
      x: number;
      y: number;
      width: number;
      height: number;
      operation: HoleOperation;
      depth?: number;
      source: string;
      ref?: string;
    };

/** Which way the wood grain should run on the part, if the sheet has grain. */
export type PanelGrain = 'height' | 'width' | 'none';

export interface PanelPlan {
  name: string;
  /** The face it closes, or "brace" for shelf braces and "bar" for bar braces. */
  role: Face | 'brace' | 'bar';
  width: number;
  height: number;
  thickness: number;
  quantity: number;
  grain: PanelGrain;
  holes: PanelHole[];
}

export interface LiningPiecePlan {
  name: string;
  face: Face;
  /** Cut size including the crush allowance. */
  width: number;
  height: number;
  quantity: number;
  /** Closed outline in the piece's own coordinates (counter-clockwise, first point not repeated). */
  outline: Point[];
  /** Holes, each a closed polygon in the piece's own coordinates. */
  holes: Point[][];
  /** Material area in mm² (outline minus holes). */
  area: number;
  /** Lining thickness in mm. */
  thickness: number;
}

export interface Volumes {
  grossLitres: number;
  bracesLitres: number;
  portLitres: number;
  driversLitres: number;
  liningFibreLitres: number;
  netLitres: number;
  /** Apparent acoustic volume with lining: an estimate, labelled as one wherever shown. */
  apparentLitresEstimate?: number;
}

export interface PortPlan {
  tuningHz: number;
  effectiveLengthMm: number;
  /** Total port area (all ports), mm². */
  areaMm2?: number;
  /** Port length (each port) that reaches the design's target tuning, when a target is given. */
  lengthForTargetMm?: number;
  targetHz?: number;
  /** Peak air speed in the port when a driver's cone area and excursion are known. */
  peakAirSpeedMs?: number;
  speedOfSoundMs?: number;
}

export interface Warning {
  code: string;
  message: string;
  /** Field path of what the warning is about, e.g. `openings[2]`. */
  field?: string;
}

export interface LiningTotals {
  areaM2: number;
  volumeLitres: number;
  massKg: number;
}

export interface Plan {
  panels: PanelPlan[];
  liningPieces: LiningPiecePlan[];
  volumes: Volumes;
  port: PortPlan | null;
  warnings: Warning[];
  lining?: LiningTotals;
}
