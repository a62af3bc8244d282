import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { ROLES } from '../../../shared/schemas/api.schema.js';
import { User } from '../auth/user.entity.js';
import { Workshop } from './workshop.entity.js';

/** One person's role in one workshop (PRODUCT.md §2); a person has at most one role per workshop. */
export const Membership = defineEntity({
  name: 'Membership',
  tableName: 'memberships',
  uniques: [{ properties: ['user', 'workshop'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    user: p.manyToOne(User).deleteRule('cascade'),
    workshop: p.manyToOne(Workshop).deleteRule('cascade'),
    role: p.enum([...ROLES]),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
});
export type Membership = InferEntity<typeof Membership>;
