import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { CutPlan } from '../cut-plans/cut-plan.entity.js';
import { Workshop } from '../workshops/workshop.entity.js';

/**
 * One ticked item of a cut plan's checklist: a piece cut (`part:<partId>#<n>`) or a sheet cut
 * (`sheet:<groupKey>/<index>`). Who and when are kept; un-ticking deletes the row (the audit keeps the story).
 * A sheet tick remembers what it changed in the stock room, so un-ticking can put it back.
 */
export const ChecklistTick = defineEntity({
  name: 'ChecklistTick',
  tableName: 'checklist_ticks',
  uniques: [{ properties: ['cutPlan', 'itemKey'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workshop: p.manyToOne(Workshop).deleteRule('cascade').index(),
    cutPlan: p.manyToOne(CutPlan).deleteRule('cascade').index(),
    itemKey: p.string().length(300),
    byEmail: p.string().length(254),
    at: p.datetime().onCreate(() => new Date()),
    /** Sheet ticks: the stock room item deducted (null for typed-in or unlimited stock). */
    stockItemId: p.integer().nullable(),
    /** Sheet ticks: how much was deducted (pieces, or mm of a roll). */
    deducted: p.float().nullable(),
    /** Sheet ticks: the remnants added from the sheet's kept offcuts. */
    remnantIds: p.json<number[]>().nullable(),
  },
});
export type ChecklistTick = InferEntity<typeof ChecklistTick>;
