// `npm start`: install dependencies when missing or stale, build the client, then run the server
// (server/index.ts under tsx: migrates, seeds a new database, serves on PORT, prints the sign-ins).
// Plain Node with no dependencies at load, so it runs on a fresh clone.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { constants } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureNodeModules } from './ensure-deps.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
process.chdir(root);
ensureNodeModules();

const bin = (name) => path.join(root, 'node_modules', '.bin', name);

if (existsSync(path.join(root, 'index.html'))) {
  console.log('Building the client (vite build)…');
  const build = spawnSync(bin('vite'), ['build', '--logLevel', 'warn'], { stdio: 'inherit' });
  if (build.status !== 0) {
    console.error('Boxwright could not start: the client build failed (see above).');
    process.exit(build.status ?? 1);
  }
} else {
  console.warn('No index.html at the project root: skipping the client build; the API still runs.');
}

const server = spawn(bin('tsx'), ['server/index.ts'], { stdio: 'inherit', env: process.env });
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, () => {
    if (server.exitCode === null) server.kill(signal);
  });
}
server.on('exit', (code, signal) => process.exit(code ?? (signal ? 128 + (constants.signals[signal] ?? 0) : 1)));
