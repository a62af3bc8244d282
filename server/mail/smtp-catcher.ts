import type { AddressInfo } from 'node:net';
import PostalMime from 'postal-mime';
import { SMTPServer } from 'smtp-server';

export interface CaughtMail {
  /** Order of arrival, from 1. */
  seq: number;
  envelopeFrom: string;
  envelopeTo: string[];
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  messageId: string | null;
  /** Header name (lower case) → first value. */
  headers: Record<string, string>;
  receivedAt: Date;
}

export interface SmtpCatcher {
  /** smtp://127.0.0.1:PORT for nodemailer. */
  url: string;
  port: number;
  /** Every message caught since start (kept in memory, oldest first, at most `keep`). */
  messages(): CaughtMail[];
  /** Resolves with the first caught message matching `match` (already caught or arriving within `timeoutMs`). */
  waitFor(match: (m: CaughtMail) => boolean, timeoutMs?: number): Promise<CaughtMail>;
  close(): Promise<void>;
}

export interface CatcherOptions {
  /** Called for each caught message (e.g. to mark it caught in the database). Errors are logged, not thrown. */
  onMessage?: (mail: CaughtMail) => void | Promise<void>;
  keep?: number;
  /** Largest message accepted, bytes. */
  maxBytes?: number;
  logError?: (...args: unknown[]) => void;
}

/**
 * The local SMTP catcher for development and tests (PRODUCT.md §7): a real SMTP server (smtp-server) on
 * 127.0.0.1 and a free port that accepts every message, parses it (postal-mime) and keeps it. It never relays.
 */
export async function startSmtpCatcher(opts: CatcherOptions = {}): Promise<SmtpCatcher> {
  const keep = opts.keep ?? 500;
  const maxBytes = opts.maxBytes ?? 5 * 1024 * 1024;
  const caught: CaughtMail[] = [];
  const waiters = new Set<{ match: (m: CaughtMail) => boolean; resolve: (m: CaughtMail) => void }>();
  let seq = 0;

  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: maxBytes,
    logger: false,
    banner: 'Boxwright local mail catcher (nothing is relayed)',
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', (err) => callback(err));
      stream.on('end', () => {
        if ((stream as unknown as { sizeExceeded?: boolean }).sizeExceeded) {
          callback(Object.assign(new Error('Message too large'), { responseCode: 552 }));
          return;
        }
        const raw = Buffer.concat(chunks);
        PostalMime.parse(raw)
          .then(async (email) => {
            const headers: Record<string, string> = {};
            for (const h of email.headers) if (!(h.key in headers)) headers[h.key] = h.value;
            const mail: CaughtMail = {
              seq: ++seq,
              envelopeFrom: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
              envelopeTo: session.envelope.rcptTo.map((r) => r.address),
              from: email.from?.address ?? '',
              to: (email.to ?? []).map((a) => a.address ?? '').filter(Boolean),
              subject: email.subject ?? '',
              text: email.text ?? '',
              html: email.html ?? null,
              messageId: email.messageId ?? null,
              headers,
              receivedAt: new Date(),
            };
            caught.push(mail);
            if (caught.length > keep) caught.splice(0, caught.length - keep);
            // Recorded before the SMTP answer, so when the sender's send() resolves the record says "caught".
            try {
              await opts.onMessage?.(mail);
            } catch (err) {
              (opts.logError ?? console.error)('Mail catcher: could not record a caught message', err);
            }
            callback();
            for (const w of waiters) {
              if (w.match(mail)) {
                waiters.delete(w);
                w.resolve(mail);
              }
            }
          })
          .catch((err: unknown) => callback(err instanceof Error ? err : new Error(String(err))));
      });
    },
  });

  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      server.off('error', reject);
      resolve();
    });
  });
  server.on('error', (err) => (opts.logError ?? console.error)('Mail catcher error', err));
  const port = (server.server.address() as AddressInfo).port;

  return {
    url: `smtp://127.0.0.1:${port}`,
    port,
    messages: () => [...caught],
    waitFor(match, timeoutMs = 5000) {
      const found = caught.find(match);
      if (found) return Promise.resolve(found);
      return new Promise((resolve, reject) => {
        const waiter = { match, resolve: (m: CaughtMail) => (clearTimeout(timer), resolve(m)) };
        const timer = setTimeout(() => {
          waiters.delete(waiter);
          reject(new Error(`No matching e-mail reached the catcher within ${timeoutMs} ms`));
        }, timeoutMs);
        waiters.add(waiter);
      });
    },
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
