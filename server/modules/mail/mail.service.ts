import { randomUUID } from 'node:crypto';
import type { EntityManager } from '@mikro-orm/sqlite';
import type { MailMessageDto } from '../../../shared/schemas/api.schema.js';
import type { Logger } from '../../middleware/error-handler.js';
import type { Mailer, OutgoingMail } from '../../mail/mailer.js';
import { MailMessage } from './mail-message.entity.js';

/** Link tokens in our own links (…/invite/TOKEN, …/reset-password/TOKEN, …/share/TOKEN). */
const LINK_TOKEN = /(\/(?:invite|reset-password|share)\/)[A-Za-z0-9_-]{43}/g;

export function redactLinkTokens(text: string): string {
  return text.replace(LINK_TOKEN, '$1[link hidden]');
}

function toDto(m: MailMessage): MailMessageDto {
  return {
    id: m.id,
    kind: m.kind,
    to: m.toAddress,
    subject: m.subject,
    text: m.textBody,
    via: m.via as MailMessageDto['via'],
    status: m.status as MailMessageDto['status'],
    error: m.error ?? null,
    sentAt: m.sentAt.toISOString(),
    caughtAt: m.caughtAt ? m.caughtAt.toISOString() : null,
  };
}

/**
 * Sends the program's e-mail and keeps a record of each: the full text when it goes to the local catcher
 * (development and tests), with link tokens hidden when it goes to a real SMTP server.
 */
export class MailService {
  constructor(
    private readonly em: EntityManager,
    private readonly mailer: Mailer,
    private readonly logger: Logger = console,
  ) {}

  get via() {
    return this.mailer.via;
  }

  /** Records, then sends; never throws for a delivery failure (the record says it failed). */
  async send(workshopId: number | null, mail: OutgoingMail): Promise<{ sent: boolean; id: number }> {
    const em = this.em.fork();
    const messageId = `<${randomUUID()}@boxwright.localhost>`;
    const record = em.create(MailMessage, {
      workshop: workshopId,
      kind: mail.kind,
      toAddress: mail.to,
      subject: mail.subject.slice(0, 200),
      textBody: this.mailer.via === 'smtp' ? redactLinkTokens(mail.text) : mail.text,
      messageId,
      via: this.mailer.via,
      status: 'sending',
      error: null,
      caughtAt: null,
    });
    await em.flush();
    let sent = true;
    try {
      await this.mailer.send({ ...mail, messageId });
      record.status = 'sent';
    } catch (err) {
      sent = false;
      record.status = 'failed';
      record.error = (err instanceof Error ? err.message : String(err)).slice(0, 300);
      this.logger.warn(`E-mail to ${mail.to} (${mail.kind}) could not be sent: ${record.error}`);
    }
    await em.flush();
    return { sent, id: record.id };
  }

  /** What was sent for a workshop, newest first (owner only; account mail such as password resets is never listed). */
  async list(workshopId: number, limit = 200): Promise<MailMessageDto[]> {
    const rows = await this.em.find(MailMessage, { workshop: workshopId }, { orderBy: { sentAt: 'desc', id: 'desc' }, limit });
    return rows.map(toDto);
  }
}

/** The local catcher received a message: stamp its record (matched by Message-ID). */
export async function markMailCaught(em: EntityManager, messageId: string | null, at: Date): Promise<void> {
  if (!messageId) return;
  const id = messageId.startsWith('<') ? messageId : `<${messageId}>`;
  await em.fork().nativeUpdate(MailMessage, { messageId: id }, { caughtAt: at });
}
