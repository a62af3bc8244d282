/**
 * MikroORM configuration, shared by the server (server/db.ts) and the CLI (`npm run orm -- migration:create`).
 * The database file comes from DB_PATH (default data/boxwright.sqlite); tests pass ':memory:' or a temp file.
 */
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { defineConfig } from '@mikro-orm/sqlite';
import { Migrator } from '@mikro-orm/migrations';
import { ENTITIES } from './server/entities.js';
import { MIGRATIONS } from './server/migrations/index.js';

export const ROOT_DIR = path.dirname(fileURLToPath(import.meta.url));
export const DEFAULT_DB_PATH = path.join(ROOT_DIR, 'data', 'boxwright.sqlite');

export default defineConfig({
  baseDir: ROOT_DIR,
  dbName: process.env.DB_PATH || DEFAULT_DB_PATH,
  entities: ENTITIES,
  extensions: [Migrator],
  // No implicit global identity map: every request runs in its own RequestContext (server/app.ts).
  allowGlobalContext: false,
  forceUtcTimezone: true,
  migrations: {
    path: path.join(ROOT_DIR, 'server', 'migrations'),
    pathTs: path.join(ROOT_DIR, 'server', 'migrations'),
    // Listed explicitly (server/migrations/index.ts) so they load the same way under tsx, vitest and the CLI.
    migrationsList: MIGRATIONS,
    snapshotName: '.snapshot-boxwright',
    emit: 'ts',
    transactional: true,
    allOrNothing: true,
    silent: true,
  },
});
