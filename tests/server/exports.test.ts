/**
 * Export routes of a cut plan, read back with general-purpose libraries: the PDFs with pdfjs-dist (page
 * count and sizes: ISO 216 A4 595.28 × 841.89 pt, ANSI Letter 612 × 792 pt; 1 pt = 1/72 in, ISO 32000-1),
 * the DXF with dxf-parser (closed outlines, hole diameters = the plan's), the CSV with papaparse (RFC 4180),
 * and one page of each PDF rendered to PNG with pdftoppm (poppler-utils) to look at.
 * Content-Disposition file names: RFC 6266.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import DxfParser from 'dxf-parser';
import Papa from 'papaparse';
import * as pdfjs from 'pdfjs-dist/legacy/build/pdf.mjs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { planDesign } from '../../shared/cabinet/index.js';
import { DEMO_BOOKSHELF } from '../../shared/demo/designs.js';
import { buildStencilDocument, layoutStencils, PT_PER_MM, stencilItemsFromBuild } from '../../shared/render/index.js';
import type { CutPlanDto } from '../../shared/schemas/api.schema.js';
import { CutPlansService } from '../../server/modules/cut-plans/cut-plans.service.js';
import { demoPlanSetup, makeCutPlan } from './cut-plans.helpers.js';
import { signUp, type Agent, type TestApp } from './helpers.js';

const OUT_DIR = path.resolve('.tmp', 'exports');

let t: TestApp;
let maker: Agent;
let viewer: Agent;
let workshopId: number;
let plan: CutPlanDto;

beforeAll(async () => {
  let buildId: number;
  let stockIds: number[];
  ({ t, maker, viewer, workshopId, buildId, stockIds } = await demoPlanSetup());
  const id = await makeCutPlan(t, workshopId, buildId, { stockIds, timeLimitMs: 600 });
  plan = (await maker.get(`/api/workshops/${workshopId}/cut-plans/${id}`).expect(200)).body;
  mkdirSync(OUT_DIR, { recursive: true });
});
afterAll(async () => t.close());

const exportPath = (file: string, id = plan.id) => `/api/workshops/${workshopId}/cut-plans/${id}/exports/${file}`;

/** supertest: collect a binary body as a Buffer. */
function binary(res: request.Response, cb: (err: Error | null, body: Buffer) => void): void {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (c: Buffer) => chunks.push(c));
  stream.on('end', () => cb(null, Buffer.concat(chunks)));
}

/** The file name of an attachment (RFC 6266: a token, or a quoted string). */
function fileNameOf(disposition: string): string {
  const m = /^attachment; filename=(?:"([^"]+)"|([^;\s]+))$/.exec(disposition);
  if (!m) throw new Error(`not an attachment: ${disposition}`);
  return m[1] ?? m[2]!;
}

async function download(agent: Agent, file: string): Promise<{ body: Buffer; type: string; disposition: string }> {
  const res = await agent.get(exportPath(file)).buffer(true).parse(binary).expect(200);
  return { body: res.body as Buffer, type: String(res.headers['content-type']), disposition: String(res.headers['content-disposition']) };
}

async function pdfPages(bytes: Buffer): Promise<{ count: number; sizes: [number, number][]; text: string[] }> {
  const doc = await pdfjs.getDocument({ data: new Uint8Array(bytes), disableFontFace: true, isEvalSupported: false, useSystemFonts: false, verbosity: 0 }).promise;
  const sizes: [number, number][] = [];
  const text: string[] = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const page = await doc.getPage(i);
    const [x0, y0, x1, y1] = page.view as [number, number, number, number];
    sizes.push([Math.round((x1 - x0) * 100) / 100, Math.round((y1 - y0) * 100) / 100]);
    const content = await page.getTextContent();
    text.push(content.items.map((it) => ('str' in it ? it.str : '')).join(' '));
  }
  return { count: doc.numPages, sizes, text };
}

function pngOfPage(pdf: Buffer, name: string, page: number): string {
  const file = path.join(OUT_DIR, `${name}.pdf`);
  writeFileSync(file, pdf);
  const prefix = path.join(OUT_DIR, name);
  execFileSync('pdftoppm', ['-r', '60', '-png', '-f', String(page), '-l', String(page), '-singlefile', file, prefix]);
  return `${prefix}.png`;
}

const sheetCount = () => plan.groups.reduce((n, g) => n + g.layout.sheets.length, 0);

describe('cut diagrams PDF', () => {
  it('has one page per sheet and roll, then the cut-list page, on A4 by default', async () => {
    const file = await download(maker, 'cut-diagrams.pdf');
    expect(file.type).toBe('application/pdf');
    expect(fileNameOf(file.disposition)).toBe('harbour-lane-pair-floorstanders-cut-diagrams.pdf');
    const pdf = await pdfPages(file.body);
    // One page per sheet and roll (a long parts legend may run onto a page of its own), then the
    // cut-list table (continued when long), the totals and the cautions.
    const sheetPages = pdf.text.filter((p) => /^(Sheet|Roll|Remnant) \S+ · /.test(p));
    const legendPages = pdf.text.filter((p) => /^(Sheet|Roll|Remnant) \S+: parts/.test(p));
    const tablePages = pdf.text.filter((p) => /^(Cut list|Totals and cautions)/.test(p));
    expect(sheetPages).toHaveLength(sheetCount());
    expect(tablePages[0]).toMatch(/^Cut list \(sizes in mm\)/);
    expect(pdf.count).toBe(sheetPages.length + legendPages.length + tablePages.length);
    expect(pdf.text.slice(-tablePages.length)).toEqual(tablePages);
    // Sheets wider than long are drawn on landscape A4: 841.89 × 595.28 pt (ISO 216: 297 × 210 mm).
    for (const [w, h] of pdf.sizes) expect([w, h].sort((a, b) => a - b)).toEqual([595.28, 841.89]);
    expect(pdf.text[0]).toMatch(/Sheet 1/);
    expect(pdf.text[0]).toMatch(/Harbour slim floorstander|Harbour bookshelf/);
    const last = tablePages.join(' ');
    expect(last).toMatch(/Cut list/);
    expect(last).toMatch(/Material totals/);
    expect(last).toMatch(/Lining weight/);
    // The cautions of PRODUCT.md §5, in plain words, on the diagrams.
    expect(last).toMatch(/respirator/);
    expect(last).toMatch(/Lifting/);
    const png = pngOfPage(file.body, 'cut-diagram', 1);
    expect(execFileSync('file', [png]).toString()).toMatch(/PNG image data/);
  });

  it('takes US Letter: 612 × 792 pt (ANSI, 8.5 × 11 in)', async () => {
    const file = await download(maker, 'cut-diagrams.pdf?paper=Letter');
    const pdf = await pdfPages(file.body);
    for (const [w, h] of pdf.sizes) expect([w, h].sort((a, b) => a - b)).toEqual([612, 792]);
  });

  it('names a bad paper', async () => {
    const res = await maker.get(exportPath('cut-diagrams.pdf?paper=B5')).expect(400);
    expect(res.body.error.fields.paper).toMatch(/paper must be one of A4, Letter, A3, Tabloid/);
  });
});

describe('cut diagrams SVG', () => {
  it('all sheets in one SVG in millimetres, or one sheet by number', async () => {
    const all = await download(maker, 'cut-diagrams.svg');
    expect(all.type).toBe('image/svg+xml; charset=utf-8');
    expect(fileNameOf(all.disposition)).toBe('harbour-lane-pair-floorstanders-cut-diagram-all.svg');
    const svg = all.body.toString('utf8');
    expect(svg).toMatch(/^<\?xml version="1.0" encoding="UTF-8"\?>\n<svg xmlns="http:\/\/www.w3.org\/2000\/svg" width="[\d.]+mm" height="[\d.]+mm" viewBox="0 0 [\d.]+ [\d.]+">/);
    expect(svg.match(/<g transform="translate\(0 [\d.]+\)">/g)).toHaveLength(sheetCount());
    const one = await download(maker, 'cut-diagrams.svg?sheet=1');
    expect(fileNameOf(one.disposition)).toBe('harbour-lane-pair-floorstanders-cut-diagram-1.svg');
    const first = plan.groups[0]!.layout.sheets[0]!;
    // Drawn 1:1: the sheet's rectangle is its size in mm.
    expect(one.body.toString('utf8')).toContain(`width="${first.width}" height="${first.height}"`);
  });

  it('names a sheet number that is not in the plan', async () => {
    const res = await maker.get(exportPath(`cut-diagrams.svg?sheet=${sheetCount() + 1}`)).expect(400);
    expect(res.body.error.fields.sheet).toBe(`this plan has ${sheetCount()} sheets and rolls`);
    const bad = await maker.get(exportPath('cut-diagrams.svg?sheet=first')).expect(400);
    expect(bad.body.error.fields.sheet).toBe('sheet must be a sheet number');
  });
});

describe('CSV cut list', () => {
  it('one row per part per sheet, quantities adding up to every part of the build', async () => {
    const file = await download(maker, 'cut-list.csv');
    expect(file.type).toBe('text/csv; charset=utf-8');
    expect(fileNameOf(file.disposition)).toBe('harbour-lane-pair-floorstanders-cut-list.csv');
    const parsed = Papa.parse<Record<string, string>>(file.body.toString('utf8'), { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual(['part', 'cabinet', 'width_mm', 'height_mm', 'thickness_mm', 'quantity', 'grain', 'material', 'sheet']);
    const total = parsed.data.reduce((a, r) => a + Number(r.quantity), 0);
    expect(total).toBe(plan.parts.reduce((a, p) => a + p.quantity, 0));
    // Each (part, sheet) row counts that part's placements on that sheet.
    const placements = plan.groups.flatMap((g) => g.layout.sheets).reduce((a, s) => a + s.placements.length, 0);
    expect(total).toBe(placements);
    const side = parsed.data.filter((r) => r.part === 'Left side' && r.cabinet === 'Harbour slim floorstander');
    expect(side.reduce((a, r) => a + Number(r.quantity), 0)).toBe(4);
    expect(side[0]).toMatchObject({ width_mm: '257', height_mm: '1000', thickness_mm: '18', material: 'MDF', grain: 'along height' });
    expect(parsed.data.every((r) => /^(\d+|roll \d+)$/.test(r.sheet!))).toBe(true);
  });
});

describe('panels DXF', () => {
  it('every distinct panel as a closed outline in mm, holes with the plan’s diameters, one layer per operation', async () => {
    const file = await download(maker, 'panels.dxf');
    expect(fileNameOf(file.disposition)).toBe('harbour-lane-pair-floorstanders-panels.dxf');
    const dxf = new DxfParser().parseSync(file.body.toString('utf8'));
    if (!dxf) throw new Error('dxf-parser returned nothing');
    // $INSUNITS 4 = millimetres (DXF reference, HEADER section).
    expect(dxf.header.$INSUNITS).toBe(4);
    expect(Object.keys(dxf.tables.layer.layers)).toEqual(expect.arrayContaining(['OUTLINE', 'HOLES', 'REBATE', 'LABELS']));
    type Ent = { type: string; layer: string; shape?: boolean; vertices?: { x: number; y: number }[]; radius?: number };
    const ents = dxf.entities as unknown as Ent[];
    const outlines = ents.filter((e) => e.layer === 'OUTLINE');
    const distinct = plan.parts.filter((p) => p.kind === 'panel');
    expect(outlines).toHaveLength(distinct.length);
    expect(outlines.every((o) => o.shape === true || (o.vertices && o.vertices.length >= 4))).toBe(true);
    const sizes = outlines.map((o) => {
      const xs = o.vertices!.map((v) => v.x);
      const ys = o.vertices!.map((v) => v.y);
      return `${Math.round(Math.max(...xs) - Math.min(...xs))}x${Math.round(Math.max(...ys) - Math.min(...ys))}`;
    });
    expect(sizes.sort()).toEqual(distinct.map((p) => `${p.widthMm}x${p.heightMm}`).sort());
    // The bookshelf woofer: cut-out Ø 118 through, rebate Ø 134 (shared/demo/designs.ts), as circles on their layers.
    const shelf = planDesign(DEMO_BOOKSHELF);
    if (!shelf.ok) throw new Error('demo must plan');
    const radii = (layer: string) => ents.filter((e) => e.type === 'CIRCLE' && e.layer === layer).map((e) => Math.round(e.radius! * 1000) / 1000);
    expect(radii('HOLES')).toContain(59);
    expect(radii('REBATE')).toContain(67);
  });
});

describe('stencils PDF', () => {
  it('tiles every lining piece and driver template over A4: pages = cover + tiles, every page 595.28 × 841.89 pt', async () => {
    const file = await download(maker, 'stencils.pdf');
    expect(fileNameOf(file.disposition)).toBe('harbour-lane-pair-floorstanders-stencils-a4.pdf');
    const pdf = await pdfPages(file.body);
    const source = await new CutPlansService(t.orm.em.fork()).exportSource(workshopId, plan.id);
    const layout = layoutStencils(stencilItemsFromBuild(source.exportCabinets), { paper: { kind: 'sheet', name: 'A4' }, marginMm: 7, overlapMm: 15 });
    const doc = buildStencilDocument(layout, 'x');
    expect(pdf.count).toBe(doc.coverPages + layout.tiles.length);
    for (const size of pdf.sizes) expect(size).toEqual([595.28, 841.89]);
    const tile = pdf.text[doc.coverPages]!;
    expect(tile).toMatch(/100 mm/);
    expect(tile).toMatch(/Caution/);
    const png = pngOfPage(file.body, 'stencil', doc.coverPages + 1);
    expect(execFileSync('file', [png]).toString()).toMatch(/PNG image data/);
  });

  it('prints on a 610 mm plotter roll: the page is 610 mm wide (1729.13 pt)', async () => {
    const file = await download(maker, 'stencils.pdf?paper=roll&rollWidthMm=610');
    expect(fileNameOf(file.disposition)).toBe('harbour-lane-pair-floorstanders-stencils-roll-610mm.pdf');
    const pdf = await pdfPages(file.body);
    expect(pdf.sizes.every(([w]) => Math.abs(w - 610 * PT_PER_MM) < 0.01)).toBe(true);
  });

  it('names the field of a bad paper request', async () => {
    const noWidth = await maker.get(exportPath('stencils.pdf?paper=roll')).expect(400);
    expect(noWidth.body.error.fields.rollWidthMm).toBe('a roll needs its width (mm)');
    const narrow = await maker.get(exportPath('stencils.pdf?paper=roll&rollWidthMm=abc')).expect(400);
    expect(narrow.body.error.fields.rollWidthMm).toBe('roll width must be a number (mm)');
    const overlap = await maker.get(exportPath('stencils.pdf?overlapMm=2')).expect(400);
    expect(overlap.body.error.fields.overlapMm).toMatch(/at least 10 mm/);
  });
});

describe('who may download', () => {
  it('viewers download (they read the plans they are shown); other workshops and signed-out people do not', async () => {
    await download(viewer, 'cut-list.csv');
    const other = await signUp(t.app, 'exports@otherbench.test', 'Other Bench');
    await other.agent.get(exportPath('cut-list.csv')).expect(403);
    await request(t.app).get(exportPath('cut-list.csv')).expect(401);
    await maker.get(exportPath('cut-list.csv', 999999)).expect(404);
    await maker.get(exportPath('plans.zip')).expect(404);
  });
});
