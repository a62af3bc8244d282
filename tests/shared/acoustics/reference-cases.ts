/**
 * Loads the outside reference cases (../shared/reference-check-cases.json, beside the repository; a copy of
 * the cases these tests use is kept in tests/fixtures/reference-cases.json so the tests do not depend on it).
 */
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export interface ReferenceCase {
  id: string;
  quantity: string;
  inputs: Record<string, unknown>;
  expected: unknown;
  tolerance: Record<string, number>;
  source: string;
  marker: string;
}

export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');
export const siblingCasesPath = path.resolve(repoRoot, '../shared/reference-check-cases.json');
export const fixtureCasesPath = path.join(repoRoot, 'tests/fixtures/reference-cases.json');

function load(file: string): ReferenceCase[] {
  return JSON.parse(readFileSync(file, 'utf8')) as ReferenceCase[];
}

export const fixtureCases: ReferenceCase[] = load(fixtureCasesPath);
export const siblingCases: ReferenceCase[] | null = existsSync(siblingCasesPath) ? load(siblingCasesPath) : null;

/** A case by id, from the sibling file when present, else from the fixture copy. */
export function referenceCase(id: string): ReferenceCase {
  const c = (siblingCases ?? fixtureCases).find((x) => x.id === id) ?? fixtureCases.find((x) => x.id === id);
  if (!c) throw new Error(`reference case ${id} not found`);
  return c;
}

/** Tolerance of a case: `abs` or `rel` (relative to the expected value). */
export function within(c: ReferenceCase, actual: number, expected: number, key: 'abs' | 'rel' = 'abs'): boolean {
  const tol = c.tolerance;
  if (tol.rel !== undefined && (key === 'rel' || tol.abs === undefined)) return Math.abs(actual - expected) <= tol.rel * Math.abs(expected);
  return Math.abs(actual - expected) <= (tol.abs ?? 0) + 1e-12;
}

export const num = (v: unknown): number => {
  if (typeof v !== 'number') throw new Error(`expected a number, got ${JSON.stringify(v)}`);
  return v;
};
