import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { User } from '../auth/user.entity.js';

/** A password-reset link: single use, short-lived; only the SHA-256 of its token is stored. */
export const PasswordResetToken = defineEntity({
  name: 'PasswordResetToken',
  tableName: 'password_reset_tokens',
  properties: {
    id: p.integer().primary().autoincrement(),
    user: p.manyToOne(User).deleteRule('cascade').index(),
    tokenHash: p.string().length(64).unique(),
    expiresAt: p.datetime(),
    usedAt: p.datetime().nullable(),
    createdAt: p.datetime().onCreate(() => new Date()),
  },
});
export type PasswordResetToken = InferEntity<typeof PasswordResetToken>;
