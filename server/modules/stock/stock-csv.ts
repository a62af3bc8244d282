import Papa from 'papaparse';
import { issuesToFields } from '../../../shared/errors.js';
import { stockInput, type CsvRowProblem, type StockItemDto, type StockValues } from '../../../shared/schemas/api.schema.js';

/** Our own stock CSV columns (export writes them; import reads them, in any order). */
export const STOCK_CSV_COLUMNS = ['kind', 'material', 'thickness_mm', 'width_mm', 'height_mm', 'length_mm', 'quantity', 'cost', 'grain', 'note'] as const;
type Column = (typeof STOCK_CSV_COLUMNS)[number];
const REQUIRED: Column[] = ['kind', 'material', 'thickness_mm', 'width_mm'];
const NUMERIC: Partial<Record<Column, keyof StockValues>> = {
  thickness_mm: 'thicknessMm',
  width_mm: 'widthMm',
  height_mm: 'heightMm',
  length_mm: 'lengthMm',
  quantity: 'quantity',
  cost: 'cost',
};
const FIELD_TO_COLUMN: Record<string, Column> = {
  kind: 'kind',
  material: 'material',
  thicknessMm: 'thickness_mm',
  widthMm: 'width_mm',
  heightMm: 'height_mm',
  lengthMm: 'length_mm',
  quantity: 'quantity',
  cost: 'cost',
  grain: 'grain',
  note: 'note',
};
const FIELD_TO_COLUMN_INVERSE = Object.fromEntries(Object.entries(FIELD_TO_COLUMN).map(([f, c]) => [c, f])) as Record<Column, string>;
export const STOCK_CSV_MAX_ROWS = 5000;

export interface ParsedStockCsv {
  rows: StockValues[];
  problems: CsvRowProblem[];
}

/** A number cell: empty → null; "2440" or "2440.5" → number; anything else → a reason. */
function numberCell(raw: string): number | null | { reason: string } {
  const s = raw.trim();
  if (s === '') return null;
  if (!/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(s)) return { reason: `"${s.slice(0, 30)}" is not a number (use a dot for decimals)` };
  return Number(s);
}

/**
 * Parses a stock CSV (papaparse) and checks every row with the same zod schema as the form. Rows are
 * numbered as a spreadsheet shows them (the header is row 1). Blank lines are skipped.
 */
export function parseStockCsv(text: string): ParsedStockCsv {
  const problems: CsvRowProblem[] = [];
  const rows: StockValues[] = [];
  const clean = text.replace(/^\uFEFF/, '');
  const result = Papa.parse<string[]>(clean, { header: false, skipEmptyLines: false });
  const lines = result.data;
  if (lines.length === 0 || lines[0]!.every((c) => c.trim() === '')) {
    return { rows, problems: [{ row: 1, column: '(header)', reason: `the file is empty; the first row must name the columns: ${STOCK_CSV_COLUMNS.join(', ')}` }] };
  }
  const header = lines[0]!.map((h) => h.trim().toLowerCase());
  const known = new Set<string>(STOCK_CSV_COLUMNS);
  header.forEach((h, i) => {
    if (!known.has(h)) problems.push({ row: 1, column: h || `(column ${i + 1})`, reason: `unknown column; use ${STOCK_CSV_COLUMNS.join(', ')}` });
  });
  for (const col of REQUIRED) if (!header.includes(col)) problems.push({ row: 1, column: col, reason: 'required column is missing' });
  if (new Set(header).size !== header.length) problems.push({ row: 1, column: '(header)', reason: 'a column is named twice' });
  if (problems.length) return { rows, problems };

  const dataLines = lines.slice(1);
  if (dataLines.filter((l) => !l.every((c) => c.trim() === '')).length > STOCK_CSV_MAX_ROWS) {
    return { rows, problems: [{ row: 1, column: '(file)', reason: `at most ${STOCK_CSV_MAX_ROWS} rows per file` }] };
  }
  dataLines.forEach((cells, i) => {
    const row = i + 2;
    if (cells.every((c) => c.trim() === '')) return;
    if (cells.length !== header.length) {
      problems.push({ row, column: '(row)', reason: `has ${cells.length} cells, the header has ${header.length}` });
      return;
    }
    const values: Record<string, unknown> = {};
    let bad = false;
    header.forEach((col, c) => {
      const raw = cells[c] ?? '';
      const field = FIELD_TO_COLUMN_INVERSE[col as Column];
      if (REQUIRED.includes(col as Column) && raw.trim() === '') {
        problems.push({ row, column: col, reason: 'a value is required' });
        bad = true;
      } else if (col in NUMERIC) {
        const n = numberCell(raw);
        if (n !== null && typeof n === 'object') {
          problems.push({ row, column: col, reason: n.reason });
          bad = true;
        } else if (n !== null) values[field] = n;
        else if (col === 'height_mm' || col === 'length_mm' || col === 'quantity' || col === 'cost') values[field] = null;
      } else {
        const s = raw.trim();
        if (col === 'kind' || col === 'grain') {
          if (s !== '') values[field] = s.toLowerCase();
        } else values[field] = s;
      }
    });
    const parsed = stockInput.safeParse(values);
    if (!parsed.success) {
      // Every problem of the row, once per column (a cell already reported as unreadable is not repeated).
      const reported = new Set(problems.filter((p) => p.row === row).map((p) => p.column));
      const fields = issuesToFields(parsed.error.issues);
      for (const [path, reason] of Object.entries(fields)) {
        const column = FIELD_TO_COLUMN[path] ?? path;
        if (!reported.has(column)) problems.push({ row, column, reason });
      }
      return;
    }
    if (!bad) rows.push(parsed.data);
  });
  if (rows.length === 0 && problems.length === 0) problems.push({ row: 2, column: '(file)', reason: 'no stock rows below the header' });
  return { rows, problems };
}

/** Cells a spreadsheet would run as a formula are prefixed with ' (OWASP "CSV Injection"). */
function safeCell(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

/** The stock CSV (same columns as the import; empty quantity = unlimited). */
export function stockCsvText(items: StockItemDto[]): string {
  const data = items.map((s) => [
    s.kind,
    safeCell(s.material),
    s.thicknessMm,
    s.widthMm,
    s.heightMm ?? '',
    s.lengthMm ?? '',
    s.quantity ?? '',
    s.cost ?? '',
    s.grain,
    safeCell(s.note),
  ]);
  return Papa.unparse({ fields: [...STOCK_CSV_COLUMNS], data }, { newline: '\r\n' }) + '\r\n';
}
