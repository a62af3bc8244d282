/**
 * The stock room: sheets, remnants and rolls (PRODUCT.md §4, §6); owners and makers change it, designers read
 * it. CSV import with papaparse: any bad row imports nothing, and the answer names each row and column.
 * CSV text follows RFC 4180 (§2: fields with commas or quotes are quoted, quotes doubled, CRLF line ends).
 */
import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { StockItemDto } from '../../shared/schemas/api.schema.js';
import { StockItem } from '../../server/modules/stock/stock-item.entity.js';
import { DEMO_STOCK } from '../../server/seed.js';
import { buildTestApp, DEMO, signIn, type Agent, type TestApp } from './helpers.js';

let t: TestApp;
let maker: Agent;
let wid: number;
const base = () => `/api/workshops/${wid}/stock`;

beforeAll(async () => {
  t = await buildTestApp();
  maker = await signIn(t.app, DEMO.maker);
  wid = (await maker.get('/api/auth/me')).body.memberships[0].workshopId;
});
afterAll(async () => t.close());

const count = () => t.orm.em.fork().count(StockItem, { workshop: wid });
const importCsv = (agent: Agent, csv: string, name = 'stock.csv') => agent.post(`${base()}/import`).attach('file', Buffer.from(csv, 'utf8'), name);

describe('stock room', () => {
  it('holds the demo stock of PRODUCT.md §9', async () => {
    const items: StockItemDto[] = (await maker.get(base()).expect(200)).body.items;
    expect(items.length).toBe(DEMO_STOCK.length);
    expect(items.find((s) => s.kind === 'sheet' && s.thicknessMm === 18)).toMatchObject({ material: 'MDF', widthMm: 2440, heightMm: 1220 });
    expect(items.find((s) => s.kind === 'roll')).toMatchObject({ material: 'Polyester batt', thicknessMm: 50, widthMm: 1200 });
  });

  it('adds, edits with a version check, and deletes an item; each change is in its history', async () => {
    const created = await maker.post(base()).send({ kind: 'sheet', material: 'Birch plywood', thicknessMm: 18, widthMm: 2500, heightMm: 1250, quantity: 6, cost: 71.5, grain: 'length' });
    expect(created.status).toBe(201);
    const item: StockItemDto = created.body;
    expect(item).toMatchObject({ kind: 'sheet', material: 'Birch plywood', quantity: 6, grain: 'length', version: 1, updatedBy: DEMO.maker });

    const edited = await maker.put(`${base()}/${item.id}`).send({ version: 1, item: { ...item, quantity: 5 } });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ quantity: 5, version: 2 });
    const stale = await maker.put(`${base()}/${item.id}`).send({ version: 1, item: { ...item, quantity: 4 } });
    expect(stale.status).toBe(409);
    // An update's field errors use the same paths as a create (`widthMm`, not `item.widthMm`).
    const bad = await maker.put(`${base()}/${item.id}`).send({ item: { ...item, widthMm: 0 } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toMatchObject({ version: 'version is required', widthMm: 'width must be greater than 0' });

    const history = (await maker.get(`/api/workshops/${wid}/history/stock/${item.id}`).expect(200)).body.items;
    expect(history.map((e: { action: string; summary: string }) => [e.action, e.summary])).toEqual([
      ['update', 'Changed quantity 6 → 5'],
      ['create', 'Added sheet 18 mm Birch plywood, 2500 × 1250 mm'],
    ]);
    await maker.delete(`${base()}/${item.id}`).expect(204);
    expect((await maker.get(`${base()}/${item.id}`)).status).toBe(404);
    expect((await maker.get(`/api/workshops/${wid}/history/stock/${item.id}`).expect(200)).body.items[0].action).toBe('delete');
  });

  it('answers bad input with the field that is wrong', async () => {
    const res = await maker.post(base()).send({ kind: 'sheet', material: '', thicknessMm: 0, widthMm: 'wide', quantity: 1.5 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toMatchObject({
      material: 'material is required',
      thicknessMm: 'thickness must be greater than 0',
      widthMm: 'width must be a number (mm)',
      quantity: 'quantity must be a whole number',
    });
    const noHeight = await maker.post(base()).send({ kind: 'remnant', material: 'MDF', thicknessMm: 18, widthMm: 600 });
    expect(noHeight.body.error.fields).toEqual({ heightMm: 'a remnant needs a height' });
  });

  it('a CSV with one bad row imports nothing, and the report names row, column and reason', async () => {
    const before = await count();
    const csv = [
      'kind,material,thickness_mm,width_mm,height_mm,length_mm,quantity,cost,grain,note',
      'sheet,MDF,18,2440,1220,,4,38.5,none,',
      'sheet,MDF,eighteen,2440,1220,,4,38.5,none,',
      'roll,Polyester batt,50,1200,,15000,1,6.2,none,per metre',
      'remnant,,18,800,-3,,1,,sideways,',
      '',
    ].join('\r\n');
    const res = await importCsv(maker, csv);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('Nothing was imported: 2 rows have a problem. Row 3, thickness_mm: "eighteen" is not a number (use a dot for decimals).');
    expect(res.body.error.fields).toEqual({
      'row 3, thickness_mm': '"eighteen" is not a number (use a dot for decimals)',
      'row 5, material': 'a value is required',
      'row 5, height_mm': 'height must be greater than 0',
      'row 5, grain': 'grain must be none or length',
    });
    expect(await count()).toBe(before);
  });

  it('a header problem is reported on row 1; an empty file too', async () => {
    const res = await importCsv(maker, 'kind,material,thickness,width_mm\nsheet,MDF,18,2440\n');
    expect(res.body.error.fields).toEqual({
      'row 1, thickness': 'unknown column; use kind, material, thickness_mm, width_mm, height_mm, length_mm, quantity, cost, grain, note',
      'row 1, thickness_mm': 'required column is missing',
    });
    expect((await importCsv(maker, '')).body.error.fields).toEqual({ file: 'choose a file' });
    expect((await importCsv(maker, 'kind,material,thickness_mm,width_mm\r\n')).body.error.fields).toEqual({ 'row 2, (file)': 'no rows below the header' });
  });

  it('a good CSV imports every row; export writes RFC 4180 CSV that papaparse reads back to the same items', async () => {
    const before = await count();
    const csv = 'Kind,Material,Thickness_mm,Width_mm,Height_mm,Quantity,Cost,Grain,Note\n' + 'sheet,"Oak veneered MDF, A/B",19,2800,2070,2,96,length,"said ""premium"""\n' + 'remnant,MDF,18,900,450,1,,none,\n';
    const res = await importCsv(maker, csv);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ kind: 'stock-csv', imported: 2 });
    expect(await count()).toBe(before + 2);

    const exported = await maker.get(`${base()}/export.csv`).expect(200);
    expect(exported.headers['content-type']).toMatch(/^text\/csv/);
    expect(exported.headers['content-disposition']).toBe('attachment; filename=stock-room.csv');
    expect(exported.text).toContain('"Oak veneered MDF, A/B"');
    expect(exported.text).toContain('"said ""premium"""');
    expect(exported.text.split('\r\n').length).toBe(before + 2 + 2);
    const rows = Papa.parse<Record<string, string>>(exported.text.trim(), { header: true }).data;
    const items: StockItemDto[] = (await maker.get(base())).body.items;
    expect(rows.map((r) => [r.kind, r.material, Number(r.thickness_mm), Number(r.width_mm), r.note])).toEqual(
      items.map((s) => [s.kind, s.material, s.thicknessMm, s.widthMm, s.note]),
    );
  });

  it('a spreadsheet formula in a cell is exported as text (OWASP CSV Injection)', async () => {
    await maker.post(base()).send({ kind: 'remnant', material: '=HYPERLINK("x")', thicknessMm: 18, widthMm: 500, heightMm: 400, quantity: 1 }).expect(201);
    const exported = await maker.get(`${base()}/export.csv`).expect(200);
    expect(exported.text).toContain(`"'=HYPERLINK(""x"")"`);
  });

  it('designers read but may not change it; viewers and outsiders may not read it', async () => {
    const designer = await signIn(t.app, DEMO.designer);
    await designer.get(base()).expect(200);
    expect((await designer.post(base()).send({ kind: 'sheet', material: 'MDF', thicknessMm: 18, widthMm: 100, heightMm: 100 })).status).toBe(403);
    expect((await importCsv(designer, 'kind,material,thickness_mm,width_mm\n')).status).toBe(403);
    const viewer = await signIn(t.app, DEMO.viewer);
    expect((await viewer.get(base())).status).toBe(403);
    expect((await request(t.app).get(base())).status).toBe(401);
  });
});
