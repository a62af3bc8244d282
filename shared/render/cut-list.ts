/**
 * The cut list (one row per part per sheet) and the material totals of a cut plan, and the CSV file
 * (RFC 4180, written by papaparse's unparse: CRLF line ends, fields with commas, quotes or line
 * breaks quoted, quotes doubled; cells that a spreadsheet would run as a formula are escaped).
 */
import Papa from 'papaparse';
import type { Layout, LayoutSheet } from '../schemas/nest.schema.js';
import type { PanelGrain } from '../schemas/plan.types.js';
import type { CutPart } from './build.js';

/** What the totals need to know about a stock item. */
export interface StockInfo {
  id: string;
  kind?: 'sheet' | 'remnant' | 'roll';
  /** Per sheet, or per metre for a roll. */
  cost?: number;
  trim?: number;
  material?: string;
  thickness?: number;
  grain?: 'none' | 'length';
}

/** A sheet of a layout with the number a person reads: "1", "2" for sheets and remnants, "roll 1" for rolls. */
export interface NumberedSheet {
  sheet: LayoutSheet;
  kind: 'sheet' | 'remnant' | 'roll';
  label: string;
}

export function numberSheets(layouts: readonly Layout[], stock: readonly StockInfo[] = []): NumberedSheet[] {
  let sheets = 0;
  let rolls = 0;
  const out: NumberedSheet[] = [];
  for (const layout of layouts) {
    for (const sheet of layout.sheets) {
      const kind = sheet.kind ?? stock.find((s) => s.id === sheet.stockId)?.kind ?? 'sheet';
      out.push({ sheet, kind, label: kind === 'roll' ? `roll ${++rolls}` : String(++sheets) });
    }
  }
  return out;
}

export function grainWords(grain: PanelGrain): string {
  return grain === 'none' ? 'none' : `along ${grain}`;
}

export interface CutListRow {
  part: string;
  cabinet: string;
  widthMm: number;
  heightMm: number;
  thicknessMm: number;
  quantity: number;
  grain: string;
  material: string;
  /** Sheet label, "not placed", or "not in this plan". */
  sheet: string;
  partId: string;
}

/** One row per part and sheet, in sheet order; parts left over come last. */
export function cutListRows(layouts: readonly Layout[], parts: readonly CutPart[], stock: readonly StockInfo[] = []): CutListRow[] {
  const byId = new Map(parts.map((p) => [p.id, p]));
  const rows: CutListRow[] = [];
  const row = (p: CutPart, quantity: number, sheet: string): CutListRow => ({
    part: p.name,
    cabinet: p.cabinet,
    widthMm: p.widthMm,
    heightMm: p.heightMm,
    thicknessMm: p.thicknessMm,
    quantity,
    grain: grainWords(p.grain),
    material: p.material,
    sheet,
    partId: p.id,
  });
  const seen = new Set<string>();
  for (const { sheet, label } of numberSheets(layouts, stock)) {
    const counts = new Map<string, number>();
    for (const pl of sheet.placements) counts.set(pl.partId, (counts.get(pl.partId) ?? 0) + 1);
    for (const p of parts) {
      const n = counts.get(p.id);
      if (n) {
        rows.push(row(p, n, label));
        seen.add(p.id);
      }
    }
    for (const id of counts.keys()) if (!byId.has(id)) throw new Error(`layout places part "${id}", which is not in the parts list`);
  }
  const unplaced = new Map<string, number>();
  for (const layout of layouts) for (const u of layout.unplaced) unplaced.set(u.partId, (unplaced.get(u.partId) ?? 0) + u.quantity);
  for (const p of parts) {
    const n = unplaced.get(p.id);
    if (n) rows.push(row(p, n, 'not placed'));
    else if (!seen.has(p.id)) rows.push(row(p, p.quantity, 'not in this plan'));
  }
  return rows;
}

export const CUT_LIST_HEADER = ['part', 'cabinet', 'width_mm', 'height_mm', 'thickness_mm', 'quantity', 'grain', 'material', 'sheet'] as const;

/** The cut list as CSV text. */
export function cutListCsv(rows: readonly CutListRow[]): string {
  const data = rows.map((r) => [r.part, r.cabinet, r.widthMm, r.heightMm, r.thicknessMm, r.quantity, r.grain, r.material, r.sheet]);
  return `${Papa.unparse({ fields: [...CUT_LIST_HEADER], data }, { newline: '\r\n', escapeFormulae: true })}\r\n`;
}

export interface StockUse {
  stockId: string;
  kind: 'sheet' | 'remnant' | 'roll';
  widthMm: number;
  /** Sheets and remnants: the sheet's height. */
  heightMm?: number;
  /** Sheets and remnants used. */
  count: number;
  /** Rolls: length used. */
  lengthMm: number;
  /** null when the stock has no price. */
  cost: number | null;
  material?: string;
  thickness?: number;
}

export interface MaterialTotals {
  stock: StockUse[];
  sheetsUsed: number;
  remnantsUsed: number;
  rollLengthMm: number;
  /** Sum of known costs; null when no stock item used has a price. */
  cost: number | null;
  /** True when some stock used has no price (the cost is then a lower figure). */
  costIncomplete: boolean;
  partsPlaced: number;
  partsUnplaced: number;
  /** What found no place, and why when the layout says. */
  unplaced: { partId: string; quantity: number; reason?: string }[];
  /** Part area / stock area used, 0..1. */
  utilisation: number;
  liningMassKg?: number;
  /**
   * No layout of these parts can use fewer new sheets (the engine's lower bounds, summed over the
   * panel groups). Only when every part is placed and the bound is known (the sheets objective).
   */
  sheetsLowerBound?: number;
}

/** Σ of the layouts' lower bounds, when it says something: every part placed and a bound known. */
export function sheetsLowerBound(layouts: readonly Layout[]): number | undefined {
  let lb = 0;
  for (const l of layouts) {
    if (l.unplaced.some((u) => u.quantity > 0)) return undefined;
    if (l.sheets.some((s) => s.kind !== 'roll') && !(l.stats.lowerBound && l.stats.lowerBound > 0)) return undefined;
    lb += l.stats.lowerBound ?? 0;
  }
  return lb > 0 ? lb : undefined;
}

export function placedArea(sheet: LayoutSheet): number {
  return sheet.placements.reduce((a, p) => a + p.width * p.height, 0);
}

/** Sheets, roll length, cost and lining weight of a cut plan. */
export function materialTotals(layouts: readonly Layout[], stock: readonly StockInfo[] = [], liningMassKg?: number): MaterialTotals {
  const uses = new Map<string, StockUse>();
  let partArea = 0;
  let stockArea = 0;
  for (const { sheet, kind } of numberSheets(layouts, stock)) {
    const info = stock.find((s) => s.id === sheet.stockId);
    const key = `${sheet.stockId}|${kind}|${sheet.width}|${kind === 'roll' ? '' : sheet.height}`;
    let use = uses.get(key);
    if (!use) {
      use = {
        stockId: sheet.stockId,
        kind,
        widthMm: sheet.width,
        ...(kind === 'roll' ? {} : { heightMm: sheet.height }),
        count: 0,
        lengthMm: 0,
        cost: info?.cost === undefined ? null : 0,
        ...(info?.material !== undefined ? { material: info.material } : {}),
        ...(info?.thickness !== undefined ? { thickness: info.thickness } : {}),
      };
      uses.set(key, use);
    }
    use.count += 1;
    if (kind === 'roll') use.lengthMm += sheet.height;
    if (use.cost !== null && info?.cost !== undefined) use.cost += kind === 'roll' ? (info.cost * sheet.height) / 1000 : info.cost;
    partArea += placedArea(sheet);
    stockArea += sheet.width * sheet.height;
  }
  const list = [...uses.values()];
  const priced = list.filter((u) => u.cost !== null);
  const totals: MaterialTotals = {
    stock: list,
    sheetsUsed: list.filter((u) => u.kind === 'sheet').reduce((a, u) => a + u.count, 0),
    remnantsUsed: list.filter((u) => u.kind === 'remnant').reduce((a, u) => a + u.count, 0),
    rollLengthMm: list.filter((u) => u.kind === 'roll').reduce((a, u) => a + u.lengthMm, 0),
    cost: priced.length ? priced.reduce((a, u) => a + u.cost!, 0) : null,
    costIncomplete: priced.length > 0 && priced.length < list.length,
    partsPlaced: layouts.reduce((a, l) => a + l.sheets.reduce((b, s) => b + s.placements.length, 0), 0),
    partsUnplaced: layouts.reduce((a, l) => a + l.unplaced.reduce((b, u) => b + u.quantity, 0), 0),
    unplaced: layouts.flatMap((l) => l.unplaced),
    utilisation: stockArea > 0 ? partArea / stockArea : 0,
  };
  if (liningMassKg !== undefined) totals.liningMassKg = liningMassKg;
  const lb = sheetsLowerBound(layouts);
  if (lb !== undefined) totals.sheetsLowerBound = lb;
  return totals;
}
