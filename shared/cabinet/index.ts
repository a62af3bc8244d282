/**
 * The cabinet engine: design JSON → plan JSON (PRODUCT.md §3 and §8). Pure: no I/O.
 *
 * planDesign parses the input with the shared zod schema, then checks the geometry rules (field paths such
 * as `braces[1].position`), then derives panels, lining pieces, volumes, the port tuning and warnings.
 */
import { designSchema, type Design } from '../schemas/design.schema.js';
import type { Plan } from '../schemas/plan.types.js';
import { describeFields, issuesToFields } from '../errors.js';
import { makeFrame } from './frame.js';
import { checkDesignGeometry } from './validate.js';
import { planPanels } from './panels.js';
import { computeVolumes } from './volumes.js';
import { planPort, type PortOptions } from './port.js';
import { geometryWarnings } from './warnings.js';
import { planLining } from '../lining/pieces.js';

export type PlanOutcome =
  | { ok: true; design: Design; plan: Plan }
  | { ok: false; message: string; fields: Record<string, string> };

export type PlanOptions = PortOptions;

export { panelsLargerThanStock } from './warnings.js';
export { checkDesignGeometry } from './validate.js';

/** Plans a design that already passed the schema and the geometry rules. */
export function buildPlan(design: Design, options: PlanOptions = {}): Plan {
  const frame = makeFrame(design);
  const panels = planPanels(design, frame);
  const lining = planLining(design, frame);
  const volumes = computeVolumes(design, frame, lining.totals);
  const port = planPort(design, frame, volumes.netLitres, volumes.portLitres, options);
  const plan: Plan = {
    panels: panels.panels,
    liningPieces: lining.pieces,
    volumes,
    port: port.port,
    warnings: [...geometryWarnings(design, frame), ...panels.warnings, ...lining.warnings, ...port.warnings],
  };
  if (design.lining) plan.lining = lining.totals;
  return plan;
}

/** Parses with designSchema, then geometry rules, then plans. Never throws for bad input. */
export function planDesign(input: unknown, options: PlanOptions = {}): PlanOutcome {
  const parsed = designSchema.safeParse(input);
  if (!parsed.success) {
    const fields = issuesToFields(parsed.error.issues);
    return { ok: false, message: describeFields(fields), fields };
  }
  const design = parsed.data;
  const issues = checkDesignGeometry(design);
  if (issues.length > 0) {
    const fields = issuesToFields(issues);
    return { ok: false, message: describeFields(fields), fields };
  }
  return { ok: true, design, plan: buildPlan(design, options) };
}
