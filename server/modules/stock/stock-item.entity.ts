import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { GRAIN_KINDS, STOCK_KINDS } from '../../../shared/schemas/api.schema.js';
import { Workshop } from '../workshops/workshop.entity.js';

/**
 * Material in the stock room (PRODUCT.md §4, §6): a sheet, a remnant (an offcut kept from an earlier job) or a
 * roll. Lengths in mm. A sheet or remnant has a height; a roll has a length (null = as much as needed).
 * Quantity null = unlimited. Cost is per sheet/remnant, or per metre for a roll.
 */
export const StockItem = defineEntity({
  name: 'StockItem',
  tableName: 'stock_items',
  properties: {
    id: p.integer().primary().autoincrement(),
    workshop: p.manyToOne(Workshop).deleteRule('cascade').index(),
    kind: p.enum([...STOCK_KINDS]),
    material: p.string().length(80),
    thicknessMm: p.float(),
    widthMm: p.float(),
    heightMm: p.float().nullable(),
    lengthMm: p.float().nullable(),
    quantity: p.integer().nullable(),
    cost: p.float().nullable(),
    grain: p.enum([...GRAIN_KINDS]).default('none'),
    note: p.string().length(200).default(''),
    /** The cut plan whose offcut this remnant is (no foreign key: plans may be deleted, the offcut stays). */
    fromPlanId: p.integer().nullable(),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
    updatedBy: p.string().length(254).nullable(),
  },
});
export type StockItem = InferEntity<typeof StockItem>;
