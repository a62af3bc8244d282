/**
 * "Edited elsewhere" (409): lists what differs between the saved version and mine, and lets the user
 * reload theirs or keep mine (save over it). The design page owns the request; this is the dialog.
 */
import { useEffect, useRef } from 'react';
import { diffDesigns } from '../model/diff';
import type { StudioDoc, UnitSystem } from '../model/types';
import { formatLength } from '../model/units';

export interface ConflictDialogProps {
  open: boolean;
  theirs: StudioDoc | null;
  mine: StudioDoc;
  units: UnitSystem;
  /** Who saved the other version and when, if the server says. */
  theirsBy?: string | null;
  theirsAt?: string | null;
  busy?: boolean;
  onReloadTheirs(): void;
  onKeepMine(): void;
  onClose(): void;
}

/** Fields whose numbers are lengths (shown in the user's unit); other numbers show as they are. */
const LENGTH_FIELD = /(?:^|\.)(width|height|depth|thickness|baffleThickness|position|diameter|length|wall|crush|minSliver|portClearance|x|y|z|u|v)$/;

function show(value: unknown, path: string, units: UnitSystem): string {
  if (value === undefined || value === null) return '—';
  if (typeof value === 'number') return LENGTH_FIELD.test(path) ? formatLength(value, units) : String(value);
  if (typeof value === 'string') return value;
  if (Array.isArray(value) && value.every((v) => typeof v !== 'object')) {
    return /\.(at|section)$/.test(path) ? value.map((v) => formatLength(Number(v), units)).join(', ') : value.join(', ');
  }
  const o = value as { type?: string };
  return typeof o === 'object' && o.type ? `a ${o.type}` : JSON.stringify(value);
}

export interface ConflictChangesProps {
  theirs: StudioDoc;
  mine: StudioDoc;
  units: UnitSystem;
}

/** The table of fields that differ between the saved version (theirs) and mine. */
export function ConflictChanges({ theirs, mine, units }: ConflictChangesProps) {
  const changes = diffDesigns(theirs, mine);
  return (
    <div className="max-h-72 overflow-auto rounded border border-zinc-200">
      <table className="w-full text-[12.5px]">
        <thead className="sticky top-0 bg-zinc-50 text-left text-[11px] uppercase tracking-wider text-zinc-500">
          <tr>
            <th className="px-2.5 py-1.5 font-bold">Field</th>
            <th className="px-2.5 py-1.5 font-bold">Theirs</th>
            <th className="px-2.5 py-1.5 font-bold">Mine</th>
          </tr>
        </thead>
        <tbody data-testid="conflict-changes">
          {changes.length === 0 ? (
            <tr>
              <td colSpan={3} className="px-2.5 py-2 text-zinc-500">
                No differences in the design itself.
              </td>
            </tr>
          ) : (
            changes.map((c) => (
              <tr key={c.path} className="border-t border-zinc-100">
                <td className="px-2.5 py-1.5" title={c.path}>
                  {c.label}
                </td>
                <td className="px-2.5 py-1.5 font-mono tabular-nums">{show(c.theirs, c.path, units)}</td>
                <td className="px-2.5 py-1.5 font-mono tabular-nums">{show(c.mine, c.path, units)}</td>
              </tr>
            ))
          )}
        </tbody>
      </table>
    </div>
  );
}

export function ConflictDialog({ open, theirs, mine, units, theirsBy, theirsAt, busy, onReloadTheirs, onKeepMine, onClose }: ConflictDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) d.showModal();
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      className="m-auto w-[min(40rem,92vw)] rounded-lg border border-zinc-200 p-0 text-zinc-800 shadow-xl"
      aria-labelledby="conflict-title"
      data-testid="conflict-dialog"
    >
      <div className="space-y-3 p-5">
        <h2 id="conflict-title" className="text-[16px] font-bold">
          This design was changed by someone else
        </h2>
        <p className="text-[13px] leading-snug text-zinc-600">
          {theirsBy ? `${theirsBy} saved` : 'Someone saved'} a newer version{theirsAt ? ` (${new Date(theirsAt).toLocaleString('en-GB')})` : ''} while you
          were editing. Your changes are not saved yet.
        </p>
        {theirs && <ConflictChanges theirs={theirs} mine={mine} units={units} />}
        <div className="flex flex-wrap justify-end gap-2 pt-1">
          <button type="button" className="rounded border border-zinc-300 bg-white px-3 py-1.5 text-[13px] hover:bg-zinc-50" onClick={onClose} disabled={busy}>
            Decide later
          </button>
          <button type="button" className="rounded border border-zinc-300 bg-white px-3 py-1.5 text-[13px] hover:bg-zinc-50" onClick={onReloadTheirs} disabled={busy}>
            Reload theirs
          </button>
          <button type="button" className="rounded bg-accent-600 px-3 py-1.5 text-[13px] font-bold text-white hover:bg-accent-700 disabled:opacity-60" onClick={onKeepMine} disabled={busy}>
            Keep mine
          </button>
        </div>
      </div>
    </dialog>
  );
}
