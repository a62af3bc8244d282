/**
 * Workshop members: the list, role changes that take effect at once, removal, and the rule that a workshop
 * always keeps an owner (PRODUCT.md §2: owners manage members).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_BOOKSHELF } from '../../shared/demo/designs.js';
import { buildTestApp, DEMO, signIn, signUp, type Agent, type TestApp } from './helpers.js';

let t: TestApp;
let owner: Agent;
let wid: number;
let ids: Record<string, number>;

beforeAll(async () => {
  t = await buildTestApp();
  owner = await signIn(t.app, DEMO.owner);
  wid = (await owner.get('/api/auth/me')).body.memberships[0].workshopId;
  const list = await owner.get(`/api/workshops/${wid}/members`).expect(200);
  ids = Object.fromEntries(list.body.items.map((m: { email: string; userId: number }) => [m.email, m.userId]));
});
afterAll(async () => t.close());

describe('members', () => {
  it('lists the four demo people with their roles, sorted by e-mail', async () => {
    const maker = await signIn(t.app, DEMO.maker);
    const res = await maker.get(`/api/workshops/${wid}/members`).expect(200);
    expect(res.body.items).toEqual([
      { userId: ids[DEMO.designer], email: DEMO.designer, role: 'designer' },
      { userId: ids[DEMO.maker], email: DEMO.maker, role: 'maker' },
      { userId: ids[DEMO.owner], email: DEMO.owner, role: 'owner' },
      { userId: ids[DEMO.viewer], email: DEMO.viewer, role: 'viewer' },
    ]);
  });

  it('a role change applies to the next request of an already signed-in member', async () => {
    const maker = await signIn(t.app, DEMO.maker);
    expect((await maker.post(`/api/workshops/${wid}/designs`).send(DEMO_BOOKSHELF)).status).toBe(403);
    const changed = await owner.patch(`/api/workshops/${wid}/members/${ids[DEMO.maker]}`).send({ role: 'designer' });
    expect(changed.status).toBe(200);
    expect(changed.body).toEqual({ userId: ids[DEMO.maker], email: DEMO.maker, role: 'designer' });
    expect((await maker.post(`/api/workshops/${wid}/designs`).send(DEMO_BOOKSHELF)).status).toBe(201);
    expect((await maker.get('/api/auth/me')).body.memberships[0].role).toBe('designer');
    await owner.patch(`/api/workshops/${wid}/members/${ids[DEMO.maker]}`).send({ role: 'maker' }).expect(200);
  });

  it('rejects an unknown role with 400 naming the field', async () => {
    const res = await owner.patch(`/api/workshops/${wid}/members/${ids[DEMO.maker]}`).send({ role: 'boss' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['role']);
  });

  it('answers 404 for someone who is not a member of this workshop', async () => {
    const other = await signUp(t.app, 'stranger@elsewhere.test', 'Stranger Bench');
    expect((await owner.patch(`/api/workshops/${wid}/members/${other.userId}`).send({ role: 'viewer' })).status).toBe(404);
    expect((await owner.delete(`/api/workshops/${wid}/members/${other.userId}`)).status).toBe(404);
    expect((await owner.delete(`/api/workshops/${wid}/members/999999`)).status).toBe(404);
  });

  it('never leaves a workshop without an owner', async () => {
    const demote = await owner.patch(`/api/workshops/${wid}/members/${ids[DEMO.owner]}`).send({ role: 'designer' });
    expect(demote.status).toBe(400);
    expect(demote.body.error.fields.role).toMatch(/at least one owner/);
    const remove = await owner.delete(`/api/workshops/${wid}/members/${ids[DEMO.owner]}`);
    expect(remove.status).toBe(400);
    expect(remove.body.error.message).toMatch(/at least one owner/);
    expect((await owner.get('/api/auth/me')).body.memberships[0].role).toBe('owner');

    // With a second owner, the first may step down.
    await owner.patch(`/api/workshops/${wid}/members/${ids[DEMO.designer]}`).send({ role: 'owner' }).expect(200);
    await owner.patch(`/api/workshops/${wid}/members/${ids[DEMO.owner]}`).send({ role: 'designer' }).expect(200);
    // …and is now a designer, so member management is closed to them.
    expect((await owner.patch(`/api/workshops/${wid}/members/${ids[DEMO.owner]}`).send({ role: 'owner' })).status).toBe(403);
    const newOwner = await signIn(t.app, DEMO.designer);
    await newOwner.patch(`/api/workshops/${wid}/members/${ids[DEMO.owner]}`).send({ role: 'owner' }).expect(200);
    await newOwner.patch(`/api/workshops/${wid}/members/${ids[DEMO.designer]}`).send({ role: 'designer' }).expect(200);
  });

  it('a removed member loses access to the workshop but keeps the account', async () => {
    const viewer = await signIn(t.app, DEMO.viewer);
    await viewer.get(`/api/workshops/${wid}/designs`).expect(200);
    await owner.delete(`/api/workshops/${wid}/members/${ids[DEMO.viewer]}`).expect(204);
    expect((await viewer.get(`/api/workshops/${wid}/designs`)).status).toBe(403);
    const me = await viewer.get('/api/auth/me').expect(200);
    expect(me.body.memberships).toEqual([]);
    const list = await owner.get(`/api/workshops/${wid}/members`).expect(200);
    expect(list.body.items.map((m: { email: string }) => m.email)).not.toContain(DEMO.viewer);
  });
});
