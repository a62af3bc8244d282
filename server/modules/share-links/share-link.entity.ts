import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { CutPlan } from '../cut-plans/cut-plan.entity.js';
import { Workshop } from '../workshops/workshop.entity.js';

/** A read-only link to one cut plan and its exports, for someone without an account. Only the token's SHA-256 is kept. */
export const ShareLink = defineEntity({
  name: 'ShareLink',
  tableName: 'share_links',
  properties: {
    id: p.integer().primary().autoincrement(),
    workshop: p.manyToOne(Workshop).deleteRule('cascade').index(),
    cutPlan: p.manyToOne(CutPlan).deleteRule('cascade').index(),
    tokenHash: p.string().length(64).unique(),
    expiresAt: p.datetime(),
    revokedAt: p.datetime().nullable(),
    /** E-mail it was sent to, if it was sent. */
    sentTo: p.string().length(254).nullable(),
    createdBy: p.string().length(254),
    createdAt: p.datetime().onCreate(() => new Date()),
    lastOpenedAt: p.datetime().nullable(),
    openCount: p.integer().default(0),
  },
});
export type ShareLink = InferEntity<typeof ShareLink>;
