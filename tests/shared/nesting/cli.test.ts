import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { validateLayout } from '../../../shared/nesting/index.js';
import type { Layout } from '../../../shared/schemas/nest.schema.js';
import { job } from './helpers.js';

const root = fileURLToPath(new URL('../../..', import.meta.url));
const dir = mkdtempSync(path.join(tmpdir(), 'nest-cli-'));
const run = (file: string) => spawnSync(path.join(root, 'node_modules/.bin/tsx'), [path.join(root, 'scripts/nest.ts'), file], { encoding: 'utf8' });
const write = (name: string, text: string) => {
  const f = path.join(dir, name);
  writeFileSync(f, text);
  return f;
};

describe('nest CLI (npm run --silent nest -- FILE)', () => {
  it('prints the layout JSON for a valid job', () => {
    const input = { kerf: 3, mode: 'guillotine', timeLimitMs: 100, stock: [{ id: 's', kind: 'sheet', width: 2440, height: 1220, trim: 10 }], parts: [{ id: 'side', width: 300, height: 400, quantity: 4 }] };
    const r = run(write('ok.json', JSON.stringify(input)));
    expect(r.status).toBe(0);
    const layout = JSON.parse(r.stdout) as Layout;
    expect(layout.stats.sheetsUsed).toBe(1);
    expect(validateLayout(job(input), layout)).toEqual([]);
  });

  it.each([
    ['invalid job', JSON.stringify({ stock: [{ id: 's', kind: 'sheet', width: 100 }], parts: [{ id: 'p', width: 1, height: 1 }] }), /stock\[0\]\.height/],
    ['not JSON', '{ nope', /not valid JSON/],
  ])('%s: exit 1 with one clear line on stderr', (_, text, message) => {
    const r = run(write(`bad-${text.length}.json`, text));
    expect(r.status).toBe(1);
    expect(r.stdout).toBe('');
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(message);
  });

  it('a missing file: exit 1 with one line', () => {
    const r = run(path.join(dir, 'missing.json'));
    expect(r.status).toBe(1);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(/cannot read/);
  });
});
