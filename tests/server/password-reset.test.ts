/**
 * Password reset by e-mail (OWASP Forgot Password Cheat Sheet: the same answer whether or not the account
 * exists; a random, single-use, expiring token; stored as a hash). 202 Accepted, 204, 404, 410 per RFC 9110.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PasswordResetToken } from '../../server/modules/password-reset/password-reset-token.entity.js';
import { DEMO } from './helpers.js';
import { buildMailTestApp, linkToken, type MailTestApp } from './mail-fixture.js';

let t: MailTestApp;
beforeAll(async () => {
  t = await buildMailTestApp();
});
afterAll(async () => t.close());

function askFor(email: string) {
  return request(t.app).post('/api/password-reset').send({ email });
}

async function resetMailFor(email: string, after: number) {
  return t.catcher.waitFor((m) => m.seq > after && m.to.includes(email) && m.headers['x-boxwright-kind'] === 'password-reset');
}

const lastSeq = () => t.catcher.messages().at(-1)?.seq ?? 0;

describe('password reset', () => {
  it('answers the same for a known and an unknown e-mail, and mails only the known one', async () => {
    const before = lastSeq();
    const known = await askFor(DEMO.designer);
    const unknown = await askFor('nobody@nowhere.test');
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
    await resetMailFor(DEMO.designer, before);
    // Give a would-be second message time to arrive, then check only one came.
    await new Promise((r) => setTimeout(r, 300));
    const sent = t.catcher.messages().filter((m) => m.seq > before);
    expect(sent.map((m) => m.to)).toEqual([[DEMO.designer]]);
    // Account mail is not on any workshop's Sent mail page.
    const owner = request.agent(t.app);
    await owner.post('/api/auth/login').send({ email: DEMO.owner, password: 'boxwright-demo' }).expect(200);
    const wid = (await owner.get('/api/auth/me')).body.memberships[0].workshopId;
    const page = await owner.get(`/api/workshops/${wid}/mail`).expect(200);
    expect(page.body.items.filter((m: { kind: string }) => m.kind === 'password-reset')).toEqual([]);
  });

  it('a link works once: the new password signs in, the old one and the link stop working', async () => {
    const before = lastSeq();
    await askFor(DEMO.maker).expect(202);
    const token = linkToken(await resetMailFor(DEMO.maker, before), '/reset-password/');
    expect((await request(t.app).get(`/api/password-reset/${token}`).expect(200)).body).toEqual({ email: DEMO.maker });

    const weak = await request(t.app).post(`/api/password-reset/${token}`).send({ password: 'short' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.fields).toEqual({ password: 'password must be at least 10 characters' });

    await request(t.app).post(`/api/password-reset/${token}`).send({ password: 'a-brand-new-password' }).expect(204);
    await request(t.app).post('/api/auth/login').send({ email: DEMO.maker, password: 'a-brand-new-password' }).expect(200);
    await request(t.app).post('/api/auth/login').send({ email: DEMO.maker, password: 'boxwright-demo' }).expect(401);

    const again = await request(t.app).post(`/api/password-reset/${token}`).send({ password: 'yet-another-password' });
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('link_expired');
    await request(t.app).post('/api/auth/login').send({ email: DEMO.maker, password: 'a-brand-new-password' }).expect(200);
  });

  it('an expired link does not work; using one link closes the other open links of the account', async () => {
    let before = lastSeq();
    await askFor(DEMO.viewer).expect(202);
    const first = linkToken(await resetMailFor(DEMO.viewer, before), '/reset-password/');
    before = lastSeq();
    await askFor(DEMO.viewer).expect(202);
    const second = linkToken(await resetMailFor(DEMO.viewer, before), '/reset-password/');
    expect(second).not.toBe(first);

    await request(t.app).post(`/api/password-reset/${second}`).send({ password: 'viewer-new-password' }).expect(204);
    expect((await request(t.app).get(`/api/password-reset/${first}`)).status).toBe(410);

    before = lastSeq();
    await askFor(DEMO.viewer).expect(202);
    const third = linkToken(await resetMailFor(DEMO.viewer, before), '/reset-password/');
    // One hour later (the lifetime), simulated by moving the expiry into the past.
    await t.orm.em.fork().nativeUpdate(PasswordResetToken, { usedAt: null }, { expiresAt: new Date(Date.now() - 1) });
    const late = await request(t.app).post(`/api/password-reset/${third}`).send({ password: 'too-late-password' });
    expect(late.status).toBe(410);
    expect(late.body.error.message).toMatch(/expired/);
    expect((await request(t.app).get(`/api/password-reset/${'A'.repeat(43)}`)).status).toBe(404);
  });

  it('a bad e-mail is a field error', async () => {
    const res = await askFor('not-an-address');
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ email: 'enter a valid e-mail address' });
  });
});
