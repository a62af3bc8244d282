import { createColumnHelper } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import type { DesignSummaryDto } from '../../../../shared/schemas/api.schema';
import { Button } from '../../../components/ui/button';
import { ConfirmDeleteDialog } from '../../../components/data-table/confirm-delete-dialog';
import { DataTable, rowActionsColumn, RowCount, useDataTable } from '../../../components/data-table/data-table';
import { Input } from '../../../components/ui/field';
import type { LengthUnit } from '../../../../shared/units/index';
import { formatDateTime, formatRelativeTime, formatSize } from '../../../lib/format';
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
  units = 'mm',
}: {
  workshopId: number;
  designs: DesignSummaryDto[];
  canEdit: boolean;
  designHref: (designId: number) => string;
  /** The user's length unit: sizes are shown in it, as on the design page. */
  units?: LengthUnit;
}) {
  const navigate = useNavigate();
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
          return <span className="whitespace-nowrap tabular-nums">{formatSize(d.widthMm, d.heightMm, d.depthMm, units)}</span>;
        },
      }),
      column.accessor('braceCount', {
        header: 'Braces',
        // Hidden on a tablet in portrait, so the names keep their width (the design page has the counts).
        meta: { numeric: true, className: 'hidden lg:table-cell' },
        cell: (info) => <span className="tabular-nums">{info.getValue()}</span>,
      }),
      column.accessor('openingCount', {
        header: 'Openings',
        // Hidden on a tablet in portrait, so the names keep their width (the design page has the counts).
        meta: { numeric: true, className: 'hidden lg:table-cell' },
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
      rowActionsColumn<DesignSummaryDto>((d) => (
        <>
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
              <Button size="sm" variant="ghostDanger" onClick={() => setDeleting(d)}>
                Delete
              </Button>
            </>
          ) : null}
        </>
      )),
    ],
    [canEdit, designHref, duplicate, navigate, units],
  );

  const table = useDataTable({
    data: designs,
    columns,
    initialSorting: [{ id: 'updatedAt', desc: true }],
    filterKey: filter,
    matches: (design) => matchesFilter(design, filter),
  });
  const shown = table.getRowModel().rows.length;

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
        <RowCount shown={shown} total={designs.length} noun="designs" />
      </div>
      <DataTable
        table={table}
        testId="designs-table"
        rowTestId="design-row"
        empty={designs.length === 0 ? 'No designs yet.' : 'No design matches that filter.'}
      />
      <ConfirmDeleteDialog
        item={deleting}
        title="Delete this design?"
        confirmLabel="Delete design"
        mutation={remove}
        onClose={() => setDeleting(null)}
        onDeleted={(design) => notify(`Deleted “${design.name}”.`, 'success')}
      >
        {(design) => (
          <p>
            <strong className="text-zinc-900">{design.name}</strong> will be deleted for everyone in the workshop. This
            cannot be undone.
          </p>
        )}
      </ConfirmDeleteDialog>
    </>
  );
}
