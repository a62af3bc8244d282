import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { MikroORM, type Options } from '@mikro-orm/sqlite';
import config from '../mikro-orm.config.js';

export type Orm = MikroORM;

function isMemory(dbName: string | undefined): boolean {
  return dbName === undefined || dbName === ':memory:' || dbName.includes('mode=memory');
}

/**
 * Starts MikroORM with the project config plus `overrides` (tests pass `{ dbName: ':memory:' }`).
 * Creates the database's folder when needed. Does not migrate: call `migrate(orm)`.
 */
export async function initOrm(overrides: Partial<Options> = {}): Promise<Orm> {
  const options = { ...config, ...overrides } as Options;
  if (!isMemory(options.dbName)) mkdirSync(path.dirname(path.resolve(options.dbName!)), { recursive: true });
  return MikroORM.init(options);
}

/** Applies pending migrations; tells whether the database was new (no migration had run before). */
export async function migrate(orm: Orm): Promise<{ wasNew: boolean; applied: string[] }> {
  const migrator = orm.getMigrator();
  const before = await migrator.getExecutedMigrations();
  const applied = await migrator.up();
  return { wasNew: before.length === 0, applied: applied.map((m) => m.name) };
}
