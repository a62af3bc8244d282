/**
 * Uploads: type by content, not by name (file signatures: PNG "\x89PNG\r\n\x1a\n", W3C PNG spec §5.2;
 * JPEG SOI FF D8 + APP0 "JFIF", ITU-T T.81 / JFIF 1.02), size limits, and safe serving headers
 * (OWASP File Upload Cheat Sheet: X-Content-Type-Options nosniff, Content-Disposition, CSP; never serve SVG inline).
 */
import { deflateSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { UPLOAD_LIMITS } from '../../server/modules/uploads/uploads.service.js';
import { buildTestApp, DEMO, signIn, type Agent, type TestApp } from './helpers.js';
import { MemoryStorage } from '../../server/storage/storage.js';

/** A real 2×2 RGB PNG built per the PNG spec (signature, IHDR, IDAT with zlib data, IEND; CRC-32 per ISO 3309). */
function tinyPng(): Buffer {
  const crcTable = Array.from({ length: 256 }, (_, n) => {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    return c >>> 0;
  });
  const crc = (b: Buffer) => {
    let c = 0xffffffff;
    for (const byte of b) c = crcTable[(c ^ byte) & 0xff]! ^ (c >>> 8);
    return (c ^ 0xffffffff) >>> 0;
  };
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
    const out = Buffer.alloc(12 + data.length);
    out.writeUInt32BE(data.length, 0);
    body.copy(out, 4);
    out.writeUInt32BE(crc(body), 8 + data.length);
    return out;
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(2, 0);
  ihdr.writeUInt32BE(2, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // RGB
  const rows = Buffer.from([0, 255, 0, 0, 0, 0, 255, 0, 0, 255, 0, 255, 0, 255, 255, 255]);
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk('IHDR', ihdr), chunk('IDAT', deflateSync(rows)), chunk('IEND', Buffer.alloc(0))]);
}
const JPEG_HEAD = Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01, 0x01, 0x00, 0x00, 0x01, 0x00, 0x01, 0x00, 0x00]);
const SVG = Buffer.from('<?xml version="1.0"?>\n<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script></svg>\n');
const DRIVERS_CSV = 'name,cutout_diameter_mm,displacement_litres,cone_area_cm2,excursion_mm\nWoofer 6.5,142,0.4,132,5.5\nTweeter 1,74,0.05,7.1,0.5\n';

let t: TestApp;
let storage: MemoryStorage;
let maker: Agent;
let wid: number;
const base = () => `/api/workshops/${wid}/uploads`;

beforeAll(async () => {
  storage = new MemoryStorage();
  t = await buildTestApp({ deps: { storage } });
  maker = await signIn(t.app, DEMO.maker);
  wid = (await maker.get('/api/auth/me')).body.memberships[0].workshopId;
});
afterAll(async () => t.close());

const upload = (agent: Agent, kind: string, data: Buffer, name: string, query = '') => agent.post(`${base()}/${kind}${query}`).attach('file', data, name);

describe('uploads', () => {
  it('a build photo (PNG) is stored and served inline with safe headers', async () => {
    const png = tinyPng();
    const res = await upload(maker, 'photo', png, 'front view.png', '?buildId=1');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ kind: 'photo', contentType: 'image/png', sizeBytes: png.length, name: 'front view.png', subjectType: 'build', subjectId: 1 });
    const file = await maker.get(res.body.url).buffer(true).expect(200);
    expect(Buffer.compare(file.body as Buffer, png)).toBe(0);
    expect(file.headers['content-type']).toBe('image/png');
    expect(file.headers['x-content-type-options']).toBe('nosniff');
    expect(file.headers['content-security-policy']).toBe("default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; sandbox");
    expect(file.headers['content-disposition']).toMatch(/^inline; filename="front view.png"/);
    const list = await maker.get(`${base()}?buildId=1`).expect(200);
    expect(list.body.items.map((u: { id: number }) => u.id)).toContain(res.body.id);
    const noBuild = await upload(maker, 'photo', png, 'x.png', '?buildId=999');
    expect(noBuild.status).toBe(400);
    expect(noBuild.body.error.fields).toEqual({ buildId: 'no such build in this workshop' });
  });

  it('a JPEG named .txt is a JPEG; a PNG renamed .jpg stays a PNG: the content decides', async () => {
    const jpeg = await upload(maker, 'photo', Buffer.concat([JPEG_HEAD, Buffer.alloc(64)]), 'camera.txt');
    expect(jpeg.status).toBe(201);
    expect(jpeg.body.contentType).toBe('image/jpeg');
    const png = await upload(maker, 'photo', tinyPng(), 'renamed.jpg');
    expect(png.body.contentType).toBe('image/png');
  });

  it('rejects a PNG renamed .csv as a CSV, and an SVG as a photo or as a CSV (415)', async () => {
    const stored = storage.size;
    const pngAsCsv = await upload(maker, 'drivers-csv', tinyPng(), 'drivers.csv');
    expect(pngAsCsv.status).toBe(415);
    expect(pngAsCsv.body.error.fields.file).toBe('this file is image/png (.png), not a CSV text file');
    const svgPhoto = await upload(maker, 'photo', SVG, 'photo.png');
    expect(svgPhoto.status).toBe(415);
    expect(svgPhoto.body.error.fields.file).toMatch(/SVG/);
    const svgCsv = await upload(maker, 'drivers-csv', SVG, 'drivers.csv');
    expect(svgCsv.status).toBe(415);
    const binary = await upload(maker, 'drivers-csv', Buffer.from([0x6e, 0x61, 0x00, 0x6d, 0x65]), 'drivers.csv');
    expect(binary.status).toBe(415);
    expect(storage.size).toBe(stored);
  });

  it('enforces the size limits (413) before anything is stored', async () => {
    const stored = storage.size;
    const big = Buffer.concat([tinyPng(), Buffer.alloc(UPLOAD_LIMITS.photo + 1 - tinyPng().length)]);
    const res = await upload(maker, 'photo', big, 'huge.png');
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({ code: 'file_too_large', message: 'The file is larger than 10 MB, the limit for a photo.' });
    const csv = await upload(maker, 'drivers-csv', Buffer.alloc(UPLOAD_LIMITS['drivers-csv'] + 1, 0x61), 'big.csv');
    expect(csv.status).toBe(413);
    expect(storage.size).toBe(stored);
  });

  it("a drivers' parameters CSV is kept with its parsed rows and served as an attachment", async () => {
    const res = await upload(maker, 'drivers-csv', Buffer.from(DRIVERS_CSV), 'drivers.csv');
    expect(res.status).toBe(201);
    expect(res.body.drivers).toEqual([
      { name: 'Woofer 6.5', cutoutDiameterMm: 142, displacementLitres: 0.4, coneAreaCm2: 132, excursionMm: 5.5 },
      { name: 'Tweeter 1', cutoutDiameterMm: 74, displacementLitres: 0.05, coneAreaCm2: 7.1, excursionMm: 0.5 },
    ]);
    expect((await maker.get(`${base()}/${res.body.id}/drivers`).expect(200)).body.items).toEqual(res.body.drivers);
    const file = await maker.get(res.body.url).expect(200);
    expect(file.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(file.headers['content-disposition']).toBe('attachment; filename=drivers.csv');
    expect(file.headers['x-content-type-options']).toBe('nosniff');
  });

  it("a drivers' CSV with a bad row is refused whole with the row and column", async () => {
    const stored = storage.size;
    const res = await upload(maker, 'drivers-csv', Buffer.from(DRIVERS_CSV + 'Mid 4,0,0.1,50,3\n'), 'drivers.csv');
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ 'row 4, cutout_diameter_mm': 'cut-out diameter must be greater than 0' });
    expect(storage.size).toBe(stored);
  });

  it('viewers may not upload; deleting removes the file from the storage', async () => {
    const viewer = await signIn(t.app, DEMO.viewer);
    expect((await upload(viewer, 'photo', tinyPng(), 'x.png')).status).toBe(403);
    const res = await upload(maker, 'photo', tinyPng(), 'gone.png');
    const stored = storage.size;
    await maker.delete(`${base()}/${res.body.id}`).expect(204);
    expect(storage.size).toBe(stored - 1);
    expect((await maker.get(res.body.url)).status).toBe(404);
    expect((await maker.post(`${base()}/videos`).attach('file', tinyPng(), 'x.png')).status).toBe(404);
  });
});
