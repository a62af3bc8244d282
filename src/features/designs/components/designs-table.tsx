import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import type { DesignSummaryDto } from '../../../../shared/schemas/api.schema';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/dialog';
import { Input } from '../../../components/ui/field';
import { SortableTableHead, columnClassName, isNumericColumn } from '../../../components/ui/table-head';
import { cn } from '../../../lib/cn';
import { formatDateTime, formatRelativeTime, formatSizeMm } from '../../../lib/format';
import { notify } from '../../../lib/notify';
import { useDeleteDesign } from '../api/delete-design';
import { useDuplicateDesign } from '../api/duplicate-design';

const column = createColumnHelper<DesignSummaryDto>();

/** What the text filter looks at: the name and who changed it last. */
function matchesFilter(design: DesignSummaryDto, filter: string): boolean {
  const needle = filter.trim().toLowerCase();
  if (!needle) return true;
  return design.name.toLowerCase().includes(needle) || (design.updatedBy ?? '').toLowerCase().includes(needle);
}

export function DesignsTable({
  workshopId,
  designs,
  canEdit,
  designHref,
}: {
  workshopId: number;
  designs: DesignSummaryDto[];
  canEdit: boolean;
  designHref: (designId: number) => string;
}) {
  const navigate = useNavigate();
  const [sorting, setSorting] = useState<SortingState>([{ id: 'updatedAt', desc: true }]);
  const [filter, setFilter] = useState('');
  const [deleting, setDeleting] = useState<DesignSummaryDto | null>(null);
  const duplicate = useDuplicateDesign(workshopId);
  const remove = useDeleteDesign(workshopId);

  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Name',
        cell: (info) => (
          <Link to={designHref(info.row.original.id)} className="font-bold text-zinc-900 hover:text-accent-700 hover:underline">
            {info.getValue()}
          </Link>
        ),
      }),
      column.accessor((d) => d.widthMm * d.heightMm * d.depthMm, {
        id: 'size',
        header: 'Outer size (W × H × D)',
        cell: (info) => {
          const d = info.row.original;
          return <span className="whitespace-nowrap tabular-nums">{formatSizeMm(d.widthMm, d.heightMm, d.depthMm)}</span>;
        },
      }),
      column.accessor('braceCount', {
        header: 'Braces',
        meta: { numeric: true },
        cell: (info) => <span className="tabular-nums">{info.getValue()}</span>,
      }),
      column.accessor('openingCount', {
        header: 'Openings',
        meta: { numeric: true },
        cell: (info) => <span className="tabular-nums">{info.getValue()}</span>,
      }),
      column.accessor((d) => Date.parse(d.updatedAt), {
        id: 'updatedAt',
        header: 'Updated',
        // Hidden on a tablet so the row's buttons stay in view.
        meta: { className: 'hidden xl:table-cell' },
        cell: (info) => {
          const d = info.row.original;
          return (
            <span title={formatDateTime(d.updatedAt)} className="block leading-snug whitespace-nowrap">
              <span className="block text-zinc-800">{formatRelativeTime(d.updatedAt)}</span>
              {d.updatedBy ? <span className="block text-[13px] text-zinc-500">by {d.updatedBy}</span> : null}
            </span>
          );
        },
      }),
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: (info) => {
          const d = info.row.original;
          return (
            <div className="flex justify-end gap-1">
              <Button size="sm" variant="ghost" onClick={() => navigate(designHref(d.id))}>
                Open
              </Button>
              {canEdit ? (
                <>
                  <Button
                    size="sm"
                    variant="ghost"
                    busy={duplicate.isPending && duplicate.variables === d.id}
                    onClick={() =>
                      duplicate.mutate(d.id, {
                        onSuccess: (copy) => notify(`Made a copy: “${copy.name}”.`, 'success'),
                      })
                    }
                  >
                    Duplicate
                  </Button>
                  <Button
                    size="sm"
                    variant="ghost"
                    className="text-red-700 hover:bg-red-50 hover:text-red-800"
                    onClick={() => setDeleting(d)}
                  >
                    Delete
                  </Button>
                </>
              ) : null}
            </div>
          );
        },
      }),
    ],
    [canEdit, designHref, duplicate, navigate],
  );

  const table = useReactTable({
    data: designs,
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    globalFilterFn: (row, _columnId, value: string) => matchesFilter(row.original, value),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });

  const rows = table.getRowModel().rows;

  return (
    <>
      <div className="mb-3 flex items-center justify-between gap-4">
        <div className="w-80">
          <Input
            type="search"
            placeholder="Filter by name or person"
            aria-label="Filter designs"
            value={filter}
            onChange={(event) => setFilter(event.target.value)}
          />
        </div>
        <p className="text-sm text-zinc-500" aria-live="polite">
          {rows.length === designs.length ? `${designs.length} designs` : `${rows.length} of ${designs.length} designs`}
        </p>
      </div>
      <div className="overflow-x-auto rounded-xl border border-zinc-200 bg-white shadow-xs">
        <table className="w-full text-sm" data-testid="designs-table">
          <SortableTableHead table={table} />
          <tbody className="divide-y divide-zinc-100">
            {rows.map((row) => (
              <tr key={row.id} className="hover:bg-zinc-50/70" data-testid="design-row">
                {row.getVisibleCells().map((cell) => {
                  const meta = cell.column.columnDef.meta;
                  return (
                    <td key={cell.id} className={cn('px-5 py-2.5 text-zinc-700', isNumericColumn(meta) && 'text-right', columnClassName(meta))}>
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  );
                })}
              </tr>
            ))}
            {rows.length === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-5 py-10 text-center text-zinc-500">
                  {designs.length === 0 ? 'No designs yet.' : 'No design matches that filter.'}
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
      <ConfirmDialog
        open={deleting !== null}
        title="Delete this design?"
        confirmLabel="Delete design"
        tone="danger"
        busy={remove.isPending}
        error={remove.error?.message}
        onCancel={() => {
          setDeleting(null);
          remove.reset();
        }}
        onConfirm={() =>
          deleting &&
          remove.mutate(deleting.id, {
            onSuccess: () => {
              notify(`Deleted “${deleting.name}”.`, 'success');
              setDeleting(null);
            },
          })
        }
      >
        {deleting ? (
          <p>
            <strong className="text-zinc-900">{deleting.name}</strong> will be deleted for everyone in the workshop. This
            cannot be undone.
          </p>
        ) : null}
      </ConfirmDialog>
    </>
  );
}
