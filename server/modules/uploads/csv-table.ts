import Papa from 'papaparse';
import type { z } from 'zod';
import { issuesToFields } from '../../../shared/errors.js';
import type { CsvRowProblem } from '../../../shared/schemas/api.schema.js';

/** How one of our CSV files looks: its columns, which must have a value, which are numbers, and the row schema. */
export interface CsvTableSpec<T> {
  columns: readonly string[];
  required: readonly string[];
  /** Parsed as numbers ("2440", "2440.5"); an empty cell is null. */
  numeric: readonly string[];
  /** Compared in lower case (e.g. kind, grain). */
  lowercase?: readonly string[];
  /** Column → field of the row schema. */
  fieldOf: Readonly<Record<string, string>>;
  schema: z.ZodType<T>;
  maxRows: number;
}

export interface CsvTable<T> {
  rows: T[];
  problems: CsvRowProblem[];
}

function numberCell(raw: string): number | null | { reason: string } {
  const s = raw.trim();
  if (s === '') return null;
  if (!/^[+-]?(\d+(\.\d*)?|\.\d+)$/.test(s)) return { reason: `"${s.slice(0, 30)}" is not a number (use a dot for decimals)` };
  return Number(s);
}

const blank = (cells: string[]) => cells.every((c) => c.trim() === '');

/**
 * Parses a CSV file (papaparse) and checks every row with the spec's zod schema. Rows are numbered as a
 * spreadsheet shows them (the header is row 1); blank lines are skipped. Any problem → no rows are usable:
 * callers import nothing unless `problems` is empty.
 */
export function parseCsvTable<T>(text: string, spec: CsvTableSpec<T>): CsvTable<T> {
  const problems: CsvRowProblem[] = [];
  const rows: T[] = [];
  const lines = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { header: false, skipEmptyLines: false }).data;
  if (lines.length === 0 || blank(lines[0]!)) {
    return { rows, problems: [{ row: 1, column: '(header)', reason: `the file is empty; the first row must name the columns: ${spec.columns.join(', ')}` }] };
  }
  const header = lines[0]!.map((h) => h.trim().toLowerCase());
  const known = new Set(spec.columns);
  header.forEach((h, i) => {
    if (!known.has(h)) problems.push({ row: 1, column: h || `(column ${i + 1})`, reason: `unknown column; use ${spec.columns.join(', ')}` });
  });
  for (const col of spec.required) if (!header.includes(col)) problems.push({ row: 1, column: col, reason: 'required column is missing' });
  if (new Set(header).size !== header.length) problems.push({ row: 1, column: '(header)', reason: 'a column is named twice' });
  if (problems.length) return { rows, problems };

  const data = lines.slice(1);
  if (data.filter((l) => !blank(l)).length > spec.maxRows) {
    return { rows, problems: [{ row: 1, column: '(file)', reason: `at most ${spec.maxRows} rows per file` }] };
  }
  const columnOf = Object.fromEntries(Object.entries(spec.fieldOf).map(([c, f]) => [f, c]));
  data.forEach((cells, i) => {
    const row = i + 2;
    if (blank(cells)) return;
    if (cells.length !== header.length) {
      problems.push({ row, column: '(row)', reason: `has ${cells.length} cells, the header has ${header.length}` });
      return;
    }
    const values: Record<string, unknown> = {};
    const reported = new Set<string>();
    header.forEach((col, c) => {
      const raw = cells[c] ?? '';
      const field = spec.fieldOf[col] ?? col;
      if (spec.required.includes(col) && raw.trim() === '') {
        problems.push({ row, column: col, reason: 'a value is required' });
        reported.add(col);
      } else if (spec.numeric.includes(col)) {
        const n = numberCell(raw);
        if (n !== null && typeof n === 'object') {
          problems.push({ row, column: col, reason: n.reason });
          reported.add(col);
        } else values[field] = n;
      } else {
        const s = raw.trim();
        if (spec.lowercase?.includes(col)) {
          if (s !== '') values[field] = s.toLowerCase();
        } else values[field] = s;
      }
    });
    const parsed = spec.schema.safeParse(values);
    if (!parsed.success) {
      // Every problem of the row, once per column (a cell already reported as unreadable is not repeated).
      for (const [path, reason] of Object.entries(issuesToFields(parsed.error.issues))) {
        const column = columnOf[path] ?? path;
        if (!reported.has(column)) {
          problems.push({ row, column, reason });
          reported.add(column);
        }
      }
      return;
    }
    if (reported.size === 0) rows.push(parsed.data);
  });
  if (rows.length === 0 && problems.length === 0) problems.push({ row: 2, column: '(file)', reason: 'no rows below the header' });
  return { rows, problems };
}

/** Problems as the `fields` of a 400 answer: "row 3, width_mm" → reason. */
export function problemsToFields(problems: CsvRowProblem[]): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const p of problems) {
    const key = `row ${p.row}, ${p.column}`;
    if (!(key in fields)) fields[key] = p.reason;
  }
  return fields;
}

/** One line for the error message: "Nothing was imported: 2 rows have a problem. Row 3, width_mm: …". */
export function problemsMessage(problems: CsvRowProblem[]): string {
  const first = problems[0]!;
  const n = new Set(problems.map((p) => p.row)).size;
  return `Nothing was imported: ${n === 1 ? '1 row has' : `${n} rows have`} a problem. Row ${first.row}, ${first.column}: ${first.reason}.`;
}

/** Cells a spreadsheet would run as a formula get a leading ' (OWASP "CSV Injection"). */
export function safeCsvCell(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}
