import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { UNIT_SYSTEMS } from '../../../shared/schemas/api.schema.js';

/** A person who signs in. The password hash is hidden and lazy: never serialised, loaded only to verify. */
export const User = defineEntity({
  name: 'User',
  tableName: 'users',
  properties: {
    id: p.integer().primary().autoincrement(),
    email: p.string().length(254).unique(),
    passwordHash: p.string().length(255).hidden().lazy(true, false),
    units: p.enum([...UNIT_SYSTEMS]).default('mm'),
    createdAt: p.datetime().onCreate(() => new Date()),
    /**
     * Bumped whenever the password is set; a session signed in with an older value is no longer valid.
     * Last, as the migration adds the column (ALTER TABLE … ADD COLUMN appends).
     */
    sessionVersion: p.integer().default(0),
  },
});
export type User = InferEntity<typeof User>;
