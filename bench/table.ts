/** Prints rows of plain objects as an aligned text table (the bench's output format). */
export type BenchRow = Record<string, string | number | boolean | null | undefined>;

export interface BenchTable {
  title: string;
  rows: BenchRow[];
  /** Lines printed under the table: targets, verdicts, notes. */
  notes?: string[];
}

function cell(v: BenchRow[string]): string {
  if (v === null || v === undefined) return '';
  if (typeof v === 'number') return Number.isInteger(v) ? String(v) : v.toFixed(Math.abs(v) >= 100 ? 1 : 3);
  return String(v);
}

export function formatTable(table: BenchTable): string {
  const cols = [...new Set(table.rows.flatMap((r) => Object.keys(r)))];
  const widths = cols.map((c) => Math.max(c.length, ...table.rows.map((r) => cell(r[c]).length)));
  const line = (vals: string[]) => vals.map((v, i) => v.padEnd(widths[i]!)).join('  ').trimEnd();
  const out = [`## ${table.title}`, line(cols), line(widths.map((w) => '-'.repeat(w)))];
  for (const r of table.rows) out.push(line(cols.map((c) => cell(r[c]))));
  for (const n of table.notes ?? []) out.push(n);
  return out.join('\n');
}

export function printTable(table: BenchTable): void {
  console.log(`\n${formatTable(table)}`);
}
