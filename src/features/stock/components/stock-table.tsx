import { createColumnHelper } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { money } from '../../../../shared/render/cut-diagram';
import type { StockItemDto, StockKind } from '../../../../shared/schemas/api.schema';
import { HistoryList } from '../../../components/history/history-list';
import { Button } from '../../../components/ui/button';
import { ConfirmDeleteDialog } from '../../../components/data-table/confirm-delete-dialog';
import { DataTable, rowActionsColumn, RowCount, useDataTable } from '../../../components/data-table/data-table';
import { Input } from '../../../components/ui/field';
import { cn } from '../../../lib/cn';
import { formatNumber, formatRelativeTime } from '../../../lib/format';
import { useDeleteStockItem } from '../api/stock';

const column = createColumnHelper<StockItemDto>();
const KIND_LABELS: Record<StockKind, string> = { sheet: 'Sheet', remnant: 'Remnant', roll: 'Roll' };
const KIND_FILTERS: Array<{ value: StockKind | 'all'; label: string }> = [
  { value: 'all', label: 'All' },
  { value: 'sheet', label: 'Sheets' },
  { value: 'remnant', label: 'Remnants' },
  { value: 'roll', label: 'Rolls' },
];

export function stockSize(s: StockItemDto): string {
  if (s.kind === 'roll') return `${formatNumber(s.widthMm)} mm wide × ${s.lengthMm === null ? 'any length' : `${formatNumber(s.lengthMm / 1000, 2)} m`}`;
  return `${formatNumber(s.widthMm)} × ${formatNumber(s.heightMm ?? 0)} mm`;
}

function matches(s: StockItemDto, kind: StockKind | 'all', text: string): boolean {
  if (kind !== 'all' && s.kind !== kind) return false;
  const needle = text.trim().toLowerCase();
  return !needle || `${s.material} ${s.note} ${s.thicknessMm} mm`.toLowerCase().includes(needle);
}

/** Sheets, remnants and rolls with sort and filter; edit, delete and history per row. */
/** `currency`: the workshop's ISO 4217 code shown after prices (none: plain numbers). */
export function StockTable({ workshopId, items, canManage, onEdit, currency }: { workshopId: number; items: StockItemDto[]; canManage: boolean; onEdit: (item: StockItemDto) => void; currency?: string | null }) {
  const [kind, setKind] = useState<StockKind | 'all'>('all');
  const [text, setText] = useState('');
  const [open, setOpen] = useState<number | null>(null);
  const [deleting, setDeleting] = useState<StockItemDto | null>(null);
  const remove = useDeleteStockItem(workshopId);

  const columns = useMemo(
    () => [
      // On a tablet, kind and grain move under the material so the row's buttons stay in view.
      column.accessor('kind', { header: 'Kind', meta: { className: 'hidden lg:table-cell' }, cell: (i) => KIND_LABELS[i.getValue()] }),
      column.accessor('material', {
        header: 'Material',
        cell: (i) => (
          <>
            <span className="font-bold text-zinc-900">{i.getValue()}</span>
            <span className="block text-xs text-zinc-500 lg:hidden">
              {KIND_LABELS[i.row.original.kind]}
              {i.row.original.grain === 'length' ? ' · grain along the length' : ''}
            </span>
          </>
        ),
      }),
      column.accessor('thicknessMm', { header: 'Thickness', meta: { numeric: true }, cell: (i) => `${formatNumber(i.getValue())} mm` }),
      column.accessor((s) => s.widthMm * (s.heightMm ?? s.lengthMm ?? 0), { id: 'size', header: 'Size', cell: (i) => <span className="whitespace-nowrap tabular-nums">{stockSize(i.row.original)}</span> }),
      column.accessor((s) => s.quantity ?? Number.POSITIVE_INFINITY, {
        id: 'quantity',
        header: 'Quantity',
        meta: { numeric: true },
        cell: (i) => (i.row.original.quantity === null ? <span title="Unlimited">∞</span> : i.row.original.quantity),
      }),
      column.accessor((s) => s.cost ?? -1, {
        id: 'cost',
        header: 'Cost',
        meta: { numeric: true },
        cell: (i) => (
          <span className="whitespace-nowrap">{i.row.original.cost === null ? '—' : `${money(i.row.original.cost, currency)}${i.row.original.kind === 'roll' ? ' /m' : ''}`}</span>
        ),
      }),
      column.accessor('grain', { header: 'Grain', meta: { className: 'hidden lg:table-cell' }, cell: (i) => (i.getValue() === 'length' ? 'Along the length' : 'None') }),
      column.accessor((s) => Date.parse(s.updatedAt), {
        id: 'updatedAt',
        header: 'Updated',
        // On a tablet the row's History button tells who changed it; the column makes room for the actions.
        meta: { className: 'hidden xl:table-cell' },
        cell: (i) => (
          <span className="block text-[13px] leading-snug whitespace-nowrap text-zinc-500">
            {formatRelativeTime(i.row.original.updatedAt)}
            {i.row.original.updatedBy ? <span className="block">by {i.row.original.updatedBy}</span> : null}
          </span>
        ),
      }),
      rowActionsColumn<StockItemDto>((s) => (
        <>
          <Button size="sm" variant="ghost" aria-expanded={open === s.id} onClick={() => setOpen(open === s.id ? null : s.id)}>
            History
          </Button>
          {canManage ? (
            <>
              <Button size="sm" variant="ghost" onClick={() => onEdit(s)}>
                Edit
              </Button>
              <Button size="sm" variant="ghostDanger" onClick={() => setDeleting(s)}>
                Delete
              </Button>
            </>
          ) : null}
        </>
      )),
    ],
    [canManage, onEdit, open, currency],
  );

  const table = useDataTable({ data: items, columns, filterKey: `${kind}|${text}`, matches: (s) => matches(s, kind, text) });
  const shown = table.getRowModel().rows.length;

  return (
    <>
      <div className="mb-3 flex flex-wrap items-center gap-3">
        <div role="group" aria-label="Kind" className="inline-flex rounded-md border border-zinc-300 bg-white p-0.5">
          {KIND_FILTERS.map((f) => (
            <button
              key={f.value}
              type="button"
              aria-pressed={kind === f.value}
              onClick={() => setKind(f.value)}
              className={cn('rounded px-3 py-1 text-sm', kind === f.value ? 'bg-accent-600 text-white' : 'text-zinc-700 hover:bg-zinc-100')}
            >
              {f.label}
            </button>
          ))}
        </div>
        <div className="w-full sm:w-72">
          <Input type="search" placeholder="Filter by material, thickness or note" aria-label="Filter stock" value={text} onChange={(e) => setText(e.target.value)} />
        </div>
        <RowCount shown={shown} total={items.length} noun="items" className="ml-auto" />
      </div>
      <DataTable
        table={table}
        testId="stock-table"
        rowTestId="stock-row"
        cellClassName="px-3 py-2.5 first:pl-4"
        empty={
          items.length === 0
            ? canManage
              ? 'The stock room is empty. Add the sheets, remnants and rolls you have, or import them from a CSV file.'
              : 'The stock room is empty.'
            : 'Nothing matches that filter.'
        }
        renderDetail={(row) =>
          open === row.original.id ? (
            <>
              <h3 className="mb-2 text-[13px] font-bold text-zinc-700">History</h3>
              <HistoryList workshopId={workshopId} subjectType="stock" subjectId={row.original.id} />
            </>
          ) : null
        }
      />
      <ConfirmDeleteDialog item={deleting} title="Remove from the stock room?" confirmLabel="Remove" mutation={remove} onClose={() => setDeleting(null)}>
        {(s) => `${KIND_LABELS[s.kind]} ${s.thicknessMm} mm ${s.material}, ${stockSize(s)}. Cut plans made earlier keep their own copy.`}
      </ConfirmDeleteDialog>
    </>
  );
}
