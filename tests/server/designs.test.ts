/**
 * Designs API: create / list / read / update with optimistic locking / delete / duplicate / plan, and the
 * error shapes. Statuses per RFC 9110 (201 §15.3.2, 204 §15.3.5, 400 §15.5.1, 404 §15.5.5, 409 §15.5.10).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { planDesign } from '../../shared/cabinet/index.js';
import { DEMO_BOOKSHELF, DEMO_FLOORSTANDER } from '../../shared/demo/designs.js';
import { designSchema } from '../../shared/schemas/design.schema.js';
import { Design } from '../../server/modules/designs/design.entity.js';
import { buildTestApp, DEMO, signIn, signUp, type Agent, type TestApp } from './helpers.js';

/** ISO 8601 / RFC 3339 UTC timestamp as Date.prototype.toISOString writes it (ECMA-262 §21.4.4.36). */
const ISO_UTC = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;

let t: TestApp;
let designer: Agent;
let owner: Agent;
let viewer: Agent;
let wid: number;
let base: string;

beforeAll(async () => {
  t = await buildTestApp();
  designer = await signIn(t.app, DEMO.designer);
  owner = await signIn(t.app, DEMO.owner);
  viewer = await signIn(t.app, DEMO.viewer);
  wid = (await designer.get('/api/auth/me')).body.memberships[0].workshopId;
  base = `/api/workshops/${wid}/designs`;
});
afterAll(async () => t.close());

const count = () => t.orm.em.fork().count(Design, {});

describe('create, list, read', () => {
  it('lists the seeded demo designs as summaries', async () => {
    const res = await viewer.get(base).expect(200);
    const byName = new Map(res.body.items.map((d: { name: string }) => [d.name, d]));
    const shelf = byName.get(DEMO_BOOKSHELF.name) as Record<string, unknown>;
    expect(shelf).toMatchObject({
      widthMm: DEMO_BOOKSHELF.outer.width,
      heightMm: DEMO_BOOKSHELF.outer.height,
      depthMm: DEMO_BOOKSHELF.outer.depth,
      braceCount: DEMO_BOOKSHELF.braces!.length,
      openingCount: DEMO_BOOKSHELF.openings!.length,
      version: 1,
      updatedBy: DEMO.designer,
    });
    expect(shelf.createdAt).toMatch(ISO_UTC);
    expect(byName.has(DEMO_FLOORSTANDER.name)).toBe(true);
    expect(shelf).not.toHaveProperty('design');
  });

  it('creates a design: 201 with id, version 1, defaults filled in, who and when', async () => {
    const before = Date.now();
    const input = { name: 'Plain box', outer: { width: 300, height: 500, depth: 350 }, material: { name: 'MDF', thickness: 18 } };
    const res = await designer.post(base).send(input);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ id: expect.any(Number), name: 'Plain box', version: 1, updatedBy: DEMO.designer });
    // The stored design is the schema's output: the same JSON the client's form and the CLI get.
    expect(res.body.design).toEqual(designSchema.parse(input));
    expect(res.body.createdAt).toMatch(ISO_UTC);
    expect(Date.parse(res.body.createdAt)).toBeGreaterThanOrEqual(before - 1000);
    const read = await viewer.get(`${base}/${res.body.id}`).expect(200);
    expect(read.body).toEqual(res.body);
  });

  it('GET …/plan answers what the cabinet engine plans for the stored design', async () => {
    const created = await designer.post(base).send(DEMO_BOOKSHELF).expect(201);
    const res = await viewer.get(`${base}/${created.body.id}/plan`).expect(200);
    const direct = planDesign(created.body.design);
    expect(direct.ok).toBe(true);
    if (direct.ok) expect(res.body).toEqual(JSON.parse(JSON.stringify(direct.plan)));
    expect(Array.isArray(res.body.panels)).toBe(true);
    expect(typeof res.body.volumes.netLitres).toBe('number');
  });
});

describe('bad input: 400 with fields, nothing written', () => {
  it('names the field of a shape error (outer.width)', async () => {
    const n = await count();
    const res = await designer.post(base).send({ ...DEMO_BOOKSHELF, outer: { ...DEMO_BOOKSHELF.outer, width: -5 } });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(res.body.error.fields['outer.width']).toMatch(/greater than 0/);
    expect(res.body.error.message).toMatch(/^outer\.width: /);
    expect(await count()).toBe(n);
  });

  it('names array elements as braces[0].position', async () => {
    const res = await designer.post(base).send({ ...DEMO_BOOKSHELF, braces: [{ ...DEMO_BOOKSHELF.braces![0], position: 'middle' }] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain('braces[0].position');
  });

  it('reports the cabinet engine’s geometry errors with their field paths (a brace outside the cavity)', async () => {
    const n = await count();
    const res = await designer.post(base).send({ ...DEMO_BOOKSHELF, braces: [{ ...DEMO_BOOKSHELF.braces![0], position: 5000 }] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain('braces[0].position');
    expect(await count()).toBe(n);
  });

  it('rejects a body that is not an object, and bad JSON', async () => {
    expect((await designer.post(base).send([1, 2])).status).toBe(400);
    const res = await designer.post(base).set('Content-Type', 'application/json').send('{"name": ');
    expect(res.status).toBe(400);
    expect(res.body.error).toEqual({ code: 'invalid_input', message: 'The request body is not valid JSON.' });
  });

  it('PUT reports design fields without a prefix (outer.width) and a missing version as version', async () => {
    const created = await designer.post(base).send(DEMO_BOOKSHELF).expect(201);
    const res = await designer.put(`${base}/${created.body.id}`).send({ design: { ...DEMO_BOOKSHELF, outer: { ...DEMO_BOOKSHELF.outer, width: 0 } } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['outer.width', 'version']);
    const after = await designer.get(`${base}/${created.body.id}`).expect(200);
    expect(after.body.version).toBe(1);
    expect(after.body.design.outer.width).toBe(DEMO_BOOKSHELF.outer.width);
  });
});

describe('update and optimistic locking', () => {
  it('saves with the loaded version; a second save with the stale version gets 409 and changes nothing', async () => {
    const created = await designer.post(base).send(DEMO_FLOORSTANDER).expect(201);
    const url = `${base}/${created.body.id}`;
    // Two people load version 1.
    const mine = (await designer.get(url)).body;
    const theirs = (await owner.get(url)).body;
    const saved = await owner.put(url).send({ version: theirs.version, design: { ...theirs.design, name: 'Slim floorstander, taller', outer: { ...theirs.design.outer, height: 1000 } } });
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({ version: 2, name: 'Slim floorstander, taller', updatedBy: DEMO.owner });
    expect(saved.body.design.outer.height).toBe(1000);
    expect(Date.parse(saved.body.updatedAt)).toBeGreaterThanOrEqual(Date.parse(saved.body.createdAt));

    const stale = await designer.put(url).send({ version: mine.version, design: { ...mine.design, outer: { ...mine.design.outer, width: 260 } } });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('edited_elsewhere');
    const now = (await designer.get(url)).body;
    expect(now.version).toBe(2);
    expect(now.design.outer).toEqual(saved.body.design.outer);

    // Reloading their version and saving again works.
    const again = await designer.put(url).send({ version: now.version, design: { ...now.design, outer: { ...now.design.outer, width: 260 } } });
    expect(again.status).toBe(200);
    expect(again.body.version).toBe(3);
    expect((await viewer.get(base)).body.items.find((d: { id: number }) => d.id === created.body.id)).toMatchObject({ version: 3, widthMm: 260, name: 'Slim floorstander, taller' });
  });

  it('a version from the future is also stale (409)', async () => {
    const created = await designer.post(base).send(DEMO_BOOKSHELF).expect(201);
    const res = await designer.put(`${base}/${created.body.id}`).send({ version: 7, design: DEMO_BOOKSHELF });
    expect(res.status).toBe(409);
  });
});

describe('delete, duplicate, not found', () => {
  it('deletes (204), then the design is 404 everywhere', async () => {
    const created = await designer.post(base).send(DEMO_BOOKSHELF).expect(201);
    const url = `${base}/${created.body.id}`;
    await designer.delete(url).expect(204);
    for (const res of [await designer.get(url), await designer.get(`${url}/plan`), await designer.delete(url), await designer.post(`${url}/duplicate`)]) {
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
    expect((await designer.put(url).send({ version: 1, design: DEMO_BOOKSHELF })).status).toBe(404);
  });

  it('duplicates as a new design named "(copy)" at version 1', async () => {
    const created = await designer.post(base).send(DEMO_BOOKSHELF).expect(201);
    const copy = await designer.post(`${base}/${created.body.id}/duplicate`);
    expect(copy.status).toBe(201);
    expect(copy.body.id).not.toBe(created.body.id);
    expect(copy.body).toMatchObject({ version: 1, name: `${DEMO_BOOKSHELF.name} (copy)`, updatedBy: DEMO.designer });
    expect({ ...copy.body.design, name: '' }).toEqual({ ...created.body.design, name: '' });
    expect(copy.body.design.name).toBe(copy.body.name);
  });

  it('keeps a long name within 120 characters when duplicating', async () => {
    const created = await designer.post(base).send({ ...DEMO_BOOKSHELF, name: 'x'.repeat(120) }).expect(201);
    const copy = await designer.post(`${base}/${created.body.id}/duplicate`).expect(201);
    expect(copy.body.name).toHaveLength(120);
    expect(copy.body.name.endsWith(' (copy)')).toBe(true);
  });

  it('ids that are not positive integers are 404', async () => {
    for (const id of ['abc', '0', '-1', '1.5', '99999999999']) expect((await designer.get(`${base}/${id}`)).status).toBe(404);
  });

  it('a design of another workshop is 404 through one’s own workshop and 403 through theirs', async () => {
    const other = await signUp(t.app, 'bench@elsewhere.test', 'Elsewhere Bench');
    const theirs = await other.agent.post(`/api/workshops/${other.workshopId}/designs`).send(DEMO_BOOKSHELF).expect(201);
    expect((await designer.get(`${base}/${theirs.body.id}`)).status).toBe(404);
    expect((await designer.put(`${base}/${theirs.body.id}`).send({ version: 1, design: DEMO_BOOKSHELF })).status).toBe(404);
    expect((await designer.delete(`${base}/${theirs.body.id}`)).status).toBe(404);
    expect((await designer.get(`/api/workshops/${other.workshopId}/designs/${theirs.body.id}`)).status).toBe(403);
    expect((await other.agent.get(`/api/workshops/${other.workshopId}/designs/${theirs.body.id}`)).status).toBe(200);
    // And their list does not show ours.
    const list = await other.agent.get(`/api/workshops/${other.workshopId}/designs`).expect(200);
    expect(list.body.items.map((d: { id: number }) => d.id)).toEqual([theirs.body.id]);
  });
});
