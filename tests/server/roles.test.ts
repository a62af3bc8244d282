/**
 * Every route × each of the four roles × a member of another workshop × signed out, with the expected status.
 * Expected statuses follow the role table of PRODUCT.md §2 (PERMISSIONS in shared/schemas/api.schema.ts) and
 * HTTP semantics of RFC 9110: 200 OK (§15.3.1), 201 Created (§15.3.2), 204 No Content (§15.3.5),
 * 401 Unauthorized (§15.5.2), 403 Forbidden (§15.5.4).
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_BOOKSHELF } from '../../shared/demo/designs.js';
import { User } from '../../server/modules/auth/user.entity.js';
import { DesignsService } from '../../server/modules/designs/designs.service.js';
import { Design } from '../../server/modules/designs/design.entity.js';
import { Membership } from '../../server/modules/workshops/membership.entity.js';
import { Build } from '../../server/modules/builds/build.entity.js';
import { BuildsService } from '../../server/modules/builds/builds.service.js';
import { CutPlan } from '../../server/modules/cut-plans/cut-plan.entity.js';
import { closeNestPool } from '../../server/workers/pool.js';
import { demoBuildId, DEMO_ROLL, DEMO_SHEET, finished, makeCutPlan, pollJob } from './cut-plans.helpers.js';
import { buildTestApp, DEMO, signIn, signUp, type Agent, type TestApp } from './helpers.js';
import { StockService } from '../../server/modules/stock/stock.service.js';
import { StockItem } from '../../server/modules/stock/stock-item.entity.js';
import { Workshop } from '../../server/modules/workshops/workshop.entity.js';

type Who = 'owner' | 'designer' | 'maker' | 'viewer' | 'outsider' | 'signedOut';
const WHO: Who[] = ['owner', 'designer', 'maker', 'viewer', 'outsider', 'signedOut'];

let t: TestApp;
let workshopId: number;
const agents = {} as Record<Exclude<Who, 'signedOut'>, Agent>;
let outsiderEmail = '';

beforeAll(async () => {
  t = await buildTestApp();
  for (const role of ['owner', 'designer', 'maker', 'viewer'] as const) agents[role] = await signIn(t.app, DEMO[role]);
  outsiderEmail = 'someone@otherbench.test';
  agents.outsider = (await signUp(t.app, outsiderEmail, 'Other Bench')).agent;
  const me = await agents.owner.get('/api/auth/me').expect(200);
  workshopId = me.body.memberships[0].workshopId;
});
afterAll(async () => {
  await closeNestPool();
  await t.close();
});

/** A design of the demo workshop made for one case, so destructive cases never share a target. */
async function freshDesign(): Promise<{ id: number; version: number }> {
  const em = t.orm.em.fork();
  const dto = await new DesignsService(em).create(workshopId, { ...DEMO_BOOKSHELF, name: 'Role check' }, DEMO.designer);
  return { id: dto.id, version: dto.version };
}

/** A maker added to the demo workshop for one case. */
async function freshMember(): Promise<number> {
  const em = t.orm.em.fork();
  const user = em.create(User, { email: `member-${Math.random().toString(36).slice(2)}@harbourlane.test`, passwordHash: 'not-used' });
  em.create(Membership, { user, workshop: workshopId, role: 'maker' });
  await em.flush();
  return user.id;
}

/** A build of one bookshelf pair made for one case. */
async function freshBuild(): Promise<{ id: number; version: number; items: { designId: number; quantity: number; mirroredPair: boolean }[] }> {
  const dto = await new BuildsService(t.orm.em.fork()).create(workshopId, { name: 'Role check build', items: [{ designId: (await freshDesign()).id, quantity: 2 }] }, DEMO.designer);
  return { id: dto.id, version: dto.version, items: dto.items.map(({ designId, quantity, mirroredPair }) => ({ designId, quantity, mirroredPair })) };
}

let planId: Promise<number> | undefined;
/** One cut plan of a small build, read by the plan and export cases. */
function sharedPlan(): Promise<number> {
  planId ??= freshBuild().then((b) => makeCutPlan(t, workshopId, b.id, { typedStock: [DEMO_SHEET, DEMO_ROLL], timeLimitMs: 200 }));
  return planId;
}

const TINY_JOB = { timeLimitMs: 50, stock: [{ id: 'board', kind: 'sheet', width: 1000, height: 1000 }], parts: [{ id: 'shelf', width: 300, height: 200, quantity: 4 }] };

/** A raw nest job started by the owner and run to the end. */
async function finishedJob(): Promise<string> {
  const res = await agents.owner.post(`/api/workshops/${workshopId}/nest-jobs`).send({ job: TINY_JOB }).expect(202);
  await pollJob(agents.owner, workshopId, res.body.id, finished);
  return res.body.id as string;
}

async function designExists(id: number): Promise<boolean> {
  return (await t.orm.em.fork().count(Design, { id })) === 1;
}

interface Case {
  name: string;
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  /** Builds the path and body for one request (may create its own target). */
  prepare(): Promise<{ path: string; body?: unknown; check?: (status: number) => Promise<void> }>;
  expected: Record<Who, number>;
  /** Sign in anew for this case (the request ends the session). */
  freshSession?: boolean;
}

const all = (ok: number): Record<Who, number> => ({ owner: ok, designer: ok, maker: ok, viewer: ok, outsider: ok, signedOut: 401 });
const members = (ok: number): Record<Who, number> => ({ owner: ok, designer: ok, maker: ok, viewer: ok, outsider: 403, signedOut: 401 });
const editors = (ok: number): Record<Who, number> => ({ owner: ok, designer: ok, maker: 403, viewer: 403, outsider: 403, signedOut: 401 });
const runners = (ok: number): Record<Who, number> => ({ owner: ok, designer: ok, maker: ok, viewer: 403, outsider: 403, signedOut: 401 });
const owners = (ok: number): Record<Who, number> => ({ owner: ok, designer: 403, maker: 403, viewer: 403, outsider: 403, signedOut: 401 });

const CASES: Case[] = [
  { name: 'GET /api/auth/me', method: 'get', prepare: async () => ({ path: '/api/auth/me' }), expected: all(200) },
  { name: 'PATCH /api/auth/me', method: 'patch', prepare: async () => ({ path: '/api/auth/me', body: { units: 'mm' } }), expected: all(200) },
  { name: 'POST /api/auth/logout', method: 'post', prepare: async () => ({ path: '/api/auth/logout' }), expected: all(204), freshSession: true },
  { name: 'GET members', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/members` }), expected: members(200) },
  {
    name: 'PATCH member role',
    method: 'patch',
    prepare: async () => {
      const userId = await freshMember();
      return {
        path: `/api/workshops/${workshopId}/members/${userId}`,
        body: { role: 'viewer' },
        check: async (status) => {
          const m = await t.orm.em.fork().findOneOrFail(Membership, { user: userId });
          expect(m.role).toBe(status === 200 ? 'viewer' : 'maker');
        },
      };
    },
    expected: owners(200),
  },
  {
    name: 'DELETE member',
    method: 'delete',
    prepare: async () => {
      const userId = await freshMember();
      return {
        path: `/api/workshops/${workshopId}/members/${userId}`,
        check: async (status) => expect(await t.orm.em.fork().count(Membership, { user: userId })).toBe(status === 204 ? 0 : 1),
      };
    },
    expected: owners(204),
  },
  { name: 'GET designs', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/designs` }), expected: members(200) },
  {
    name: 'POST design',
    method: 'post',
    prepare: async () => {
      const name = `Created ${Math.random().toString(36).slice(2)}`;
      return {
        path: `/api/workshops/${workshopId}/designs`,
        body: { ...DEMO_BOOKSHELF, name },
        check: async (status) => expect(await t.orm.em.fork().count(Design, { name })).toBe(status === 201 ? 1 : 0),
      };
    },
    expected: editors(201),
  },
  {
    name: 'GET design',
    method: 'get',
    prepare: async () => ({ path: `/api/workshops/${workshopId}/designs/${(await freshDesign()).id}` }),
    expected: members(200),
  },
  {
    name: 'PUT design',
    method: 'put',
    prepare: async () => {
      const { id, version } = await freshDesign();
      return {
        path: `/api/workshops/${workshopId}/designs/${id}`,
        body: { version, design: { ...DEMO_BOOKSHELF, name: 'Role check', outer: { ...DEMO_BOOKSHELF.outer, width: 230 } } },
        check: async (status) => {
          const d = await t.orm.em.fork().findOneOrFail(Design, { id });
          expect(d.data.outer.width).toBe(status === 200 ? 230 : DEMO_BOOKSHELF.outer.width);
        },
      };
    },
    expected: editors(200),
  },
  {
    name: 'DELETE design',
    method: 'delete',
    prepare: async () => {
      const { id } = await freshDesign();
      return { path: `/api/workshops/${workshopId}/designs/${id}`, check: async (status) => expect(await designExists(id)).toBe(status !== 204) };
    },
    expected: editors(204),
  },
  {
    name: 'POST duplicate',
    method: 'post',
    prepare: async () => ({ path: `/api/workshops/${workshopId}/designs/${(await freshDesign()).id}/duplicate` }),
    expected: editors(201),
  },
  {
    name: 'GET plan',
    method: 'get',
    prepare: async () => ({ path: `/api/workshops/${workshopId}/designs/${(await freshDesign()).id}/plan` }),
    expected: members(200),
  },
  // ─── Builds, nest jobs, cut plans, exports ───
  { name: 'GET builds', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/builds` }), expected: members(200) },
  {
    name: 'POST build',
    method: 'post',
    prepare: async () => {
      const name = `Build ${Math.random().toString(36).slice(2)}`;
      return {
        path: `/api/workshops/${workshopId}/builds`,
        body: { name, items: [{ designId: (await freshDesign()).id, quantity: 2 }] },
        check: async (status) => expect(await t.orm.em.fork().count(Build, { name })).toBe(status === 201 ? 1 : 0),
      };
    },
    expected: editors(201),
  },
  { name: 'GET build', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/builds/${(await freshBuild()).id}` }), expected: members(200) },
  {
    name: 'PUT build',
    method: 'put',
    prepare: async () => {
      const b = await freshBuild();
      return {
        path: `/api/workshops/${workshopId}/builds/${b.id}`,
        body: { version: b.version, build: { name: 'Renamed', items: b.items } },
        check: async (status) => expect((await t.orm.em.fork().findOneOrFail(Build, { id: b.id })).name).toBe(status === 200 ? 'Renamed' : 'Role check build'),
      };
    },
    expected: editors(200),
  },
  {
    name: 'DELETE build',
    method: 'delete',
    prepare: async () => {
      const { id } = await freshBuild();
      return { path: `/api/workshops/${workshopId}/builds/${id}`, check: async (status) => expect(await t.orm.em.fork().count(Build, { id })).toBe(status === 204 ? 0 : 1) };
    },
    expected: editors(204),
  },
  { name: 'POST nest job', method: 'post', prepare: async () => ({ path: `/api/workshops/${workshopId}/nest-jobs`, body: { job: TINY_JOB } }), expected: runners(202) },
  { name: 'GET nest job', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/nest-jobs/${await finishedJob()}` }), expected: members(200) },
  { name: 'POST nest job cancel', method: 'post', prepare: async () => ({ path: `/api/workshops/${workshopId}/nest-jobs/${await finishedJob()}/cancel` }), expected: runners(200) },
  { name: 'GET cut plans', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/cut-plans` }), expected: members(200) },
  { name: 'GET cut plan', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/cut-plans/${await sharedPlan()}` }), expected: members(200) },
  {
    name: 'DELETE cut plan',
    method: 'delete',
    prepare: async () => {
      const id = await makeCutPlan(t, workshopId, (await freshBuild()).id, { typedStock: [DEMO_SHEET, DEMO_ROLL], timeLimitMs: 200 });
      return { path: `/api/workshops/${workshopId}/cut-plans/${id}`, check: async (status) => expect(await t.orm.em.fork().count(CutPlan, { id })).toBe(status === 204 ? 0 : 1) };
    },
    expected: runners(204),
  },
  ...(['cut-diagrams.pdf', 'cut-diagrams.svg', 'cut-list.csv', 'panels.dxf', 'stencils.pdf'] as const).map(
    (file): Case => ({
      name: `GET export ${file}`,
      method: 'get',
      prepare: async () => ({ path: `/api/workshops/${workshopId}/cut-plans/${await sharedPlan()}/exports/${file}` }),
      // Viewers read the plans and exports they are shown (PRODUCT.md §2).
      expected: members(200),
    }),
  ),
];

// ─── Workshop floor: stock room, history, sent mail, invitations, uploads, checklist, share links ───
const stockers = (ok: number): Record<Who, number> => ({ owner: ok, designer: 403, maker: ok, viewer: 403, outsider: 403, signedOut: 401 });
const stockReaders = (ok: number): Record<Who, number> => ({ owner: ok, designer: ok, maker: ok, viewer: 403, outsider: 403, signedOut: 401 });

async function freshStock(): Promise<StockItem> {
  const dto = await new StockService(t.orm.em.fork()).create(workshopId, { kind: 'remnant', material: 'MDF', thicknessMm: 18, widthMm: 600, heightMm: 400, quantity: 1 }, DEMO.maker);
  return t.orm.em.fork().findOneOrFail(StockItem, { id: dto.id });
}
let planOnce: Promise<number> | undefined;
const cutPlan = async () => (planOnce ??= makeCutPlan(t, workshopId, await demoBuildId(t, workshopId), { timeLimitMs: 200 }));
const uniqueEmail = () => `invitee-${Math.random().toString(36).slice(2)}@client.test`;

const FLOOR_CASES: Case[] = [
  { name: 'GET stock', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/stock` }), expected: stockReaders(200) },
  { name: 'GET stock CSV', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/stock/export.csv` }), expected: stockReaders(200) },
  {
    name: 'POST stock',
    method: 'post',
    prepare: async () => ({ path: `/api/workshops/${workshopId}/stock`, body: { kind: 'sheet', material: 'MDF', thicknessMm: 12, widthMm: 2440, heightMm: 1220 } }),
    expected: stockers(201),
  },
  {
    name: 'PUT stock item',
    method: 'put',
    prepare: async () => {
      const s = await freshStock();
      return {
        path: `/api/workshops/${workshopId}/stock/${s.id}`,
        body: { version: s.version, item: { kind: 'remnant', material: 'MDF', thicknessMm: 18, widthMm: 600, heightMm: 400, quantity: 2 } },
      };
    },
    expected: stockers(200),
  },
  {
    name: 'DELETE stock item',
    method: 'delete',
    prepare: async () => {
      const s = await freshStock();
      return {
        path: `/api/workshops/${workshopId}/stock/${s.id}`,
        check: async (status) => expect(await t.orm.em.fork().count(StockItem, { id: s.id })).toBe(status === 204 ? 0 : 1),
      };
    },
    expected: stockers(204),
  },
  { name: 'GET stock history', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/history/stock/${(await freshStock()).id}` }), expected: stockReaders(200) },
  { name: 'GET design history', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/history/design/${(await freshDesign()).id}` }), expected: members(200) },
  { name: 'GET build history', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/history/build/${await demoBuildId(t, workshopId)}` }), expected: members(200) },
  { name: 'GET sent mail', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/mail` }), expected: owners(200) },
  { name: 'GET invitations', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/invitations` }), expected: owners(200) },
  {
    name: 'POST invitation',
    method: 'post',
    prepare: async () => ({ path: `/api/workshops/${workshopId}/invitations`, body: { email: uniqueEmail(), role: 'viewer' } }),
    expected: owners(201),
  },
  { name: 'GET uploads', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/uploads` }), expected: members(200) },
  { name: 'GET checklist', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/cut-plans/${await cutPlan()}/checklist` }), expected: members(200) },
  {
    name: 'POST checklist tick',
    method: 'post',
    prepare: async () => {
      const planId = await cutPlan();
      const list = await agents.owner.get(`/api/workshops/${workshopId}/cut-plans/${planId}/checklist`);
      return { path: `/api/workshops/${workshopId}/cut-plans/${planId}/checklist/ticks`, body: { item: 'part', key: list.body.parts[0].key, cut: true } };
    },
    expected: stockers(200),
  },
  { name: 'GET share links', method: 'get', prepare: async () => ({ path: `/api/workshops/${workshopId}/cut-plans/${await cutPlan()}/share-links` }), expected: stockReaders(200) },
  { name: 'POST share link', method: 'post', prepare: async () => ({ path: `/api/workshops/${workshopId}/cut-plans/${await cutPlan()}/share-links`, body: {} }), expected: stockReaders(201) },
];
CASES.push(...FLOOR_CASES);

// ─── The workshop itself: start one, read, change and delete its settings ───
/** A workshop of its own for one case, with the four demo people in their demo roles (the outsider is not in it). */
async function freshWorkshop(): Promise<{ id: number; name: string; version: number }> {
  const em = t.orm.em.fork();
  const name = `Role check ${Math.random().toString(36).slice(2)}`;
  const workshop = em.create(Workshop, { name });
  for (const role of ['owner', 'designer', 'maker', 'viewer'] as const) {
    em.create(Membership, { user: await em.findOneOrFail(User, { email: DEMO[role] }), workshop, role });
  }
  await em.flush();
  return { id: workshop.id, name, version: workshop.version };
}
const workshopExists = async (id: number) => (await t.orm.em.fork().count(Workshop, { id })) === 1;

const WORKSHOP_CASES: Case[] = [
  {
    name: 'POST workshop',
    method: 'post',
    prepare: async () => {
      const name = `Started ${Math.random().toString(36).slice(2)}`;
      return { path: '/api/workshops', body: { name }, check: async (status) => expect(await t.orm.em.fork().count(Workshop, { name })).toBe(status === 201 ? 1 : 0) };
    },
    // Anyone signed in starts a workshop of their own (the outsider too).
    expected: all(201),
  },
  { name: 'GET workshop', method: 'get', prepare: async () => ({ path: `/api/workshops/${(await freshWorkshop()).id}` }), expected: members(200) },
  {
    name: 'PATCH workshop',
    method: 'patch',
    prepare: async () => {
      const w = await freshWorkshop();
      return {
        path: `/api/workshops/${w.id}`,
        body: { version: w.version, name: 'Renamed bench', currency: 'EUR' },
        check: async (status) => expect((await t.orm.em.fork().findOneOrFail(Workshop, { id: w.id })).name).toBe(status === 200 ? 'Renamed bench' : w.name),
      };
    },
    expected: owners(200),
  },
  {
    name: 'DELETE workshop',
    method: 'delete',
    prepare: async () => {
      const w = await freshWorkshop();
      return { path: `/api/workshops/${w.id}`, body: { confirmName: w.name }, check: async (status) => expect(await workshopExists(w.id)).toBe(status !== 204) };
    },
    expected: owners(204),
  },
];
CASES.push(...WORKSHOP_CASES);

describe('role matrix', () => {
  it('covers every route of the API table in DEVELOPERS.md that needs a signed-in user', () => {
    // signup, login and health are open to anyone and have their own tests (auth.test.ts, errors.test.ts).
    expect(CASES).toHaveLength(13 + 16 + FLOOR_CASES.length + WORKSHOP_CASES.length);
  });

  for (const c of CASES) {
    for (const who of WHO) {
      it(`${c.name} as ${who} → ${c.expected[who]}`, async () => {
        const { path, body, check } = await c.prepare();
        const agent: Agent | ReturnType<typeof request> =
          who === 'signedOut'
            ? request(t.app)
            : c.freshSession
              ? await signIn(t.app, who === 'outsider' ? outsiderEmail : DEMO[who], who === 'outsider' ? 'a-long-password-1' : undefined)
              : agents[who];
        let req = agent[c.method](path);
        if (body !== undefined) req = req.send(body as object);
        const res = await req;
        expect(res.status, JSON.stringify(res.body)).toBe(c.expected[who]);
        if (res.status >= 400) {
          expect(res.body.error.code).toBe({ 401: 'not_signed_in', 403: 'forbidden' }[res.status as 401 | 403]);
          expect(typeof res.body.error.message).toBe('string');
        }
        await check?.(res.status);
      });
    }
  }
});
