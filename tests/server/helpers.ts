/**
 * Test harness for the API: a fresh in-memory database (migrated with the committed migrations), the demo
 * seed, an in-memory session store, and the real app from createApp(); requests go through supertest.
 */
import type { Express } from 'express';
import type { Store } from 'express-session';
import request from 'supertest';
import { createApp, type AppDeps } from '../../server/app.js';
import { initOrm, migrate, type Orm } from '../../server/db.js';
import type { Logger } from '../../server/middleware/error-handler.js';
import type { RateLimitOptions } from '../../server/modules/auth/rate-limit.js';
import { DEMO_EMAILS, DEMO_PASSWORD, seedDemo } from '../../server/seed.js';
import { createSessionStore } from '../../server/sessions.js';

export type Agent = ReturnType<typeof request.agent>;

export interface TestApp {
  app: Express;
  orm: Orm;
  sessionStore: Store;
  logged: string[];
  close(): Promise<void>;
}

const GENEROUS: RateLimitOptions = { windowMs: 60_000, limit: 10_000 };

export async function buildTestApp(
  opts: { seed?: boolean; loginLimit?: RateLimitOptions; signupLimit?: RateLimitOptions; deps?: Partial<AppDeps> } = {},
): Promise<TestApp> {
  const orm = await initOrm({ dbName: ':memory:' });
  await migrate(orm);
  if (opts.seed ?? true) await seedDemo(orm);
  const sessions = await createSessionStore(':memory:');
  const logged: string[] = [];
  const logger: Logger = {
    info: () => {},
    warn: (...args: unknown[]) => logged.push(args.map(String).join(' ')),
    error: (...args: unknown[]) => logged.push(args.map(String).join(' ')),
  };
  const app = createApp({
    orm,
    sessionStore: sessions.store,
    sessionSecret: 'test-secret-that-is-long-enough-0123456789',
    loginLimit: opts.loginLimit ?? GENEROUS,
    signupLimit: opts.signupLimit ?? GENEROUS,
    logger,
    ...opts.deps,
  });
  return {
    app,
    orm,
    sessionStore: sessions.store,
    logged,
    close: async () => {
      await sessions.close();
      await orm.close(true);
    },
  };
}

/** The demo people's e-mails by role (server/seed.ts). */
export const DEMO = DEMO_EMAILS;

/** A signed-in agent (keeps the session cookie between requests). */
export async function signIn(app: Express, email: string, password: string = DEMO_PASSWORD): Promise<Agent> {
  const agent = request.agent(app);
  const res = await agent.post('/api/auth/login').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}

/** Signs up a new account with its own workshop and returns the agent and the workshop id. */
export async function signUp(app: Express, email: string, workshopName: string): Promise<{ agent: Agent; workshopId: number; userId: number }> {
  const agent = request.agent(app);
  const res = await agent.post('/api/auth/signup').send({ email, password: 'a-long-password-1', workshopName });
  if (res.status !== 201) throw new Error(`sign-up of ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { agent, workshopId: res.body.memberships[0].workshopId, userId: res.body.user.id };
}

/** Number of live sessions in the store. */
export function sessionCount(store: Store): Promise<number> {
  return new Promise((resolve, reject) => {
    if (!store.length) return reject(new Error('store cannot count'));
    store.length((err, n) => (err ? reject(err) : resolve(n ?? 0)));
  });
}
