/**
 * The live figures shown beside the canvas, read from the cabinet engine's plan. When the engine
 * refuses the design, the last good figures stay (shown greyed) with the field message.
 */
import type { Plan, Warning } from '../../../../shared/schemas/plan.types';
import type { StudioDoc } from './types';

/** What planDesign returns (shared/cabinet/index.ts). */
export type PlanOutcome =
  | { ok: true; design: StudioDoc; plan: Plan }
  | { ok: false; message: string; fields: Record<string, string> };

export interface Figures {
  grossLitres: number;
  netLitres: number;
  /** Labelled an estimate wherever shown (PRODUCT.md §3). */
  apparentLitresEstimate: number | null;
  port: {
    tuningHz: number;
    targetHz: number | null;
    lengthForTargetMm: number | null;
    /** Current length of the ports the target applies to, and their indexes in design.openings. */
    currentLengthMm: number | null;
    portIndexes: number[];
    peakAirSpeedMs: number | null;
    /** 5 % of the speed of sound, the usual audible-noise threshold (REFERENCES.md §6, common practice). */
    airSpeedLimitMs: number | null;
  } | null;
  lining: { areaM2: number; massKg: number; pieceCount: number } | null;
  panelCount: number;
  warnings: Warning[];
}

export interface FiguresState {
  figures: Figures | null;
  /** True while the design cannot be planned and `figures` are the last good ones. */
  stale: boolean;
  error: { message: string; fields: Record<string, string> } | null;
}

export function figuresFromPlan(doc: StudioDoc, plan: Plan): Figures {
  const portIndexes = doc.openings.flatMap((o, i) => (o.type === 'port' ? [i] : []));
  const firstPort = portIndexes.length > 0 ? doc.openings[portIndexes[0]!] : undefined;
  const p = plan.port;
  const c = p?.speedOfSoundMs ?? null;
  const liningTotals = plan.lining;
  return {
    grossLitres: plan.volumes.grossLitres,
    netLitres: plan.volumes.netLitres,
    apparentLitresEstimate: plan.volumes.apparentLitresEstimate ?? null,
    port: p
      ? {
          tuningHz: p.tuningHz,
          targetHz: p.targetHz ?? (firstPort?.type === 'port' ? firstPort.targetHz ?? null : null),
          lengthForTargetMm: p.lengthForTargetMm ?? null,
          currentLengthMm: firstPort?.type === 'port' ? firstPort.length : null,
          portIndexes,
          peakAirSpeedMs: p.peakAirSpeedMs ?? null,
          airSpeedLimitMs: c !== null ? 0.05 * c : null,
        }
      : null,
    lining: liningTotals
      ? {
          areaM2: liningTotals.areaM2,
          massKg: liningTotals.massKg,
          pieceCount: plan.liningPieces.reduce((n, piece) => n + piece.quantity, 0),
        }
      : null,
    panelCount: plan.panels.reduce((n, panel) => n + panel.quantity, 0),
    warnings: plan.warnings,
  };
}

/** Folds a new plan outcome into the figures state, keeping the last good figures on an error. */
export function nextFigures(prev: FiguresState, doc: StudioDoc, outcome: PlanOutcome): FiguresState {
  if (outcome.ok) return { figures: figuresFromPlan(doc, outcome.plan), stale: false, error: null };
  return { figures: prev.figures, stale: prev.figures !== null, error: { message: outcome.message, fields: outcome.fields } };
}

export const EMPTY_FIGURES: FiguresState = { figures: null, stale: false, error: null };
