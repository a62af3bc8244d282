// Installs npm dependencies when they are missing or stale, and Debian's chromium/poppler when asked.
// Plain Node (no dependencies) so it runs on a fresh clone before anything is installed.
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { execSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import path from 'node:path';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const stamp = path.join(root, 'node_modules', '.boxwright-lock-hash');

function lockHash() {
  return createHash('sha256').update(readFileSync(path.join(root, 'package-lock.json'))).digest('hex');
}

export function ensureNodeModules() {
  const want = lockHash();
  const have = existsSync(stamp) ? readFileSync(stamp, 'utf8').trim() : '';
  if (have === want && existsSync(path.join(root, 'node_modules', '.bin', 'tsx'))) return;
  console.log('Installing dependencies (npm ci; compiling sqlite3 takes about a minute)…');
  execSync('npm ci --no-audit --no-fund', { cwd: root, stdio: 'inherit' });
  writeFileSync(stamp, want + '\n');
}

function has(cmd) {
  try {
    execSync(`command -v ${cmd}`, { stdio: 'ignore', shell: '/bin/bash' });
    return true;
  } catch {
    return false;
  }
}

export function ensureBrowserTools() {
  const missing = [];
  if (!existsSync('/usr/bin/chromium')) missing.push('chromium');
  if (!has('pdftoppm')) missing.push('poppler-utils');
  if (missing.length === 0) return;
  const asRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  const sudo = asRoot ? '' : 'sudo ';
  console.log(`Installing Debian packages: ${missing.join(' ')}…`);
  execSync(`${sudo}apt-get update -qq && ${sudo}env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq ${missing.join(' ')}`, {
    stdio: 'inherit',
    shell: '/bin/bash',
  });
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  ensureNodeModules();
  if (process.argv.includes('--browser')) ensureBrowserTools();
}
