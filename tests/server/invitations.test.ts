/**
 * Invitations by e-mail: the message goes over SMTP (RFC 5321) to the local catcher, its link is accepted,
 * and the new member's role is enforced (PRODUCT.md §2 role table). Statuses per RFC 9110: 201, 401, 403,
 * 404, 410 Gone (§15.5.11) for a used, withdrawn or expired link.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_BOOKSHELF } from '../../shared/demo/designs.js';
import { Invitation } from '../../server/modules/invitations/invitation.entity.js';
import { hashLinkToken } from '../../server/mail/tokens.js';
import { DEMO, signIn, signUp, type Agent } from './helpers.js';
import { buildMailTestApp, linkToken, type MailTestApp } from './mail-fixture.js';

let t: MailTestApp;
let owner: Agent;
let wid: number;

beforeAll(async () => {
  t = await buildMailTestApp();
  owner = await signIn(t.app, DEMO.owner);
  wid = (await owner.get('/api/auth/me')).body.memberships[0].workshopId;
});
afterAll(async () => t.close());

async function invite(email: string, role: string) {
  const res = await owner.post(`/api/workshops/${wid}/invitations`).send({ email, role });
  expect(res.status).toBe(201);
  const mail = await t.catcher.waitFor((m) => m.to.includes(email) && m.headers['x-boxwright-kind'] === 'invitation');
  return { res, mail, token: linkToken(mail, '/invite/') };
}

describe('invitations', () => {
  it('e-mails a link that creates an account with the invited role, and that role is enforced', async () => {
    const { res, mail, token } = await invite('new.viewer@client.test', 'viewer');
    expect(res.body).toMatchObject({ email: 'new.viewer@client.test', role: 'viewer', status: 'pending', mailSent: true });
    expect(mail.subject).toBe('You are invited to Harbour Lane Audio on Boxwright');
    expect(mail.envelopeTo).toEqual(['new.viewer@client.test']);

    // Only the hash is stored.
    const row = await t.orm.em.fork().findOneOrFail(Invitation, { email: 'new.viewer@client.test' });
    expect(row.tokenHash).toBe(hashLinkToken(token));
    expect(row.tokenHash).not.toContain(token);

    const visitor = request.agent(t.app);
    const preview = await visitor.get(`/api/invitations/${token}`).expect(200);
    expect(preview.body).toMatchObject({ workshopName: 'Harbour Lane Audio', role: 'viewer', accountExists: false });

    const noPassword = await visitor.post(`/api/invitations/${token}/accept`).send({});
    expect(noPassword.status).toBe(400);
    expect(noPassword.body.error.fields).toEqual({ password: 'password is required' });

    await visitor.post(`/api/invitations/${token}/accept`).send({ password: 'a-good-long-password' }).expect(200);
    const me = await visitor.get('/api/auth/me').expect(200);
    expect(me.body.memberships).toEqual([{ workshopId: wid, workshopName: 'Harbour Lane Audio', role: 'viewer' }]);

    // The viewer reads designs but may not create one or open the stock room.
    await visitor.get(`/api/workshops/${wid}/designs`).expect(200);
    await visitor.post(`/api/workshops/${wid}/designs`).send({ ...DEMO_BOOKSHELF, name: 'Not allowed' }).expect(403);
    await visitor.get(`/api/workshops/${wid}/stock`).expect(403);

    // The link works once.
    const again = await request(t.app).post(`/api/invitations/${token}/accept`).send({ password: 'another-long-password' });
    expect(again.status).toBe(410);
    expect(again.body.error.message).toMatch(/already been used/);

    // The sent mail is on the owner's page, marked as caught by the local catcher.
    const sent = await owner.get(`/api/workshops/${wid}/mail`).expect(200);
    const item = sent.body.items.find((m: { to: string }) => m.to === 'new.viewer@client.test');
    expect(item).toMatchObject({ kind: 'invitation', status: 'sent', via: 'catcher' });
    expect(item.caughtAt).not.toBeNull();
  });

  it('an existing account accepts when signed in as the invited e-mail, and gets the role in this workshop', async () => {
    const other = await signUp(t.app, 'maker.elsewhere@otherbench.test', 'Other Bench');
    const { token } = await invite('maker.elsewhere@otherbench.test', 'maker');
    expect((await request(t.app).get(`/api/invitations/${token}`)).body.accountExists).toBe(true);

    const signedOut = await request(t.app).post(`/api/invitations/${token}/accept`).send({});
    expect(signedOut.status).toBe(401);
    const wrongPerson = await signIn(t.app, DEMO.designer);
    expect((await wrongPerson.post(`/api/invitations/${token}/accept`).send({})).status).toBe(403);

    await other.agent.post(`/api/invitations/${token}/accept`).send({}).expect(200);
    const me = await other.agent.get('/api/auth/me').expect(200);
    expect(me.body.memberships.map((m: { workshopName: string; role: string }) => [m.workshopName, m.role])).toEqual([
      ['Harbour Lane Audio', 'maker'],
      ['Other Bench', 'owner'],
    ]);
    // A maker may tick and manage stock: the stock room opens.
    await other.agent.get(`/api/workshops/${wid}/stock`).expect(200);
  });

  it('a withdrawn or expired link no longer works; an unknown one is 404', async () => {
    const a = await invite('withdrawn@client.test', 'viewer');
    await owner.delete(`/api/workshops/${wid}/invitations/${a.res.body.id}`).expect(204);
    expect((await request(t.app).get(`/api/invitations/${a.token}`)).status).toBe(410);

    const b = await invite('late@client.test', 'viewer');
    await t.orm.em.fork().nativeUpdate(Invitation, { id: b.res.body.id }, { expiresAt: new Date(Date.now() - 1000) });
    const late = await request(t.app).post(`/api/invitations/${b.token}/accept`).send({ password: 'a-good-long-password' });
    expect(late.status).toBe(410);
    expect(late.body.error.message).toMatch(/expired/);

    expect((await request(t.app).get(`/api/invitations/${'x'.repeat(43)}`)).status).toBe(404);
    expect((await request(t.app).get('/api/invitations/short')).status).toBe(404);
    const list = await owner.get(`/api/workshops/${wid}/invitations`).expect(200);
    const status = Object.fromEntries(list.body.items.map((i: { email: string; status: string }) => [i.email, i.status]));
    expect(status).toMatchObject({ 'withdrawn@client.test': 'revoked', 'late@client.test': 'expired', 'new.viewer@client.test': 'accepted' });
  });

  it('rejects inviting a member, bad e-mails and roles with field errors; only owners invite', async () => {
    const member = await owner.post(`/api/workshops/${wid}/invitations`).send({ email: DEMO.maker, role: 'viewer' });
    expect(member.status).toBe(400);
    expect(member.body.error.fields).toEqual({ email: 'already a member of this workshop' });
    const bad = await owner.post(`/api/workshops/${wid}/invitations`).send({ email: 'nope', role: 'boss' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['email', 'role']);
    const designer = await signIn(t.app, DEMO.designer);
    expect((await designer.post(`/api/workshops/${wid}/invitations`).send({ email: 'x@client.test', role: 'viewer' })).status).toBe(403);
  });
});
