import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workshop } from '../workshops/workshop.entity.js';

/**
 * One e-mail the program sent (or tried to). With the local catcher (development, tests) the body is kept
 * so the owner can open the links; with a real SMTP server links are kept redacted. `caughtAt` is set when
 * the local catcher received it over SMTP.
 */
export const MailMessage = defineEntity({
  name: 'MailMessage',
  tableName: 'mail_messages',
  properties: {
    id: p.integer().primary().autoincrement(),
    /** The workshop it was sent for; null for account mail (password reset), which no owner may read. */
    workshop: p.manyToOne(Workshop).deleteRule('cascade').nullable().index(),
    kind: p.string().length(32),
    toAddress: p.string().length(254),
    subject: p.string().length(200),
    textBody: p.text(),
    messageId: p.string().length(254).nullable().index(),
    via: p.string().length(16),
    status: p.string().length(16),
    error: p.string().length(300).nullable(),
    sentAt: p.datetime().onCreate(() => new Date()),
    caughtAt: p.datetime().nullable(),
  },
});
export type MailMessage = InferEntity<typeof MailMessage>;
