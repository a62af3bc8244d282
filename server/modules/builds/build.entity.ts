import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workshop } from '../workshops/workshop.entity.js';

/** One line of a build: a design and how many cabinets are built from it. */
export interface BuildItemValue {
  designId: number;
  quantity: number;
  /** Half of the cabinets are the mirror image of the design (the other side of a pair). */
  mirroredPair: boolean;
}

/**
 * A build: a named set of designs × quantities taken to a cut plan (PRODUCT.md §6). The items are a value
 * list (JSON) that names designs by id, so deleting a design never fails on a build; a build whose design
 * is gone says so when it is planned.
 */
export const Build = defineEntity({
  name: 'Build',
  tableName: 'builds',
  properties: {
    id: p.integer().primary().autoincrement(),
    workshop: p.manyToOne(Workshop).deleteRule('cascade').index(),
    name: p.string().length(120),
    notes: p.string().length(1000).default(''),
    items: p.json<BuildItemValue[]>(),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
    /** E-mail of the person who saved last (text, survives the account). */
    updatedBy: p.string().length(254).nullable(),
  },
});
export type Build = InferEntity<typeof Build>;
