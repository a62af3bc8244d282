import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workshop } from '../workshops/workshop.entity.js';

/**
 * One change to an item of a workshop: who (e-mail kept as text so it survives the account), what, when.
 * Written by services in the same flush as the change itself, so a change never exists without its record.
 */
export const AuditEvent = defineEntity({
  name: 'AuditEvent',
  tableName: 'audit_events',
  indexes: [{ properties: ['workshop', 'subjectType', 'subjectId'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workshop: p.manyToOne(Workshop).deleteRule('cascade'),
    /** 'design' | 'plan' | 'stock' | 'build' … (text, so new kinds need no migration). */
    subjectType: p.string().length(32),
    subjectId: p.integer(),
    /** 'create' | 'update' | 'delete' | 'import' | 'cut' … */
    action: p.string().length(32),
    /** One plain line a person reads in the History list. */
    summary: p.string().length(300),
    actorEmail: p.string().length(254),
    at: p.datetime().onCreate(() => new Date()),
  },
});
export type AuditEvent = InferEntity<typeof AuditEvent>;
