/**
 * E-mail: `startServer` starts its own SMTP catcher (smtp-server on 127.0.0.1, a free port) when SMTP_URL is
 * not set, and the mail goes there through nodemailer over real SMTP (RFC 5321). The "Sent mail" list is for
 * owners only (PRODUCT.md §7); with a real SMTP server, link tokens are not kept in the record.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { redactLinkTokens } from '../../server/modules/mail/mail.service.js';
import { newLinkToken } from '../../server/mail/tokens.js';
import { DEMO_EMAILS, DEMO_PASSWORD } from '../../server/seed.js';
import { startServer, type RunningServer } from '../../server/start.js';

let server: RunningServer;
const saved = process.env.SMTP_URL;

beforeAll(async () => {
  delete process.env.SMTP_URL;
  server = await startServer({ port: 0, host: '127.0.0.1', dbPath: ':memory:', quiet: true, clientDir: null, publicUrl: 'http://boxwright.test:8080' });
});
afterAll(async () => {
  await server.close();
  if (saved !== undefined) process.env.SMTP_URL = saved;
});

async function signIn(email: string) {
  const agent = request.agent(server.url);
  await agent.post('/api/auth/login').send({ email, password: DEMO_PASSWORD }).expect(200);
  const wid = (await agent.get('/api/auth/me')).body.memberships[0].workshopId as number;
  return { agent, wid };
}

describe('e-mail through the local catcher', () => {
  it('startServer catches an invitation over SMTP on 127.0.0.1 and the owner sees it on the Sent mail page', async () => {
    expect(server.mailCatcher).not.toBeNull();
    expect(server.mailCatcher!.url).toMatch(/^smtp:\/\/127\.0\.0\.1:\d+$/);
    const { agent, wid } = await signIn(DEMO_EMAILS.owner);
    await agent.post(`/api/workshops/${wid}/invitations`).send({ email: 'new.hand@harbourlane.test', role: 'maker' }).expect(201);
    const mail = await server.mailCatcher!.waitFor((m) => m.to.includes('new.hand@harbourlane.test'));
    expect(mail.from).toBe('no-reply@boxwright.localhost');
    expect(mail.text).toMatch(/http:\/\/boxwright\.test:8080\/invite\/[A-Za-z0-9_-]{43}/);

    const page = await agent.get(`/api/workshops/${wid}/mail`).expect(200);
    expect(page.body.via).toBe('catcher');
    expect(page.body.items[0]).toMatchObject({ kind: 'invitation', to: 'new.hand@harbourlane.test', status: 'sent', via: 'catcher' });
    expect(page.body.items[0].text).toBe(mail.text.trimEnd());
    expect(page.body.items[0].caughtAt).not.toBeNull();
  });

  it('only owners read the Sent mail page', async () => {
    for (const role of ['designer', 'maker', 'viewer'] as const) {
      const { agent, wid } = await signIn(DEMO_EMAILS[role]);
      expect((await agent.get(`/api/workshops/${wid}/mail`)).status).toBe(403);
    }
    expect((await request(server.url).get('/api/workshops/1/mail')).status).toBe(401);
  });

  it('with a real SMTP server the record hides the link tokens', () => {
    const { token } = newLinkToken();
    const text = `Open https://boxwright.example.org/invite/${token} or /share/${token}.`;
    expect(redactLinkTokens(text)).toBe('Open https://boxwright.example.org/invite/[link hidden] or /share/[link hidden].');
  });
});
