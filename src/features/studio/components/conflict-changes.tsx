/**
 * "Edited elsewhere" (409): what differs between the saved version (theirs) and mine, field by field.
 * The design page owns the request and its dialog ("reload theirs" / "keep mine"); it shows this table.
 */
import { diffDesigns } from '../model/diff';
import type { StudioDoc, UnitSystem } from '../model/types';
import { formatLength } from '../model/units';

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
