import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import type { CutDefaults } from '../../../shared/schemas/api.schema.js';

/**
 * The tenant: every design, stock item, build and upload belongs to one workshop. The settings columns come
 * after `createdAt` in the order their migration adds them (ALTER TABLE … ADD COLUMN appends; start.test compares).
 */
export const Workshop = defineEntity({
  name: 'Workshop',
  tableName: 'workshops',
  properties: {
    id: p.integer().primary().autoincrement(),
    name: p.string().length(120),
    createdAt: p.datetime().onCreate(() => new Date()),
    /** ISO 4217 code shown after prices; null = plain numbers. */
    currency: p.string().length(3).nullable(),
    /** What "Make cut plan" starts from; null = the cut plan settings' own defaults. */
    cutDefaults: p.json<CutDefaults>().nullable(),
    version: p.integer().version(),
  },
});
export type Workshop = InferEntity<typeof Workshop>;
