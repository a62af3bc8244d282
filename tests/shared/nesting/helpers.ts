import { expect } from 'vitest';
import { nest, parseNestJob, validateLayout, type NestOptions } from '../../../shared/nesting/index.js';
import type { Layout, NestJob } from '../../../shared/schemas/nest.schema.js';

/** Parses a job (failing the test on errors). */
export function job(input: unknown): NestJob {
  const r = parseNestJob(input);
  if (!r.ok) throw new Error(`test job is invalid: ${r.message}`);
  return r.job;
}

/** Runs the engine and the independent validator on its layout: every layout a test produces is checked. */
export function nestChecked(j: NestJob, options?: NestOptions): Layout {
  const layout = nest(j, options);
  expect(validateLayout(j, layout)).toEqual([]);
  return layout;
}

export const placedCount = (l: Layout) => l.sheets.reduce((n, s) => n + s.placements.length, 0);
