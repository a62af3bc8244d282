import { useMemo, useState } from 'react';
import type { ChecklistDto, ChecklistPartDto, ChecklistProgressDto, ChecklistSheetDto } from '../../../../shared/schemas/api.schema';
import { CuttingCautions } from '../../../components/cut-plan/cautions';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/dialog';
import { cn } from '../../../lib/cn';
import { formatDateTime, formatNumber, formatRelativeTime } from '../../../lib/format';
import { useTick } from '../api/checklist';

type Show = 'open' | 'all' | 'cut';

function Progress({ progress, large = false }: { progress: ChecklistProgressDto; large?: boolean }) {
  const share = progress.total === 0 ? 0 : progress.done / progress.total;
  return (
    <div>
      <div className={cn('flex items-baseline justify-between gap-3', large ? 'text-base' : 'text-sm')}>
        <span className={cn('text-zinc-800', large && 'font-bold')}>{progress.label}</span>
        <span className="tabular-nums text-zinc-600">
          {progress.done} of {progress.total}
        </span>
      </div>
      <div
        className={cn('mt-1 overflow-hidden rounded-full bg-zinc-200', large ? 'h-3' : 'h-2')}
        role="progressbar"
        aria-label={progress.label}
        aria-valuemin={0}
        aria-valuemax={progress.total}
        aria-valuenow={progress.done}
      >
        <div className="h-full rounded-full bg-accent-600 transition-[width]" style={{ width: `${Math.round(share * 100)}%` }} />
      </div>
    </div>
  );
}

function Mark({ cut }: { cut: ChecklistPartDto['cut'] }) {
  if (!cut) return null;
  return (
    <span className="block text-[13px] text-zinc-500">
      cut by {cut.by} · <time title={formatDateTime(cut.at)}>{formatRelativeTime(cut.at)}</time>
    </span>
  );
}

/** One piece as a big touch target (at least 56 px high): tap to mark it cut, tap again to undo. */
function PieceRow({ piece, canTick, busy, onToggle }: { piece: ChecklistPartDto; canTick: boolean; busy: boolean; onToggle: () => void }) {
  const done = Boolean(piece.cut);
  return (
    <li>
      <button
        type="button"
        role="checkbox"
        aria-checked={done}
        disabled={!canTick || busy}
        onClick={onToggle}
        data-testid="piece"
        className={cn(
          'flex min-h-14 w-full items-center gap-4 rounded-lg border px-4 py-2.5 text-left transition-colors',
          done ? 'border-accent-200 bg-accent-50' : 'border-zinc-200 bg-white hover:border-zinc-300',
          canTick ? 'cursor-pointer active:bg-accent-100' : 'cursor-default',
        )}
      >
        <span
          aria-hidden="true"
          className={cn('flex size-8 shrink-0 items-center justify-center rounded-md border-2 text-lg font-bold', done ? 'border-accent-600 bg-accent-600 text-white' : 'border-zinc-300 bg-white')}
        >
          {done ? '✓' : ''}
        </span>
        <span className="min-w-0 flex-1">
          <span className={cn('block font-bold', done ? 'text-zinc-600' : 'text-zinc-900')}>
            {piece.name} <span className="font-normal text-zinc-500">{piece.of > 1 ? `· ${piece.n} of ${piece.of}` : ''}</span>
          </span>
          <span className="block text-[13px] text-zinc-600 tabular-nums">
            {formatNumber(piece.widthMm)} × {formatNumber(piece.heightMm)} mm · {formatNumber(piece.thicknessMm)} mm {piece.material}
            {piece.kind === 'lining' ? ' · lining' : ''}
          </span>
          <Mark cut={piece.cut} />
        </span>
      </button>
    </li>
  );
}

/** "Sheet 2" as on the cut plan and the printed diagrams, then material, size, parts and the offcuts it keeps. */
function SheetRow({ sheet, canTick, busy, onToggle }: { sheet: ChecklistSheetDto; canTick: boolean; busy: boolean; onToggle: () => void }) {
  const size =
    sheet.stockKind === 'roll'
      ? `${formatNumber(sheet.widthMm)} mm wide, ${formatNumber(sheet.heightMm / 1000, 2)} m used`
      : `${formatNumber(sheet.widthMm)} × ${formatNumber(sheet.heightMm)} mm`;
  return (
    <li className={cn('flex min-h-14 flex-wrap items-center gap-x-4 gap-y-2 rounded-lg border px-4 py-2.5', sheet.cut ? 'border-accent-200 bg-accent-50' : 'border-zinc-200 bg-white')} data-testid="sheet">
      <span className="min-w-0 flex-1">
        <span className="block font-bold text-zinc-900">{sheet.label}</span>
        <span className="block text-[13px] text-zinc-600 tabular-nums">
          {sheet.groupLabel} · {size} · {sheet.partCount} parts{sheet.fromStockRoom ? '' : ' · typed-in stock'}
        </span>
        {sheet.offcuts.length ? (
          <span className="block text-[13px] text-zinc-600 tabular-nums">
            keeps {sheet.offcuts.map((o) => `${formatNumber(o.widthMm)} × ${formatNumber(o.heightMm)}`).join(', ')} mm
          </span>
        ) : null}
        <Mark cut={sheet.cut} />
      </span>
      {canTick ? (
        <Button variant={sheet.cut ? 'secondary' : 'primary'} className="h-12 min-w-32 text-base" busy={busy} onClick={onToggle}>
          {sheet.cut ? 'Undo' : 'Mark cut'}
        </Button>
      ) : sheet.cut ? (
        <span className="text-sm text-accent-700">Cut</span>
      ) : null}
    </li>
  );
}

/** The build checklist: progress per cabinet and in total; pieces to tick; sheets to mark cut (takes stock, keeps offcuts). */
export function ChecklistView({ workshopId, list, canTick }: { workshopId: number; list: ChecklistDto; canTick: boolean }) {
  const tick = useTick(workshopId, list.planId);
  const [show, setShow] = useState<Show>('open');
  const [confirmSheet, setConfirmSheet] = useState<ChecklistSheetDto | null>(null);
  const byCabinet = useMemo(() => {
    const groups = new Map<string, ChecklistPartDto[]>();
    for (const p of list.parts) {
      if (show === 'open' && p.cut) continue;
      if (show === 'cut' && !p.cut) continue;
      groups.set(p.cabinet, [...(groups.get(p.cabinet) ?? []), p]);
    }
    return [...groups];
  }, [list.parts, show]);
  const busyKey = tick.isPending ? tick.variables?.key : undefined;

  // On a tablet (one column) the sheets and cautions come before the long list of pieces: a sheet is cut first.
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem] lg:items-start">
      <section aria-label="Progress" className="space-y-3 rounded-xl border border-zinc-200 bg-white p-5 shadow-xs lg:col-start-1 lg:row-start-1">
        <Progress progress={list.total} large />
        {list.cabinets.map((c) => (
          <Progress key={c.label} progress={c} />
        ))}
      </section>
      <aside className="space-y-6 lg:col-start-2 lg:row-span-2 lg:row-start-1">
        <section aria-label="Sheets">
          <h2 className="mb-1 text-lg font-bold text-zinc-900">Sheets</h2>
          {canTick ? (
            <p className="mb-3 text-[13px] text-zinc-500">Marking a sheet cut takes it out of the stock room and keeps its offcuts as remnants. Undo puts it back.</p>
          ) : null}
          <div className="mb-3">
            <Progress progress={list.sheetsProgress} />
          </div>
          <ul className="grid gap-2 md:max-lg:grid-cols-2">
            {list.sheets.map((s) => (
              <SheetRow key={s.key} sheet={s} canTick={canTick} busy={busyKey === s.key} onToggle={() => (s.cut ? tick.mutate({ item: 'sheet', key: s.key, cut: false }) : setConfirmSheet(s))} />
            ))}
          </ul>
        </section>
        <CuttingCautions narrow />
      </aside>
      <div className="min-w-0 lg:col-start-1 lg:row-start-2">
        <section aria-label="Pieces">
          <div className="mb-3 flex flex-wrap items-center justify-between gap-3">
            <h2 className="text-lg font-bold text-zinc-900">Pieces</h2>
            <div role="group" aria-label="Show" className="inline-flex rounded-lg border border-zinc-300 bg-white p-1">
              {(
                [
                  ['open', 'To cut'],
                  ['all', 'All'],
                  ['cut', 'Cut'],
                ] as const
              ).map(([value, label]) => (
                <button
                  key={value}
                  type="button"
                  aria-pressed={show === value}
                  onClick={() => setShow(value)}
                  className={cn('min-h-11 min-w-20 rounded-md px-4 text-base', show === value ? 'bg-accent-600 text-white' : 'text-zinc-700 hover:bg-zinc-100')}
                >
                  {label}
                </button>
              ))}
            </div>
          </div>
          {byCabinet.length === 0 ? <p className="rounded-lg border border-dashed border-zinc-300 px-4 py-8 text-center text-zinc-500">{show === 'open' ? 'Every piece is cut.' : 'Nothing here yet.'}</p> : null}
          {byCabinet.map(([cabinet, pieces]) => (
            <div key={cabinet} className="mb-5">
              <h3 className="mb-2 text-[15px] font-bold text-zinc-700">{cabinet}</h3>
              <ul className="grid gap-2 md:grid-cols-2">
                {pieces.map((p) => (
                  <PieceRow key={p.key} piece={p} canTick={canTick} busy={busyKey === p.key} onToggle={() => tick.mutate({ item: 'part', key: p.key, cut: !p.cut })} />
                ))}
              </ul>
            </div>
          ))}
        </section>
      </div>
      <ConfirmDialog
        open={confirmSheet !== null}
        title="Mark this sheet cut?"
        confirmLabel="Mark cut"
        busy={tick.isPending}
        onCancel={() => setConfirmSheet(null)}
        onConfirm={() => confirmSheet && tick.mutate({ item: 'sheet', key: confirmSheet.key, cut: true }, { onSettled: () => setConfirmSheet(null) })}
      >
        {confirmSheet
          ? `${confirmSheet.label} (${confirmSheet.groupLabel}) is marked cut${confirmSheet.fromStockRoom ? ' and taken out of the stock room' : ''}${confirmSheet.offcuts.length ? `; ${confirmSheet.offcuts.length} offcut${confirmSheet.offcuts.length === 1 ? ' is' : 's are'} kept as remnants` : ''}.`
          : null}
      </ConfirmDialog>
    </div>
  );
}
