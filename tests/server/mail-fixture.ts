/**
 * A test app whose e-mail goes over real SMTP (nodemailer) to the local catcher (smtp-server on 127.0.0.1),
 * with the catcher marking the records as caught, as server/start.ts wires it.
 */
import { createSmtpMailer } from '../../server/mail/mailer.js';
import { startSmtpCatcher, type CaughtMail, type SmtpCatcher } from '../../server/mail/smtp-catcher.js';
import { markMailCaught } from '../../server/modules/mail/mail.service.js';
import { MemoryStorage } from '../../server/storage/storage.js';
import { buildTestApp, type TestApp } from './helpers.js';

export const PUBLIC_URL = 'https://boxwright.test';

export interface MailTestApp extends TestApp {
  catcher: SmtpCatcher;
  storage: MemoryStorage;
}

export async function buildMailTestApp(): Promise<MailTestApp> {
  let appRef: TestApp | undefined;
  const catcher = await startSmtpCatcher({
    onMessage: async (m) => {
      if (appRef) await markMailCaught(appRef.orm.em, m.messageId, m.receivedAt);
    },
  });
  const mailer = createSmtpMailer({ smtpUrl: catcher.url, via: 'catcher' });
  const storage = new MemoryStorage();
  const t = await buildTestApp({ deps: { mailer, storage, publicUrl: () => PUBLIC_URL, resetLimit: { windowMs: 60_000, limit: 1000 } } });
  appRef = t;
  return {
    ...t,
    catcher,
    storage,
    close: async () => {
      mailer.close();
      await catcher.close();
      await t.close();
    },
  };
}

/** The first link to our public address with a token after `path` (e.g. '/invite/'). */
export function linkToken(mail: CaughtMail, path: string): string {
  const m = new RegExp(`${PUBLIC_URL.replace(/\./g, '\\.')}${path}([A-Za-z0-9_-]{43})`).exec(mail.text);
  if (!m) throw new Error(`no ${path} link in: ${mail.text}`);
  return m[1]!;
}
