/** Small builders for test designs (lengths in mm). */
import { expect } from 'vitest';
import type { DesignInput } from '../../../shared/schemas/design.schema.js';
import type { Plan } from '../../../shared/schemas/plan.types.js';
import { planDesign, type PlanOptions } from '../../../shared/cabinet/index.js';

/** A plain closed box: 300 × 500 × 350 mm outside, 18 mm MDF, no braces, openings or lining. */
export function plainBox(over: Partial<DesignInput> = {}): DesignInput {
  return {
    name: 'Test box',
    outer: { width: 300, height: 500, depth: 350 },
    material: { name: 'MDF', thickness: 18 },
    ...over,
  };
}

export function mustPlan(input: unknown, options?: PlanOptions): Plan {
  const r = planDesign(input, options);
  if (!r.ok) expect.fail(`expected a plan, got: ${r.message}`);
  return r.plan;
}

export function mustFail(input: unknown): Record<string, string> {
  const r = planDesign(input);
  if (r.ok) expect.fail('expected the design to be rejected');
  return r.fields;
}

export function panel(plan: Plan, name: string) {
  const p = plan.panels.find((x) => x.name === name);
  if (!p) expect.fail(`no panel ${name}; have ${plan.panels.map((x) => x.name).join(', ')}`);
  return p;
}

export function codes(plan: Plan): string[] {
  return plan.warnings.map((w) => w.code);
}
