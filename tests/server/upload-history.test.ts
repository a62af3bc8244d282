/**
 * Uploads leave history entries: adding and removing a build's photo or drivers' CSV is recorded in the build's
 * history (same transaction as the change), with who did it; other workshops cannot read it.
 * Test files: a JPEG is recognised by its SOI marker FF D8 and a JFIF APP0 segment (ITU-T T.81; JFIF 1.02),
 * as file-type does; the drivers' CSV columns are ours (DEVELOPERS.md, Floor decisions).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AuditEventDto } from '../../shared/schemas/api.schema.js';
import { AuditEvent } from '../../server/modules/audit/audit.entity.js';
import { Upload } from '../../server/modules/uploads/upload.entity.js';
import { formatFileSize } from '../../server/modules/uploads/uploads.service.js';
import { MemoryStorage } from '../../server/storage/storage.js';
import { demoBuildId } from './cut-plans.helpers.js';
import { buildTestApp, DEMO, signIn, signUp, type Agent, type TestApp } from './helpers.js';

const JPEG = Buffer.concat([
  Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01, 0x01, 0x00, 0x00, 0x01, 0x00, 0x01, 0x00, 0x00]),
  Buffer.alloc(3000),
]);
const DRIVERS_CSV = 'name,cutout_diameter_mm,displacement_litres,cone_area_cm2,excursion_mm\nWoofer 6.5,142,0.4,132,5.5\nTweeter 1,74,0.05,7.1,0.5\n';

let t: TestApp;
let maker: Agent;
let owner: Agent;
let viewer: Agent;
let wid: number;
let buildId: number;

beforeAll(async () => {
  t = await buildTestApp({ deps: { storage: new MemoryStorage() } });
  maker = await signIn(t.app, DEMO.maker);
  owner = await signIn(t.app, DEMO.owner);
  viewer = await signIn(t.app, DEMO.viewer);
  wid = (await maker.get('/api/auth/me')).body.memberships[0].workshopId;
  buildId = await demoBuildId(t, wid);
});
afterAll(async () => t.close());

const send = (agent: Agent, kind: string, data: Buffer, name: string, query = '') => agent.post(`/api/workshops/${wid}/uploads/${kind}${query}`).attach('file', data, name);
const history = async (agent: Agent, subject: string, id: number): Promise<AuditEventDto[]> =>
  (await agent.get(`/api/workshops/${wid}/history/${subject}/${id}`).expect(200)).body.items;

describe('upload history', () => {
  it("a build's photo: adding and removing it are in the build's history with who did it, newest first", async () => {
    const added = await send(maker, 'photo', JPEG, 'glued carcass.jpg', `?buildId=${buildId}`).expect(201);
    let items = await history(viewer, 'build', buildId); // viewers read the build, so its history too
    expect(items[0]).toMatchObject({ subjectType: 'build', subjectId: buildId, action: 'upload', actorEmail: DEMO.maker, summary: 'Added photo "glued carcass.jpg" (3 kB)' });

    await owner.delete(`/api/workshops/${wid}/uploads/${added.body.id}`).expect(204);
    items = await history(maker, 'build', buildId);
    expect(items[0]).toMatchObject({ action: 'delete-upload', actorEmail: DEMO.owner, summary: 'Removed photo "glued carcass.jpg"' });
    expect(items[1]).toMatchObject({ action: 'upload', actorEmail: DEMO.maker });
  });

  it("a drivers' CSV entry says how many drivers it holds", async () => {
    await send(maker, 'drivers-csv', Buffer.from(DRIVERS_CSV), 'drivers.csv', `?buildId=${buildId}`).expect(201);
    const [latest] = await history(maker, 'build', buildId);
    expect(latest).toMatchObject({ action: 'upload', summary: `Added drivers' parameters "drivers.csv" (2 drivers, ${formatFileSize(DRIVERS_CSV.length)})` });
  });

  it('a refused file leaves no history entry and no row', async () => {
    const events = await t.orm.em.fork().count(AuditEvent, {});
    const uploads = await t.orm.em.fork().count(Upload, {});
    expect((await send(maker, 'photo', Buffer.from('not a picture'), 'x.jpg', `?buildId=${buildId}`)).status).toBe(415);
    expect((await send(viewer, 'photo', JPEG, 'x.jpg', `?buildId=${buildId}`)).status).toBe(403);
    expect(await t.orm.em.fork().count(AuditEvent, {})).toBe(events);
    expect(await t.orm.em.fork().count(Upload, {})).toBe(uploads);
  });

  it('a file sent without a build has its own history (subject "upload")', async () => {
    const added = await send(maker, 'photo', JPEG, 'loose.jpg').expect(201);
    expect(await history(viewer, 'upload', added.body.id)).toMatchObject([{ action: 'upload', summary: 'Added photo "loose.jpg" (3 kB)', actorEmail: DEMO.maker }]);
    await maker.delete(`/api/workshops/${wid}/uploads/${added.body.id}`).expect(204);
    expect((await history(maker, 'upload', added.body.id)).map((e) => e.action)).toEqual(['delete-upload', 'upload']);
  });

  it('a member of another workshop cannot read it', async () => {
    const other = await signUp(t.app, 'other-shop@history.test', 'Another Workshop');
    expect((await other.agent.get(`/api/workshops/${wid}/history/build/${buildId}`)).status).toBe(403);
    // Asking through their own workshop finds nothing of ours.
    expect((await other.agent.get(`/api/workshops/${other.workshopId}/history/build/${buildId}`).expect(200)).body.items).toEqual([]);
  });

  it('sizes read as people say them (1 kB = 1024 bytes, as the upload limits count)', () => {
    expect(formatFileSize(1)).toBe('1 kB');
    expect(formatFileSize(3020)).toBe('3 kB');
    expect(formatFileSize(1024 * 1024)).toBe('1.0 MB');
    expect(formatFileSize(3.45 * 1024 * 1024)).toBe('3.5 MB');
  });
});
