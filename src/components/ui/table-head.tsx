import { flexRender, type Table } from '@tanstack/react-table';
import { cn } from '../../lib/cn';

/** Whether a column is right-aligned (`meta: { numeric: true }` in its definition). */
export function isNumericColumn(meta: unknown): boolean {
  return Boolean((meta as { numeric?: boolean } | undefined)?.numeric);
}

/** Extra classes for a column's header and cells (`meta: { className: 'hidden xl:table-cell' }` hides it on a tablet). */
export function columnClassName(meta: unknown): string | undefined {
  return (meta as { className?: string } | undefined)?.className;
}

/** The header of a TanStack table: sortable columns are buttons, and `aria-sort` tells the order. */
export function SortableTableHead<T>({ table, cellClassName = 'px-5 py-2.5' }: { table: Table<T>; cellClassName?: string }) {
  return (
    <thead className="border-b border-zinc-200 bg-zinc-50 text-left text-[13px] text-zinc-500">
      {table.getHeaderGroups().map((group) => (
        <tr key={group.id}>
          {group.headers.map((header) => {
            const sorted = header.column.getIsSorted();
            const numeric = isNumericColumn(header.column.columnDef.meta);
            return (
              <th
                key={header.id}
                scope="col"
                aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                className={cn(
                  cellClassName,
                  'font-normal whitespace-nowrap',
                  numeric && 'text-right',
                  columnClassName(header.column.columnDef.meta),
                )}
              >
                {header.column.getCanSort() ? (
                  <button
                    type="button"
                    onClick={header.column.getToggleSortingHandler()}
                    className={cn('relative inline-flex items-center gap-1 rounded hover:text-zinc-900', sorted && 'text-zinc-900')}
                  >
                    {flexRender(header.column.columnDef.header, header.getContext())}
                    {/* A numeric header's arrow hangs to the left of its words, so the words end where the figures end. */}
                    <span aria-hidden="true" className={cn('w-3 text-xs text-zinc-400', numeric && 'absolute top-1/2 right-full mr-1 -translate-y-1/2 text-right')}>
                      {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : ''}
                    </span>
                  </button>
                ) : (
                  flexRender(header.column.columnDef.header, header.getContext())
                )}
              </th>
            );
          })}
        </tr>
      ))}
    </thead>
  );
}
