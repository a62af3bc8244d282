import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { planDesign } from '../../../shared/cabinet/index.js';
import { repoRoot } from '../acoustics/reference-cases.js';

const tsx = path.join(repoRoot, 'node_modules/.bin/tsx');
const script = path.join(repoRoot, 'scripts/plan.ts');
const tmp = mkdtempSync(path.join(os.tmpdir(), 'plan-cli-'));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

function run(...args: string[]) {
  return spawnSync(tsx, [script, ...args], { cwd: repoRoot, encoding: 'utf8' });
}

describe('plan CLI (PRODUCT §8)', () => {
  it('prints the plan JSON of a design file on stdout', () => {
    const file = path.join(repoRoot, 'tests/fixtures/designs/bookshelf.json');
    const r = run(file);
    expect(r.status).toBe(0);
    expect(r.stderr).toBe('');
    const plan = JSON.parse(r.stdout) as unknown;
    const direct = planDesign(JSON.parse(readFileSync(file, 'utf8')));
    expect(direct.ok).toBe(true);
    if (direct.ok) expect(plan).toEqual(JSON.parse(JSON.stringify(direct.plan)));
    expect(Object.keys(plan as object)).toEqual(expect.arrayContaining(['panels', 'liningPieces', 'volumes', 'port', 'warnings']));
  });

  const bad: [string, () => string][] = [
    ['a missing file', () => path.join(tmp, 'nope.json')],
    ['a folder', () => tmp],
    [
      'bad JSON',
      () => {
        const f = path.join(tmp, 'broken.json');
        writeFileSync(f, '{"name": "x", ');
        return f;
      },
    ],
    [
      'an invalid design',
      () => {
        const f = path.join(tmp, 'invalid.json');
        writeFileSync(
          f,
          JSON.stringify({
            name: 'x',
            outer: { width: 300, height: 500, depth: 350 },
            material: { name: 'MDF', thickness: 18 },
            braces: [{ type: 'shelf', axis: 'y', position: 250, thickness: 18 }, { type: 'shelf', axis: 'y', position: 490, thickness: 18 }],
          }),
        );
        return f;
      },
    ],
  ];
  for (const [what, make] of bad) {
    it(`${what}: exit code 1 and one line on stderr, no stack trace`, () => {
      const r = run(make());
      expect(r.status).toBe(1);
      expect(r.stdout).toBe('');
      const lines = r.stderr.trimEnd().split('\n');
      expect(lines).toHaveLength(1);
      expect(lines[0]).toMatch(/^plan: /);
      expect(r.stderr).not.toMatch(/\n\s+at /);
      if (what === 'an invalid design') expect(lines[0]).toMatch(/braces\[1\]\.position/);
    });
  }

  it('no file: a usage line and exit code 1', () => {
    const r = run();
    expect(r.status).toBe(1);
    expect(r.stderr.trimEnd().split('\n')).toHaveLength(1);
  });
});
