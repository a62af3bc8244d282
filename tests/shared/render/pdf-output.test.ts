/**
 * The real PDF: drawn through the pdfkit adapter, parsed back with pdfjs-dist (a general-purpose PDF
 * library) and checked with poppler-utils (pdffonts, pdftoppm).
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as pdfjs from 'pdfjs-dist/legacy/build/pdf.mjs';
import { PdfkitSink } from '../../../server/export/pdfkit-sink.js';
import { drawCutDiagrams } from '../../../shared/render/cut-diagram.js';
import type { PdfSink } from '../../../shared/render/pdf-sink.js';
import { stencilItemsFromBuild } from '../../../shared/render/stencil-items.js';
import { drawStencils, type StencilOptions } from '../../../shared/render/stencils.js';
import { demoBuild } from './demo-build.js';
import { SMALL_LAYOUT, SMALL_PARTS, SMALL_STOCK } from './fixtures.js';

let dir = '';
beforeAll(() => {
  dir = mkdtempSync(path.join(tmpdir(), 'boxwright-render-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function pdfOf(draw: (sink: PdfSink) => void, name: string): Promise<{ file: string; bytes: Buffer }> {
  const sink = new PdfkitSink({ title: name, creationDate: new Date(Date.UTC(2026, 0, 1)) });
  draw(sink);
  const bytes = await sink.finish();
  const file = path.join(dir, `${name}.pdf`);
  writeFileSync(file, bytes);
  return { file, bytes };
}

async function openPdf(bytes: Buffer) {
  return pdfjs.getDocument({ data: new Uint8Array(bytes), disableFontFace: true, isEvalSupported: false, useSystemFonts: false, verbosity: 0 }).promise;
}

type Matrix = [number, number, number, number, number, number];
const multiply = (m: Matrix, n: Matrix): Matrix => [
  n[0] * m[0] + n[1] * m[2],
  n[0] * m[1] + n[1] * m[3],
  n[2] * m[0] + n[3] * m[2],
  n[2] * m[1] + n[3] * m[3],
  n[4] * m[0] + n[5] * m[2] + m[4],
  n[4] * m[1] + n[5] * m[3] + m[5],
];

/** Rectangles drawn on a page (`re` operators), sized in default user space (pt) through the CTM. */
async function rectanglesOnPage(doc: pdfjs.PDFDocumentProxy, pageNo: number): Promise<{ widthPt: number; heightPt: number }[]> {
  const page = await doc.getPage(pageNo);
  const ops = await page.getOperatorList();
  const OPS = pdfjs.OPS;
  const argCount: Record<number, number> = { [OPS.moveTo]: 2, [OPS.lineTo]: 2, [OPS.curveTo]: 6, [OPS.curveTo2]: 4, [OPS.curveTo3]: 4, [OPS.closePath]: 0, [OPS.rectangle]: 4 };
  let ctm: Matrix = [1, 0, 0, 1, 0, 0];
  const stack: Matrix[] = [];
  const out: { widthPt: number; heightPt: number }[] = [];
  ops.fnArray.forEach((fn, i) => {
    const args = ops.argsArray[i];
    if (fn === OPS.save) stack.push(ctm);
    else if (fn === OPS.restore) ctm = stack.pop() ?? ctm;
    else if (fn === OPS.transform) ctm = multiply(ctm, args as Matrix);
    else if (fn === OPS.constructPath) {
      const [subOps, coords] = args as [number[], number[]];
      let k = 0;
      for (const op of subOps) {
        if (op === OPS.rectangle) {
          const [, , w, h] = coords.slice(k, k + 4) as [number, number, number, number];
          out.push({ widthPt: Math.hypot(ctm[0] * w, ctm[1] * w), heightPt: Math.hypot(ctm[2] * h, ctm[3] * h) });
        }
        k += argCount[op] ?? 0;
      }
    }
  });
  return out;
}

/** Width and height of a PNG from its IHDR chunk (PNG spec, ISO/IEC 15948: bytes 16–23, big-endian). */
function pngSize(file: string): { width: number; height: number } {
  const b = readFileSync(file);
  expect(b.subarray(0, 8).toString('hex')).toBe('89504e470d0a1a0a');
  return { width: b.readUInt32BE(16), height: b.readUInt32BE(20) };
}

const A4: StencilOptions = { paper: { kind: 'sheet', name: 'A4' }, marginMm: 7, overlapMm: 15 };
const LETTER: StencilOptions = { paper: { kind: 'sheet', name: 'Letter' }, marginMm: 7, overlapMm: 15 };

describe('stencil PDF through pdfkit, read back with pdfjs-dist', () => {
  it('A4 pages are 595.28 × 841.89 pt and Letter pages 612 × 792 pt', async () => {
    // ISO 216 A4 210 × 297 mm and ANSI Letter 8.5 × 11 in, at 1 pt = 1/72 in (ISO 32000-1 §8.3.2.1).
    const items = stencilItemsFromBuild(demoBuild()).slice(0, 3);
    for (const [options, w, h] of [
      [A4, 595.28, 841.89],
      [LETTER, 612, 792],
    ] as const) {
      const { bytes } = await pdfOf((sink) => drawStencils(sink, items, options, 'Harbour Lane build'), `sizes-${options.paper.kind === 'sheet' ? options.paper.name : 'roll'}`);
      const doc = await openPdf(bytes);
      expect(doc.numPages).toBeGreaterThan(3);
      for (let p = 1; p <= doc.numPages; p++) {
        const [x0, y0, x1, y1] = (await doc.getPage(p)).view as [number, number, number, number];
        expect(x1 - x0).toBeCloseTo(w, 2);
        expect(y1 - y0).toBeCloseTo(h, 2);
      }
      await doc.destroy();
    }
  });

  it('every page has the 100 mm square at 283.46 pt and the 4 in square at 288 pt', async () => {
    // 100 mm × 72 / 25.4 = 283.4646 pt; 4 in × 72 = 288 pt (ISO 32000-1 default user space unit).
    const items = stencilItemsFromBuild(demoBuild()).slice(0, 4);
    const { bytes } = await pdfOf((sink) => drawStencils(sink, items, A4, 'Harbour Lane build'), 'calibration');
    const doc = await openPdf(bytes);
    for (let p = 1; p <= doc.numPages; p++) {
      const rects = await rectanglesOnPage(doc, p);
      expect(rects.some((r) => Math.abs(r.widthPt - 283.46) < 0.01 && Math.abs(r.heightPt - 283.46) < 0.01), `page ${p}`).toBe(true);
      expect(rects.some((r) => Math.abs(r.widthPt - 288) < 0.01 && Math.abs(r.heightPt - 288) < 0.01), `page ${p}`).toBe(true);
    }
    await doc.destroy();
  });

  it('embeds the DejaVu fonts from fonts/ (pdffonts: emb yes) and keeps the text readable', async () => {
    const items = stencilItemsFromBuild(demoBuild()).slice(0, 1);
    const { file, bytes } = await pdfOf((sink) => drawStencils(sink, items, A4, 'Harbour Lane build'), 'fonts');
    const fonts = execFileSync('pdffonts', [file], { encoding: 'utf8' }).split('\n').slice(2).filter(Boolean);
    expect(fonts.length).toBe(2);
    for (const line of fonts) {
      expect(line).toMatch(/DejaVuSans/);
      expect(line.split(/\s+/).slice(-5, -4)[0]).toBe('yes');
    }
    const doc = await openPdf(bytes);
    const content = await (await doc.getPage(2)).getTextContent();
    const all = content.items.map((i) => ('str' in i ? i.str : '')).join(' ').replace(/\s+/g, ' ');
    expect(all).toContain('Print at 100 % / actual size,');
    expect(all).toContain(items[0]!.name);
    await doc.destroy();
  });

  it('renders a stencil page to PNG with pdftoppm at the page size', async () => {
    const items = stencilItemsFromBuild(demoBuild()).slice(0, 1);
    const { file } = await pdfOf((sink) => drawStencils(sink, items, A4, 'Harbour Lane build'), 'stencil-png');
    const out = path.join(dir, 'stencil');
    execFileSync('pdftoppm', ['-r', '50', '-png', '-f', '2', '-l', '2', '-singlefile', file, out]);
    // A4 at 50 dpi: 210 / 25.4 × 50 = 413.4 px by 297 / 25.4 × 50 = 584.6 px (pdftoppm rounds up).
    const { width, height } = pngSize(`${out}.png`);
    expect(width).toBeGreaterThanOrEqual(413);
    expect(width).toBeLessThanOrEqual(414);
    expect(height).toBeGreaterThanOrEqual(584);
    expect(height).toBeLessThanOrEqual(585);
  });
});

describe('cut diagram PDF through pdfkit', () => {
  it('has landscape A4 sheet pages (841.89 × 595.28 pt) and renders to PNG with pdftoppm', async () => {
    const { file, bytes } = await pdfOf((sink) => drawCutDiagrams(sink, { title: 'Harbour Lane build', layouts: [SMALL_LAYOUT], parts: SMALL_PARTS, stock: SMALL_STOCK }, 'A4'), 'cut-diagrams');
    const doc = await openPdf(bytes);
    const [, , w, h] = (await doc.getPage(1)).view as [number, number, number, number];
    expect(w).toBeCloseTo(841.89, 2);
    expect(h).toBeCloseTo(595.28, 2);
    await doc.destroy();
    const out = path.join(dir, 'cut');
    execFileSync('pdftoppm', ['-r', '50', '-png', '-f', '1', '-l', '1', '-singlefile', file, out]);
    const size = pngSize(`${out}.png`);
    expect([584, 585]).toContain(size.width);
    expect([413, 414]).toContain(size.height);
  });
});
