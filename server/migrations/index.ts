import type { MigrationObject } from '@mikro-orm/core';
import { Migration20261201215411 } from './Migration20261201215411.js';
import { Migration20261201221145 } from './Migration20261201221145.js';
import { Migration20261201222028 } from './Migration20261201222028.js';
import { Migration20261201222500 } from './Migration20261201222500.js';
import { Migration20261201223100 } from './Migration20261201223100.js';
import { Migration20261202003000 } from './Migration20261202003000.js';
import { Migration20261202010000 } from './Migration20261202010000.js';

/**
 * Every migration, oldest first. `npm run orm -- migration:create` writes a new file here; add it to this list
 * (listed explicitly so migrations load the same way under tsx, vitest and the CLI).
 */
export const MIGRATIONS: MigrationObject[] = [
  { name: 'Migration20261201215411', class: Migration20261201215411 },
  { name: 'Migration20261201221145', class: Migration20261201221145 },
  { name: 'Migration20261201222028', class: Migration20261201222028 },
  { name: 'Migration20261201222500', class: Migration20261201222500 },
  { name: 'Migration20261201223100', class: Migration20261201223100 },
  { name: 'Migration20261202003000', class: Migration20261202003000 },
  { name: 'Migration20261202010000', class: Migration20261202010000 },
];
