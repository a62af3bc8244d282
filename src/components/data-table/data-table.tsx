/**
 * The workshop's list tables (designs, stock room): one TanStack table setup (sorting, one text/choice filter)
 * and one body (sortable header, rows, an optional detail row under a row, the empty row). Columns, the
 * toolbar and the row actions stay with each feature.
 *
 * Column `meta`: `{ numeric: true }` right-aligns a column (tabular figures); `{ className: 'hidden xl:table-cell' }`
 * hides it below a width (the tablet layout keeps the row's buttons in view).
 */
import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type Row,
  type SortingState,
  type Table,
  type TableOptions,
} from '@tanstack/react-table';
import { Fragment, useState, type ReactNode } from 'react';
import { cn } from '../../lib/cn';
import { columnClassName, isNumericColumn, SortableTableHead } from '../ui/table-head';

export interface DataTableOptions<T> {
  data: T[];
  columns: TableOptions<T>['columns'];
  /** The order before the person picks a column (none: the server's order). */
  initialSorting?: SortingState;
  /**
   * Everything the filter depends on, as one string (e.g. `sheet|birch`): rows are filtered again only when it
   * changes. An empty string shows every row.
   */
  filterKey: string;
  /** Whether a row stays in view under the current filter. */
  matches: (item: T) => boolean;
}

/** A sortable, filterable TanStack table over `data`. */
export function useDataTable<T>({ data, columns, initialSorting = [], filterKey, matches }: DataTableOptions<T>): Table<T> {
  const [sorting, setSorting] = useState<SortingState>(initialSorting);
  return useReactTable({
    data,
    columns,
    state: { sorting, globalFilter: filterKey },
    onSortingChange: setSorting,
    globalFilterFn: (row) => matches(row.original),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
}

/** The last column: the row's buttons, right-aligned, under a header only screen readers read ("Actions"). */
export function rowActionsColumn<T>(render: (item: T) => ReactNode): ColumnDef<T, unknown> {
  return {
    id: 'actions',
    header: () => <span className="sr-only">Actions</span>,
    cell: (info) => <div className="flex justify-end gap-1">{render(info.row.original)}</div>,
  };
}

/** "12 designs", or "3 of 12 designs" while a filter hides some; read out when it changes. */
export function RowCount({ shown, total, noun, className }: { shown: number; total: number; noun: string; className?: string }) {
  return (
    <p className={cn('text-sm text-zinc-500', className)} aria-live="polite">
      {shown === total ? `${total} ${noun}` : `${shown} of ${total} ${noun}`}
    </p>
  );
}

export function DataTable<T>({
  table,
  testId,
  rowTestId,
  cellClassName = 'px-5 py-2.5',
  empty,
  renderDetail,
}: {
  table: Table<T>;
  testId: string;
  rowTestId: string;
  /** Padding of header and body cells. */
  cellClassName?: string;
  /** Said across the table when no row is shown (none at all, or none matching the filter). */
  empty: ReactNode;
  /** Content of a full-width row under `row` (e.g. its history), or null for none. */
  renderDetail?: (row: Row<T>) => ReactNode;
}) {
  const rows = table.getRowModel().rows;
  const columnCount = table.getAllLeafColumns().length;
  return (
    <div className="overflow-x-auto rounded-xl border border-zinc-200 bg-white shadow-xs">
      <table className="w-full text-sm" data-testid={testId}>
        <SortableTableHead table={table} cellClassName={cellClassName} />
        <tbody className="divide-y divide-zinc-100">
          {rows.map((row) => {
            const detail = renderDetail?.(row);
            return (
              <Fragment key={row.id}>
                <tr className="hover:bg-zinc-50/70" data-testid={rowTestId}>
                  {row.getVisibleCells().map((cell) => {
                    const meta = cell.column.columnDef.meta;
                    return (
                      <td key={cell.id} className={cn(cellClassName, 'text-zinc-700', isNumericColumn(meta) && 'text-right tabular-nums', columnClassName(meta))}>
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    );
                  })}
                </tr>
                {detail ? (
                  <tr className="bg-zinc-50/60">
                    <td colSpan={columnCount} className="px-6 py-3">
                      {detail}
                    </td>
                  </tr>
                ) : null}
              </Fragment>
            );
          })}
          {rows.length === 0 ? (
            <tr>
              <td colSpan={columnCount} className="px-5 py-10 text-center text-zinc-500">
                {empty}
              </td>
            </tr>
          ) : null}
        </tbody>
      </table>
    </div>
  );
}
