// `npm test`: type check, unit and API tests (vitest), browser tests (playwright-core + Debian chromium).
// Ends with one line for every suite together: `N passed, N failed`.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureBrowserTools, ensureNodeModules } from './ensure-deps.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
process.chdir(root);
ensureNodeModules();
ensureBrowserTools();

const tmp = path.join(root, '.tmp');
mkdirSync(tmp, { recursive: true });
const bin = (name) => path.join(root, 'node_modules', '.bin', name);
let passed = 0;
let failed = 0;

function run(title, cmd, args, env = {}) {
  console.log(`\n=== ${title}`);
  const r = spawnSync(cmd, args, { stdio: 'inherit', env: { ...process.env, ...env } });
  return r.status === 0;
}

// 1. Type check (one check for the whole project).
if (run('type check (tsc --noEmit)', bin('tsc'), ['--noEmit', '-p', 'tsconfig.json'])) passed += 1;
else failed += 1;

// 2. Unit and API tests.
const vitestJson = path.join(tmp, 'vitest.json');
rmSync(vitestJson, { force: true });
const vitestOk = run('unit and API tests (vitest)', bin('vitest'), ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${vitestJson}`]);
if (existsSync(vitestJson)) {
  const report = JSON.parse(readFileSync(vitestJson, 'utf8'));
  passed += report.numPassedTests ?? 0;
  failed += (report.numFailedTests ?? 0) + (report.numFailedTestSuites ?? 0);
  if (!vitestOk && (report.numFailedTests ?? 0) + (report.numFailedTestSuites ?? 0) === 0) failed += 1;
} else if (!vitestOk) failed += 1;

// 3. Browser tests.
const e2eJson = path.join(tmp, 'e2e.json');
rmSync(e2eJson, { force: true });
const e2eOk = run('browser tests (headless chromium)', bin('tsx'), ['tests/e2e/run.ts'], { E2E_REPORT: e2eJson });
if (existsSync(e2eJson)) {
  const report = JSON.parse(readFileSync(e2eJson, 'utf8'));
  passed += report.passed;
  failed += report.failed;
  if (!e2eOk && report.failed === 0) failed += 1;
} else if (!e2eOk) failed += 1;

console.log(`\n${passed} passed, ${failed} failed`);
process.exit(failed === 0 ? 0 : 1);
