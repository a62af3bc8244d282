import Papa from 'papaparse';
import { stockInput, type StockItemDto } from '../../../shared/schemas/api.schema.js';
import { parseCsvTable, safeCsvCell, type CsvTableSpec } from '../uploads/csv-table.js';

/** Our own stock CSV columns (export writes them; import reads them, in any order). */
export const STOCK_CSV_COLUMNS = ['kind', 'material', 'thickness_mm', 'width_mm', 'height_mm', 'length_mm', 'quantity', 'cost', 'grain', 'note'] as const;

const STOCK_CSV: CsvTableSpec<ReturnType<typeof stockInput.parse>> = {
  columns: STOCK_CSV_COLUMNS,
  required: ['kind', 'material', 'thickness_mm', 'width_mm'],
  numeric: ['thickness_mm', 'width_mm', 'height_mm', 'length_mm', 'quantity', 'cost'],
  lowercase: ['kind', 'grain'],
  fieldOf: {
    kind: 'kind',
    material: 'material',
    thickness_mm: 'thicknessMm',
    width_mm: 'widthMm',
    height_mm: 'heightMm',
    length_mm: 'lengthMm',
    quantity: 'quantity',
    cost: 'cost',
    grain: 'grain',
    note: 'note',
  },
  schema: stockInput,
  maxRows: 5000,
};

/** Parses a stock CSV with the same zod schema as the form; rows numbered as a spreadsheet shows them. */
export function parseStockCsv(text: string) {
  return parseCsvTable(text, STOCK_CSV);
}

/** The stock CSV (same columns as the import; empty quantity = unlimited, empty length = as much as needed). */
export function stockCsvText(items: StockItemDto[]): string {
  const data = items.map((s) => [
    s.kind,
    safeCsvCell(s.material),
    s.thicknessMm,
    s.widthMm,
    s.heightMm ?? '',
    s.lengthMm ?? '',
    s.quantity ?? '',
    s.cost ?? '',
    s.grain,
    safeCsvCell(s.note),
  ]);
  return Papa.unparse({ fields: [...STOCK_CSV_COLUMNS], data }, { newline: '\r\n' }) + '\r\n';
}
