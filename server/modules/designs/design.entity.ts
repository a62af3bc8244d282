import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import type { Design as DesignJson } from '../../../shared/schemas/design.schema.js';
import { Workshop } from '../workshops/workshop.entity.js';

/**
 * A saved cabinet design: the design JSON of PRODUCT.md §8 (defaults filled in), its name for listing,
 * and a version that MikroORM checks on every update (optimistic locking → 409).
 */
export const Design = defineEntity({
  name: 'Design',
  tableName: 'designs',
  properties: {
    id: p.integer().primary().autoincrement(),
    workshop: p.manyToOne(Workshop).deleteRule('cascade').index(),
    name: p.string().length(120),
    data: p.json<DesignJson>(),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
    /** E-mail of the person who saved last (kept as text so it survives the account). */
    updatedBy: p.string().length(254).nullable(),
  },
});
export type Design = InferEntity<typeof Design>;
