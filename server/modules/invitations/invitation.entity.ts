import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { ROLES } from '../../../shared/schemas/api.schema.js';
import { Workshop } from '../workshops/workshop.entity.js';

/** An owner's invitation to join a workshop with a role. Only the SHA-256 of the link's token is stored. */
export const Invitation = defineEntity({
  name: 'Invitation',
  tableName: 'invitations',
  properties: {
    id: p.integer().primary().autoincrement(),
    workshop: p.manyToOne(Workshop).deleteRule('cascade').index(),
    email: p.string().length(254),
    role: p.enum([...ROLES]),
    tokenHash: p.string().length(64).unique(),
    expiresAt: p.datetime(),
    acceptedAt: p.datetime().nullable(),
    acceptedByUserId: p.integer().nullable(),
    revokedAt: p.datetime().nullable(),
    invitedBy: p.string().length(254),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
});
export type Invitation = InferEntity<typeof Invitation>;
