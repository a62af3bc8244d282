/**
 * Sign-up, sign-in, sign-out, "me", preferences, password storage, session cookie and the sign-in rate limit.
 * Outside references named beside each check.
 */
import { wrap } from '@mikro-orm/core';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '../../server/modules/auth/user.entity.js';
import { buildTestApp, DEMO, sessionCount, signIn, type TestApp } from './helpers.js';

let t: TestApp;
beforeAll(async () => {
  t = await buildTestApp();
});
afterAll(async () => t.close());

async function storedHash(email: string): Promise<string> {
  const rows = await t.orm.em.fork().getConnection().execute<{ password_hash: string }[]>('select password_hash from users where email = ?', [email]);
  return rows[0]!.password_hash;
}

describe('sign-up', () => {
  it('creates a workshop with the new user as its owner and signs them in (201, RFC 9110 §15.3.2)', async () => {
    const agent = request.agent(t.app);
    const res = await agent.post('/api/auth/signup').send({ email: '  New.Person@Example.TEST ', password: 'correct horse battery', workshopName: 'Quayside Cabinets' });
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ email: 'new.person@example.test', units: 'mm' });
    expect(res.body.memberships).toEqual([{ workshopId: expect.any(Number), workshopName: 'Quayside Cabinets', role: 'owner' }]);
    const me = await agent.get('/api/auth/me').expect(200);
    expect(me.body).toEqual(res.body);
    const members = await agent.get(`/api/workshops/${res.body.memberships[0].workshopId}/members`).expect(200);
    expect(members.body.items).toEqual([{ userId: res.body.user.id, email: 'new.person@example.test', role: 'owner' }]);
  });

  it('rejects bad bodies with 400 and a message per field', async () => {
    const res = await request(t.app).post('/api/auth/signup').send({ email: 'not-an-email', password: 'short', workshopName: '  ' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password', 'workshopName']);
    expect(res.body.error.fields.password).toMatch(/10 characters/);
  });

  it('refuses an e-mail that already has an account, writing nothing', async () => {
    const before = await t.orm.em.fork().count(User, {});
    const res = await request(t.app).post('/api/auth/signup').send({ email: DEMO.viewer.toUpperCase(), password: 'another long one', workshopName: 'Twice' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.email).toMatch(/already/);
    expect(await t.orm.em.fork().count(User, {})).toBe(before);
  });
});

describe('passwords', () => {
  it('are stored as argon2id PHC strings with m=19456 KiB, t=2, p=1 and never returned', async () => {
    // PHC string format (github.com/P-H-C/phc-string-format) with version 19 = 0x13 (RFC 9106 §3.1);
    // m=19 MiB, t=2, p=1 is the OWASP Password Storage Cheat Sheet's minimum argon2id configuration.
    const agent = request.agent(t.app);
    const res = await agent.post('/api/auth/signup').send({ email: 'hash@example.test', password: 'a very secret phrase', workshopName: 'Hash Bench' });
    expect(res.status).toBe(201);
    const hash = await storedHash('hash@example.test');
    expect(hash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$[A-Za-z0-9+/]{22}\$[A-Za-z0-9+/]{43}$/);
    expect(hash).not.toContain('a very secret phrase');
    for (const body of [res.body, (await agent.get('/api/auth/me')).body]) {
      const text = JSON.stringify(body);
      expect(text).not.toMatch(/argon2|password/i);
    }
    // Hidden on the entity too, so even an accidental serialisation leaves it out.
    const user = await t.orm.em.fork().findOneOrFail(User, { email: 'hash@example.test' }, { populate: ['passwordHash'] });
    expect(user.passwordHash).toBe(hash);
    expect(Object.keys(wrap(user).toObject())).not.toContain('passwordHash');
  });

  it('two accounts with the same password get different salts', async () => {
    expect(await storedHash(DEMO.owner)).not.toBe(await storedHash(DEMO.designer));
  });
});

describe('sign-in and sign-out', () => {
  it('signs in with the right password, sets an HttpOnly SameSite=Lax cookie, and persists the session', async () => {
    const before = await sessionCount(t.sessionStore);
    const agent = request.agent(t.app);
    const res = await agent.post('/api/auth/login').send({ email: DEMO.maker, password: 'boxwright-demo' });
    expect(res.status).toBe(200);
    expect(res.body.memberships).toEqual([{ workshopId: expect.any(Number), workshopName: 'Harbour Lane Audio', role: 'maker' }]);
    const cookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith('boxwright.sid='));
    expect(cookie).toBeDefined();
    // HttpOnly: RFC 6265 §5.2.6; SameSite=Lax: RFC 6265bis (draft-ietf-httpbis-rfc6265bis) §5.6.7;
    // no Secure on plain http localhost (RFC 6265 §5.2.5 would make the browser drop it over http).
    expect(cookie).toMatch(/;\s*HttpOnly/i);
    expect(cookie).toMatch(/;\s*SameSite=Lax/i);
    expect(cookie).toMatch(/;\s*Path=\//i);
    expect(cookie).not.toMatch(/;\s*Secure/i);
    expect(await sessionCount(t.sessionStore)).toBe(before + 1);
    await agent.get('/api/auth/me').expect(200);
  });

  it('answers 401 for a wrong password or an unknown e-mail, with the same message', async () => {
    const wrong = await request(t.app).post('/api/auth/login').send({ email: DEMO.maker, password: 'not-the-password' });
    const unknown = await request(t.app).post('/api/auth/login').send({ email: 'nobody@harbourlane.test', password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error.code).toBe('invalid_credentials');
    expect(unknown.body).toEqual(wrong.body);
    expect(wrong.headers['set-cookie']).toBeUndefined();
  });

  it('answers 400 naming the field for a malformed sign-in body', async () => {
    const res = await request(t.app).post('/api/auth/login').send({ email: 'x', password: '' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password']);
  });

  it('signs out (204, RFC 9110 §15.3.5): the session is gone and the cookie no longer works', async () => {
    const agent = await signIn(t.app, DEMO.viewer);
    const cookieBefore = await sessionCount(t.sessionStore);
    await agent.post('/api/auth/logout').expect(204);
    expect(await sessionCount(t.sessionStore)).toBe(cookieBefore - 1);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(401);
    expect(me.body.error.code).toBe('not_signed_in');
  });

  it('a session whose account was deleted is signed out', async () => {
    const agent = request.agent(t.app);
    await agent.post('/api/auth/signup').send({ email: 'gone@example.test', password: 'soon to be gone', workshopName: 'Gone' }).expect(201);
    const em = t.orm.em.fork();
    await em.nativeDelete(User, { email: 'gone@example.test' });
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });
});

describe('preferences', () => {
  it('PATCH /api/auth/me switches the units shown', async () => {
    const agent = await signIn(t.app, DEMO.designer);
    const res = await agent.patch('/api/auth/me').send({ units: 'in' });
    expect(res.status).toBe(200);
    expect(res.body.user.units).toBe('in');
    expect((await agent.get('/api/auth/me')).body.user.units).toBe('in');
    const bad = await agent.patch('/api/auth/me').send({ units: 'cubits' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['units']);
    await agent.patch('/api/auth/me').send({ units: 'mm' }).expect(200);
  });
});

describe('sign-in rate limit', () => {
  it('after the allowed failures answers 429 (RFC 6585 §4) with Retry-After and the JSON error shape', async () => {
    const limited = await buildTestApp({ loginLimit: { windowMs: 60_000, limit: 3 } });
    try {
      const attempt = (email: string, password: string) => request(limited.app).post('/api/auth/login').send({ email, password });
      for (let i = 0; i < 3; i++) expect((await attempt(DEMO.owner, 'wrong-guess')).status).toBe(401);
      const blocked = await attempt(DEMO.owner, 'boxwright-demo');
      expect(blocked.status).toBe(429);
      expect(blocked.body.error.code).toBe('too_many_attempts');
      expect(blocked.body.error.message).toMatch(/Try again in 1 minute/);
      // Retry-After in seconds: RFC 9110 §10.2.3.
      expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
      expect(Number(blocked.headers['retry-after'])).toBeLessThanOrEqual(60);
      // Keyed by address and e-mail: another account from the same address still signs in.
      expect((await attempt(DEMO.maker, 'boxwright-demo')).status).toBe(200);
    } finally {
      await limited.close();
    }
  });

  it('counts failures only: successful sign-ins beyond the limit are not blocked', async () => {
    const limited = await buildTestApp({ loginLimit: { windowMs: 60_000, limit: 2 } });
    try {
      for (let i = 0; i < 4; i++) expect((await request(limited.app).post('/api/auth/login').send({ email: DEMO.owner, password: 'boxwright-demo' })).status).toBe(200);
    } finally {
      await limited.close();
    }
  });

  it('sign-ups from one address are limited too', async () => {
    const limited = await buildTestApp({ seed: false, signupLimit: { windowMs: 60_000, limit: 1 } });
    try {
      const signup = (n: number) => request(limited.app).post('/api/auth/signup').send({ email: `s${n}@example.test`, password: 'long enough pw', workshopName: `W${n}` });
      expect((await signup(1)).status).toBe(201);
      const second = await signup(2);
      expect(second.status).toBe(429);
      expect(second.body.error.code).toBe('too_many_attempts');
    } finally {
      await limited.close();
    }
  });
});
