/**
 * The files a cut plan exports, drawn by shared/render from the plan's snapshot: cut diagrams (PDF through
 * pdfkit, SVG in mm), the CSV cut list, the panels' DXF and the full-size stencil PDF. Each file is made
 * whole before the first byte is sent, so a bad request or a drawing error is a clean JSON error, never half a file.
 * Share links use `renderCutPlanExport` with the plan they open.
 */
import { z } from 'zod';
import { describeFields, issuesToFields } from '../../shared/errors.js';
import {
  cutDiagramSvgs,
  cutListCsv,
  cutListRows,
  drawCutDiagrams,
  drawStencils,
  exportFileName,
  paperSlug,
  panelsDxf,
  parseStencilOptions,
  SHEET_PAPERS,
  stencilItemsFromBuild,
  type CutDiagramInput,
} from '../../shared/render/index.js';
import { AppError } from '../errors.js';
import { stockInfo } from '../modules/cut-plans/assemble.js';
import type { CutPlanExportSource } from '../modules/cut-plans/cut-plans.service.js';
import { PdfkitSink } from './pdfkit-sink.js';

export const EXPORT_KINDS = ['cut-diagrams.pdf', 'cut-diagrams.svg', 'cut-list.csv', 'panels.dxf', 'stencils.pdf'] as const;
export type ExportKind = (typeof EXPORT_KINDS)[number];

export interface ExportFile {
  fileName: string;
  contentType: string;
  body: Buffer | string;
}

type Query = Record<string, unknown>;

/** A query value as a number when it looks like one (so zod names the field when it does not). */
function num(v: unknown): unknown {
  if (typeof v !== 'string' || v.trim() === '') return v === '' ? undefined : v;
  const n = Number(v);
  return Number.isFinite(n) ? n : v;
}

function invalid(issues: readonly { path: PropertyKey[]; message: string }[]): AppError {
  const fields = issuesToFields(issues);
  return AppError.invalid(describeFields(fields), fields);
}

const diagramQuery = z.object({
  paper: z.enum(SHEET_PAPERS, { error: `paper must be one of ${SHEET_PAPERS.join(', ')}` }).default('A4'),
});
const svgQuery = z.object({
  sheet: z.number({ error: 'sheet must be a sheet number' }).int('sheet must be a whole number').min(1, 'sheet numbers start at 1').optional(),
});

function parse<T extends z.ZodType>(schema: T, query: Query): z.output<T> {
  const r = schema.safeParse(query);
  if (!r.success) throw invalid(r.error.issues.map((i) => ({ path: i.path as PropertyKey[], message: i.message })));
  return r.data;
}

function diagramInput(src: CutPlanExportSource): CutDiagramInput {
  return {
    title: `${src.buildName} — cut plan ${src.id}`,
    layouts: src.layouts,
    parts: src.parts,
    stock: stockInfo(src.stock),
    kerfMm: src.settings.kerfMm,
    ...(src.liningMassKg !== null ? { liningMassKg: src.liningMassKg } : {}),
    ...(src.currency ? { currency: src.currency } : {}),
  };
}

/** Fixed creation date: the plan's export is the same file every time it is downloaded. */
const PDF_DATE = new Date('2026-01-01T00:00:00Z');

/** Stacks the per-sheet SVGs (each in mm) into one document, one below the other with a gap. */
export function stackSvgs(svgs: readonly string[], title: string, gapMm = 20): string {
  const sizes = svgs.map((s) => {
    const m = /viewBox="0 0 ([\d.]+) ([\d.]+)"/.exec(s);
    if (!m) throw new Error('cut diagram SVG without a viewBox');
    return { w: Number(m[1]), h: Number(m[2]) };
  });
  const width = Math.max(...sizes.map((s) => s.w));
  const height = sizes.reduce((a, s) => a + s.h, 0) + gapMm * (svgs.length - 1);
  let y = 0;
  const groups = svgs.map((s, i) => {
    const inner = s
      .replace(/^<\?xml[^>]*>\s*/, '')
      .replace(/^<svg[^>]*>/, '')
      .replace(/<\/svg>\s*$/, '')
      .replace(/id="clip(\d+)"/g, `id="s${i + 1}-clip$1"`)
      .replace(/url\(#clip(\d+)\)/g, `url(#s${i + 1}-clip$1)`);
    const g = `<g transform="translate(0 ${Math.round(y * 1000) / 1000})">${inner}</g>`;
    y += sizes[i]!.h + gapMm;
    return g;
  });
  const esc = title.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]!);
  return `<?xml version="1.0" encoding="UTF-8"?>\n<svg xmlns="http://www.w3.org/2000/svg" width="${width}mm" height="${height}mm" viewBox="0 0 ${width} ${height}">\n<title>${esc}</title>\n${groups.join('\n')}\n</svg>\n`;
}

export async function renderCutPlanExport(src: CutPlanExportSource, kind: ExportKind, query: Query = {}): Promise<ExportFile> {
  const base = src.buildName;
  switch (kind) {
    case 'cut-diagrams.pdf': {
      const { paper } = parse(diagramQuery, query);
      const input = diagramInput(src);
      const sink = new PdfkitSink({ title: input.title, subject: 'Cut diagrams', creationDate: PDF_DATE });
      drawCutDiagrams(sink, input, paper);
      return { fileName: exportFileName(base, 'cut-diagrams'), contentType: 'application/pdf', body: await sink.finish() };
    }
    case 'cut-diagrams.svg': {
      const { sheet } = parse(svgQuery, { sheet: num(query.sheet) });
      const svgs = cutDiagramSvgs(diagramInput(src));
      if (svgs.length === 0) throw AppError.invalid('This cut plan has no sheets or rolls to draw.', { sheet: 'this cut plan has no sheets or rolls' });
      if (sheet !== undefined) {
        const one = svgs[sheet - 1];
        if (!one) throw AppError.invalid(`sheet: this plan has ${svgs.length} sheets and rolls`, { sheet: `this plan has ${svgs.length} sheets and rolls` });
        return { fileName: exportFileName(base, 'cut-diagram-svg', one.label), contentType: 'image/svg+xml; charset=utf-8', body: one.svg };
      }
      return { fileName: exportFileName(base, 'cut-diagram-svg', 'all'), contentType: 'image/svg+xml; charset=utf-8', body: stackSvgs(svgs.map((s) => s.svg), `${base} — cut diagrams`) };
    }
    case 'cut-list.csv': {
      const rows = cutListRows(src.layouts, src.parts, stockInfo(src.stock));
      return { fileName: exportFileName(base, 'cut-list'), contentType: 'text/csv; charset=utf-8', body: cutListCsv(rows) };
    }
    case 'panels.dxf':
      return { fileName: exportFileName(base, 'panels-dxf'), contentType: 'application/dxf', body: panelsDxf(src.exportCabinets.filter((c) => c.plan.panels.length > 0)) };
    case 'stencils.pdf': {
      const parsed = parseStencilOptions({
        paper: query.paper ?? 'A4',
        rollWidthMm: num(query.rollWidthMm),
        rollMaxLengthMm: num(query.rollMaxLengthMm),
        marginMm: num(query.marginMm),
        overlapMm: num(query.overlapMm),
      });
      if (!parsed.ok) throw AppError.invalid(parsed.message, parsed.fields);
      const items = stencilItemsFromBuild(src.exportCabinets);
      if (items.length === 0) throw AppError.invalid('This build has no lining pieces or driver cut-outs to print.', { paper: 'nothing to print' });
      const title = `${base} — stencils`;
      const sink = new PdfkitSink({ title, subject: 'Full-size stencils', creationDate: PDF_DATE });
      drawStencils(sink, items, parsed.options, title);
      return { fileName: exportFileName(base, 'stencils', paperSlug(parsed.options.paper)), contentType: 'application/pdf', body: await sink.finish() };
    }
  }
}
