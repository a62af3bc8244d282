/**
 * startServer(): migrations, the demo seed (once, only into a new database, never in production), sessions
 * that survive a restart, the built client with its SPA fallback, and a clean close.
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { initOrm, migrate } from '../../server/db.js';
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_WORKSHOP, shouldSeed } from '../../server/seed.js';
import { startServer, type RunningServer } from '../../server/start.js';
import { DEMO } from './helpers.js';

let dir: string;
let running: RunningServer | undefined;

beforeAll(() => {
  dir = mkdtempSync(path.join(tmpdir(), 'boxwright-start-'));
});
afterEach(async () => {
  await running?.close();
  running = undefined;
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function files(name: string) {
  return { dbPath: path.join(dir, name, 'boxwright.sqlite'), sessionsPath: path.join(dir, name, 'sessions.sqlite') };
}

async function start(name: string, extra: Parameters<typeof startServer>[0] = {}): Promise<RunningServer> {
  running = await startServer({ port: 0, quiet: true, clientDir: null, ...files(name), ...extra });
  return running;
}

describe('startServer', () => {
  it('migrates and seeds a new database with the demo workshop, its four people and the demo designs', async () => {
    const s = await start('fresh');
    expect(s.seeded).toBe(true);
    expect(s.port).toBeGreaterThan(0);
    expect(s.url).toBe(`http://127.0.0.1:${s.port}`);
    expect((await request(s.url).get('/api/health')).body).toEqual({ ok: true });
    for (const person of DEMO_PEOPLE) {
      const agent = request.agent(s.url);
      const me = await agent.post('/api/auth/login').send({ email: person.email, password: DEMO_PASSWORD });
      expect(me.status).toBe(200);
      expect(me.body.memberships).toEqual([{ workshopId: expect.any(Number), workshopName: DEMO_WORKSHOP, role: person.role }]);
      if (person.role === 'viewer') {
        const designs = await agent.get(`/api/workshops/${me.body.memberships[0].workshopId}/designs`).expect(200);
        expect(designs.body.items).toHaveLength(2);
        // PRODUCT.md §9 / issue 2: demo designs with braces and lining, and a rear port (the bookshelf's).
        let rearPorts = 0;
        for (const item of designs.body.items) {
          const d = (await agent.get(`/api/workshops/${me.body.memberships[0].workshopId}/designs/${item.id}`)).body.design;
          expect(d.braces.length).toBeGreaterThan(0);
          expect(d.lining).toBeTruthy();
          if (d.openings.some((o: { type: string; face: string }) => o.type === 'port' && o.face === 'back')) rearPorts += 1;
        }
        expect(rearPorts).toBeGreaterThan(0);
      }
    }
  });

  it('does not seed again: a removed demo member stays removed after a restart, and sessions survive it', async () => {
    let s = await start('restart');
    expect(s.seeded).toBe(true);
    const owner = request.agent(s.url);
    const me = (await owner.post('/api/auth/login').send({ email: DEMO.owner, password: DEMO_PASSWORD }).expect(200)).body;
    const wid = me.memberships[0].workshopId;
    const members = (await owner.get(`/api/workshops/${wid}/members`).expect(200)).body.items as { userId: number; email: string }[];
    const viewer = members.find((m) => m.email === DEMO.viewer)!;
    await owner.delete(`/api/workshops/${wid}/members/${viewer.userId}`).expect(204);
    const cookie = (await owner.get('/api/auth/me')).request.cookies;
    await s.close();
    running = undefined;

    s = await start('restart');
    expect(s.seeded).toBe(false);
    // Same session cookie, new process: the session lives in its SQLite file and the secret beside it.
    const again = await request(s.url).get('/api/auth/me').set('Cookie', cookie);
    expect(again.status).toBe(200);
    expect(again.body.user.email).toBe(DEMO.owner);
    const after = (await request(s.url).get(`/api/workshops/${wid}/members`).set('Cookie', cookie).expect(200)).body.items;
    expect(after.map((m: { email: string }) => m.email)).not.toContain(DEMO.viewer);
    expect(after).toHaveLength(3);
  });

  it('never seeds when NODE_ENV=production', async () => {
    const saved = process.env.NODE_ENV;
    process.env.NODE_ENV = 'production';
    try {
      const s = await start('production');
      expect(s.seeded).toBe(false);
      const res = await request(s.url).post('/api/auth/login').send({ email: DEMO.owner, password: DEMO_PASSWORD });
      expect(res.status).toBe(401);
    } finally {
      process.env.NODE_ENV = saved;
    }
  });

  it('does not seed when asked not to', async () => {
    expect((await start('unseeded', { seed: false })).seeded).toBe(false);
  });

  it('serves the built client with an SPA fallback, and keeps /api answers JSON', async () => {
    const client = path.join(dir, 'client');
    mkdirSync(path.join(client, 'assets'), { recursive: true });
    writeFileSync(path.join(client, 'index.html'), '<!doctype html><title>client shell</title><div id="root"></div>');
    writeFileSync(path.join(client, 'assets', 'app-1a2b3c.js'), 'console.log(1)');
    const s = await start('spa', { clientDir: client });
    for (const route of ['/', '/w/1/designs', '/w/1/designs/2']) {
      const res = await request(s.url).get(route);
      expect(res.status).toBe(200);
      expect(res.text).toContain('client shell');
    }
    const asset = await request(s.url).get('/assets/app-1a2b3c.js');
    expect(asset.status).toBe(200);
    expect(asset.headers['cache-control']).toContain('immutable');
    const api = await request(s.url).get('/api/no-such-route');
    expect(api.status).toBe(404);
    expect(api.body.error.code).toBe('not_found');
  });

  it('close() frees the port', async () => {
    const s = await start('close');
    const { url } = s;
    await s.close();
    running = undefined;
    await expect(request(url).get('/api/health')).rejects.toThrow();
  });

  it('rejects a bad port with a clear message', async () => {
    await expect(startServer({ port: 70000, quiet: true, clientDir: null, ...files('badport') })).rejects.toThrow(/PORT must be a whole number/);
  });
});

describe('seed decision', () => {
  it.each([
    [{ wasNew: true, requested: true, nodeEnv: 'development' }, true],
    [{ wasNew: true, requested: true, nodeEnv: undefined }, true],
    [{ wasNew: false, requested: true, nodeEnv: 'development' }, false],
    [{ wasNew: true, requested: false, nodeEnv: 'development' }, false],
    [{ wasNew: true, requested: true, nodeEnv: 'production' }, false],
  ])('shouldSeed(%o) is %s', (input, expected) => {
    expect(shouldSeed(input)).toBe(expected);
  });
});

describe('migrations', () => {
  /** Tables and indexes as SQLite stores them, without the migrations' own bookkeeping table. */
  async function schemaOf(orm: Awaited<ReturnType<typeof initOrm>>) {
    return orm.em
      .fork()
      .getConnection()
      .execute<{ type: string; name: string; sql: string }[]>(
        "select type, name, sql from sqlite_master where name not like 'sqlite_%' and name not like 'mikro_orm_migrations%' order by type, name",
      );
  }

  it('the committed migrations build exactly the schema the entities describe', async () => {
    // Compared through sqlite_master against a schema created straight from the entities, not with
    // getUpdateSchemaSQL(): MikroORM 6.6.16 misreads SQLite enum checks of three or more values and
    // proposes a needless rebuild (mikro-orm/mikro-orm PR #8139, fixed after 6.6.16).
    const migrated = await initOrm({ dbName: ':memory:' });
    const direct = await initOrm({ dbName: ':memory:' });
    try {
      const first = await migrate(migrated);
      expect(first.wasNew).toBe(true);
      expect(first.applied.length).toBeGreaterThan(0);
      await direct.getSchemaGenerator().createSchema();
      const want = await schemaOf(direct);
      expect(want.map((r) => r.name)).toEqual(expect.arrayContaining(['users', 'workshops', 'memberships', 'designs']));
      expect(await schemaOf(migrated)).toEqual(want);
      expect(await migrate(migrated)).toEqual({ wasNew: false, applied: [] });
    } finally {
      await migrated.close(true);
      await direct.close(true);
    }
  });
});
