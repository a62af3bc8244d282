import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { DEFAULT_DB_PATH, ROOT_DIR } from '../mikro-orm.config.js';
import { createApp } from './app.js';
import { initOrm, migrate } from './db.js';
import type { Logger } from './middleware/error-handler.js';
import type { RateLimitOptions } from './modules/auth/rate-limit.js';
import { seedDemo, shouldSeed } from './seed.js';
import { createSmtpMailer, type Mailer } from './mail/mailer.js';
import { startSmtpCatcher, type SmtpCatcher } from './mail/smtp-catcher.js';
import { markMailCaught } from './modules/mail/mail.service.js';
import { LocalDiskStorage, MemoryStorage, type FileStorage } from './storage/storage.js';
import { createSessionStore } from './sessions.js';

export interface StartOptions {
  /** Default: env PORT, else 3000. 0 picks a free port. */
  port?: number;
  /** Interface to listen on. Default: env HOST, else every interface. */
  host?: string;
  /** Default: env DB_PATH, else data/boxwright.sqlite. */
  dbPath?: string;
  /** Default: env SESSIONS_PATH, else sessions.sqlite beside the database (':memory:' with a memory database). */
  sessionsPath?: string;
  /** Seed the demo into a new database (default true; never when NODE_ENV=production). */
  seed?: boolean;
  /** No progress lines (errors are still logged). */
  quiet?: boolean;
  /** The built client to serve; default dist/client; null for the API only. */
  clientDir?: string | null;
  loginLimit?: RateLimitOptions;
  /** SMTP server for outgoing mail (nodemailer URL). Default env SMTP_URL; when unset, a local catcher is started. */
  smtpUrl?: string;
  /** Address links in e-mails point to. Default env PUBLIC_URL, else http://localhost:PORT. */
  publicUrl?: string;
  /** Folder for uploaded files. Default env UPLOADS_DIR, else uploads/ beside the database (memory for a memory database). */
  uploadsDir?: string;
}

export interface RunningServer {
  url: string;
  port: number;
  /** Whether this start seeded the demo. */
  seeded: boolean;
  /** The local SMTP catcher, when no SMTP_URL was given (development and tests). */
  mailCatcher: SmtpCatcher | null;
  close(): Promise<void>;
}

export const DEFAULT_CLIENT_DIR = path.join(ROOT_DIR, 'dist', 'client');

/** SESSION_SECRET, else a random secret kept beside the sessions file so sign-ins survive a restart. */
function sessionSecret(sessionsPath: string): string {
  const fromEnv = process.env.SESSION_SECRET;
  if (fromEnv) return fromEnv;
  if (sessionsPath === ':memory:') return randomBytes(32).toString('hex');
  const file = path.join(path.dirname(path.resolve(sessionsPath)), 'session-secret');
  if (existsSync(file)) {
    const secret = readFileSync(file, 'utf8').trim();
    if (secret.length >= 32) return secret;
  }
  mkdirSync(path.dirname(file), { recursive: true });
  const secret = randomBytes(32).toString('hex');
  writeFileSync(file, secret + '\n', { mode: 0o600 });
  return secret;
}

function parsePort(value: string | number | undefined, fallback: number): number {
  if (value === undefined || value === '') return fallback;
  const port = Number(value);
  if (!Number.isInteger(port) || port < 0 || port > 65535) throw new Error(`PORT must be a whole number from 0 to 65535, not "${value}"`);
  return port;
}

/**
 * Migrates the database, seeds a new one with the demo (unless NODE_ENV=production), and listens.
 * `npm start` (server/index.ts) and the browser tests (in-process, port 0) both start the app this way.
 */
export async function startServer(opts: StartOptions = {}): Promise<RunningServer> {
  const quietLogger: Logger = { info: () => {}, warn: console.warn, error: console.error };
  const logger: Logger = opts.quiet ? quietLogger : console;
  const port = parsePort(opts.port ?? process.env.PORT, 3000);
  const dbPath = opts.dbPath ?? (process.env.DB_PATH || DEFAULT_DB_PATH);
  const sessionsPath =
    opts.sessionsPath ??
    (process.env.SESSIONS_PATH || (dbPath === ':memory:' ? ':memory:' : path.join(path.dirname(path.resolve(dbPath)), 'sessions.sqlite')));

  const orm = await initOrm({ dbName: dbPath });
  let closeSessions: (() => Promise<void>) | undefined;
  try {
    const { wasNew, applied } = await migrate(orm);
    if (applied.length) logger.info(`Database ${dbPath}: applied ${applied.length} migration(s).`);
    const seeded = shouldSeed({ wasNew, requested: opts.seed ?? true, nodeEnv: process.env.NODE_ENV }) ? await seedDemo(orm) : false;
    if (seeded) logger.info('Seeded the demo workshop "Harbour Lane Audio".');

    const sessions = await createSessionStore(sessionsPath);
    closeSessions = sessions.close;

    // E-mail: a real SMTP server when configured, else the local catcher (PRODUCT.md §7: nothing beyond localhost).
    const smtpUrl = opts.smtpUrl ?? process.env.SMTP_URL;
    let mailCatcher: SmtpCatcher | null = null;
    let mailer: Mailer;
    if (smtpUrl) mailer = createSmtpMailer({ smtpUrl, from: process.env.MAIL_FROM || undefined });
    else {
      mailCatcher = await startSmtpCatcher({
        logError: logger.error,
        onMessage: async (m) => {
          await markMailCaught(orm.em, m.messageId, m.receivedAt);
          logger.info(`Mail caught by the local catcher: to ${m.to.join(', ')} — "${m.subject}"`);
          // Account mail (a password reset) belongs to no workshop, so no owner sees it: show its link here.
          if (m.headers['x-boxwright-kind'] === 'password-reset') {
            const link = /https?:\/\/\S+/.exec(m.text)?.[0];
            if (link) logger.info(`  password link: ${link}`);
          }
        },
      });
      mailer = createSmtpMailer({ smtpUrl: mailCatcher.url, via: 'catcher', from: process.env.MAIL_FROM || undefined });
    }
    const closeMail = async () => {
      mailer.close();
      await mailCatcher?.close();
    };
    closeSessions = async () => {
      await sessions.close();
      await closeMail();
    };
    const uploadsDir = opts.uploadsDir ?? (process.env.UPLOADS_DIR || (dbPath === ':memory:' ? null : path.join(path.dirname(path.resolve(dbPath)), 'uploads')));
    const storage: FileStorage = uploadsDir ? new LocalDiskStorage(uploadsDir) : new MemoryStorage();
    let listeningPort = port;
    const publicUrl = (opts.publicUrl ?? process.env.PUBLIC_URL ?? '').replace(/\/+$/, '');
    const app = createApp({
      orm,
      sessionStore: sessions.store,
      sessionSecret: sessionSecret(sessionsPath),
      secureCookies: process.env.COOKIE_SECURE === 'true',
      trustProxy: process.env.TRUST_PROXY ? (/^\d+$/.test(process.env.TRUST_PROXY) ? Number(process.env.TRUST_PROXY) : process.env.TRUST_PROXY) : undefined,
      loginLimit: opts.loginLimit,
      clientDir: opts.clientDir === undefined ? DEFAULT_CLIENT_DIR : opts.clientDir,
      logger,
      mailer,
      storage,
      publicUrl: () => publicUrl || `http://localhost:${listeningPort}`,
    });
    if (opts.clientDir !== null && !existsSync(path.join(opts.clientDir ?? DEFAULT_CLIENT_DIR, 'index.html'))) {
      logger.warn('No built client in dist/client (run `npx vite build`); serving the API only.');
    }

    const server = http.createServer(app);
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(port, opts.host ?? process.env.HOST, () => {
        server.off('error', reject);
        resolve();
      });
    });
    const actualPort = (server.address() as AddressInfo).port;
    listeningPort = actualPort;
    if (mailCatcher) logger.info(`E-mail goes to the local catcher at ${mailCatcher.url} (set SMTP_URL to send for real); owners read it on the Sent mail page.`);
    let closing: Promise<void> | undefined;
    return {
      url: `http://127.0.0.1:${actualPort}`,
      port: actualPort,
      seeded,
      mailCatcher,
      close: () =>
        (closing ??= (async () => {
          await new Promise<void>((resolve) => {
            server.close(() => resolve());
            server.closeAllConnections();
          });
          await sessions.close();
          await closeMail();
          await orm.close(true);
        })()),
    };
  } catch (err) {
    await closeSessions?.();
    await orm.close(true);
    throw err;
  }
}
