import { defineEntity, p, type InferEntity } from '@mikro-orm/core';

/** The tenant: every design (and later stock, builds, uploads) belongs to one workshop. */
export const Workshop = defineEntity({
  name: 'Workshop',
  tableName: 'workshops',
  properties: {
    id: p.integer().primary().autoincrement(),
    name: p.string().length(120),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
});
export type Workshop = InferEntity<typeof Workshop>;
