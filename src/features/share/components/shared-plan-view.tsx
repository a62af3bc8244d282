import type { CutPlanGroupDto, SharedPlanDto } from '../../../../shared/schemas/api.schema';
import { formatDateTime, formatNumber } from '../../../lib/format';
import { sharedExportHref } from '../api/share-links';

const EXPORT_LABELS: Record<string, string> = {
  'cut-diagrams.pdf': 'Cut diagrams (PDF)',
  'cut-diagrams.svg': 'Cut diagram of the first sheet (SVG)',
  'cut-list.csv': 'Cut list (CSV)',
  'panels.dxf': 'Panels for CNC (DXF)',
  'stencils.pdf': 'Full-size lining stencils (PDF)',
};

/** One sheet to scale: its parts as labelled rectangles (y up, as in the layout). */
function SheetDrawing({ group, index, names }: { group: CutPlanGroupDto; index: number; names: Map<string, string> }) {
  const sheet = group.layout.sheets[index]!;
  const w = sheet.width;
  const h = sheet.height;
  return (
    <figure className="rounded-lg border border-zinc-200 bg-white p-3">
      <svg viewBox={`0 0 ${w} ${h}`} className="h-auto w-full" role="img" aria-label={`${group.label}, sheet ${index + 1}`}>
        <rect x={0} y={0} width={w} height={h} fill="#f4f4f5" stroke="#a1a1aa" strokeWidth={Math.max(w, h) / 400} />
        {sheet.placements.map((p, i) => (
          <g key={i}>
            <rect x={p.x} y={h - p.y - p.height} width={p.width} height={p.height} fill="#e0f2f1" stroke="#0f766e" strokeWidth={Math.max(w, h) / 500} />
            {p.width > w / 12 && p.height > h / 16 ? (
              <text x={p.x + p.width / 2} y={h - p.y - p.height / 2} fontSize={Math.min(p.height / 4, p.width / 8, Math.max(w, h) / 40)} textAnchor="middle" dominantBaseline="middle" fill="#134e4a">
                {names.get(p.partId) ?? p.partId}
              </text>
            ) : null}
          </g>
        ))}
      </svg>
      <figcaption className="mt-2 text-[13px] text-zinc-600">
        {group.label} · {index + 1} · {formatNumber(w)} × {formatNumber(h)} mm · {sheet.placements.length} parts
      </figcaption>
    </figure>
  );
}

/** A shared cut plan, read-only, for someone without an account. */
export function SharedPlanView({ token, plan }: { token: string; plan: SharedPlanDto }) {
  const names = new Map(plan.parts.map((p) => [p.id, p.name]));
  const t = plan.totals;
  return (
    <div className="space-y-6">
      <section className="grid gap-3 sm:grid-cols-4" aria-label="Totals">
        {[
          ['Sheets', String(t.sheetsUsed)],
          ['Lining roll', `${formatNumber(t.rollLengthMm / 1000, 2)} m`],
          ['Material cost', t.cost === null ? '—' : t.cost.toFixed(2)],
          ['Parts', `${t.partsPlaced}${t.partsUnplaced ? ` (+${t.partsUnplaced} not placed)` : ''}`],
        ].map(([label, value]) => (
          <div key={label} className="rounded-xl border border-zinc-200 bg-white px-4 py-3 shadow-xs">
            <div className="text-[13px] text-zinc-500">{label}</div>
            <div className="text-lg font-bold text-zinc-900 tabular-nums">{value}</div>
          </div>
        ))}
      </section>
      <section aria-label="Files" className="rounded-xl border border-zinc-200 bg-white p-5 shadow-xs">
        <h2 className="mb-2 font-bold text-zinc-900">Files</h2>
        <ul className="grid gap-2 sm:grid-cols-2">
          {plan.exports.map((file) => (
            <li key={file}>
              <a className="text-accent-700 underline" href={sharedExportHref(token, file)} download>
                {EXPORT_LABELS[file] ?? file}
              </a>
            </li>
          ))}
        </ul>
        <p className="mt-3 text-[13px] text-zinc-500">
          Kerf {formatNumber(plan.settings.kerfMm)} mm, edge trim {formatNumber(plan.settings.trimMm)} mm, {plan.settings.mode === 'guillotine' ? 'edge-to-edge (panel saw) cuts' : 'free layout (CNC)'}.
        </p>
      </section>
      {plan.groups.map((g) => (
        <section key={g.key} aria-label={g.label}>
          <h2 className="mb-2 font-bold text-zinc-900">{g.label}</h2>
          <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            {g.layout.sheets.map((_, i) => (
              <SheetDrawing key={i} group={g} index={i} names={names} />
            ))}
          </div>
        </section>
      ))}
      {plan.warnings.length ? (
        <section className="rounded-xl border border-amber-200 bg-amber-50 p-4 text-sm text-amber-900">
          <h2 className="font-bold">Notes</h2>
          <ul className="list-disc pl-5">
            {plan.warnings.map((w, i) => (
              <li key={i}>{w.message}</li>
            ))}
          </ul>
        </section>
      ) : null}
      <p className="text-[13px] text-zinc-500">
        Cutting MDF and other boards makes fine dust: use dust extraction and a suitable mask; lift full sheets with two people. Follow your local
        regulations and the tool maker's instructions. This link works until {formatDateTime(plan.expiresAt)}.
      </p>
    </div>
  );
}
