/**
 * Setting a password through a reset link ends the account's other sessions (OWASP Forgot Password Cheat
 * Sheet: "invalidate existing sessions" after a reset; OWASP Session Management Cheat Sheet: renew the session
 * id after a privilege change). The session doing the change, if signed in as that account, stays signed in.
 */
import request from 'supertest';
import { ERROR_CODES } from '../../shared/errors.js';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseSessionRef } from '../../server/modules/auth/auth.passport.js';
import { User } from '../../server/modules/auth/user.entity.js';
import { signIn, signUp, type Agent } from './helpers.js';
import { buildMailTestApp, linkToken, type MailTestApp } from './mail-fixture.js';

const FIRST_PASSWORD = 'a-long-password-1'; // what helpers.signUp uses

let t: MailTestApp;
beforeAll(async () => {
  t = await buildMailTestApp();
});
afterAll(async () => t.close());

async function resetLinkFor(email: string): Promise<string> {
  const after = t.catcher.messages().at(-1)?.seq ?? 0;
  await request(t.app).post('/api/password-reset').send({ email }).expect(202);
  const mail = await t.catcher.waitFor((m) => m.seq > after && m.to.includes(email) && m.headers['x-boxwright-kind'] === 'password-reset');
  return linkToken(mail, '/reset-password/');
}

const meStatus = async (agent: Agent) => (await agent.get('/api/auth/me')).status;

async function versionOf(email: string): Promise<number> {
  return (await t.orm.em.fork().findOneOrFail(User, { email })).sessionVersion;
}

describe('password reset ends other sessions', () => {
  it('a reset from a signed-out browser signs out every session of the account; the new password works, the old does not', async () => {
    const email = 'two-browsers@sessions.test';
    const { agent: laptop, workshopId } = await signUp(t.app, email, 'Sessions Workshop 1');
    const phone = await signIn(t.app, email, FIRST_PASSWORD);
    const someoneElse = await signUp(t.app, 'bystander@sessions.test', 'Sessions Workshop 2');
    expect(await meStatus(laptop)).toBe(200);
    expect(await meStatus(phone)).toBe(200);
    const before = await versionOf(email);

    const token = await resetLinkFor(email);
    await request(t.app).post(`/api/password-reset/${token}`).send({ password: 'the-new-password-2' }).expect(204);

    expect(await versionOf(email)).toBe(before + 1);
    for (const agent of [laptop, phone]) {
      const res = await agent.get('/api/auth/me');
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe(ERROR_CODES.unauthenticated);
      // Still signed out on the next request, and on workshop routes too.
      expect((await agent.get(`/api/workshops/${workshopId}/designs`)).status).toBe(401);
    }
    // Another account's session is untouched.
    expect(await meStatus(someoneElse.agent)).toBe(200);

    await request(t.app).post('/api/auth/login').send({ email, password: FIRST_PASSWORD }).expect(401);
    const fresh = await signIn(t.app, email, 'the-new-password-2');
    expect(await meStatus(fresh)).toBe(200);
  });

  it('a reset made while signed in as the account keeps that session (with a new id) and ends the others', async () => {
    const email = 'keeps-this-one@sessions.test';
    const { agent: here } = await signUp(t.app, email, 'Sessions Workshop 3');
    const elsewhere = await signIn(t.app, email, FIRST_PASSWORD);
    const token = await resetLinkFor(email);

    const oldCookie = (await here.get('/api/auth/me').expect(200)).request.cookies;
    const res = await here.post(`/api/password-reset/${token}`).send({ password: 'changed-while-in-3' }).expect(204);
    const newCookie = res.headers['set-cookie'];
    expect(newCookie, 'the session id is renewed').toBeDefined();

    const me = await here.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user).toEqual({ id: expect.any(Number), email, units: 'mm' }); // no session version leaks out
    expect(String(me.request.cookies)).not.toBe(String(oldCookie));
    expect(await meStatus(elsewhere)).toBe(401);
  });

  it('a signed-in person using a link for another account keeps their own session', async () => {
    const target = 'other-account@sessions.test';
    const { agent: targetAgent } = await signUp(t.app, target, 'Sessions Workshop 4');
    const { agent: helper } = await signUp(t.app, 'helper@sessions.test', 'Sessions Workshop 5');
    const token = await resetLinkFor(target);
    await helper.post(`/api/password-reset/${token}`).send({ password: 'someone-else-set-4' }).expect(204);
    expect(await meStatus(helper)).toBe(200);
    expect(await meStatus(targetAgent)).toBe(401);
  });

  it('a stored session keeps only the user id and the version; sessions from before versions read as version 0', async () => {
    const email = 'stored-shape@sessions.test';
    await signUp(t.app, email, 'Sessions Workshop 6');
    const id = (await t.orm.em.fork().findOneOrFail(User, { email })).id;
    const all = await new Promise<Record<string, { passport?: { user?: unknown } }>>((resolve, reject) =>
      t.sessionStore.all!((err, s) => (err ? reject(err) : resolve((s ?? {}) as Record<string, { passport?: { user?: unknown } }>))),
    );
    const refs = Object.values(all).map((s) => s.passport?.user);
    expect(refs).toContainEqual({ id, v: 0 });

    expect(parseSessionRef(id)).toEqual({ id, v: 0 });
    expect(parseSessionRef({ id, v: 3 })).toEqual({ id, v: 3 });
    for (const bad of [null, undefined, '7', 1.5, { id }, { id: '7', v: 0 }, { id: 7, v: 'x' }]) expect(parseSessionRef(bad)).toBeNull();
  });
});
