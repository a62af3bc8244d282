import type { CutPlanPartDto, CutPlanStockDto } from '../../../../shared/schemas/api.schema';
import type { LayoutSheet } from '../../../../shared/schemas/nest.schema';
import { sheetPrims, sheetUtilisation } from '../../../../shared/render/cut-diagram';
import { placedArea } from '../../../../shared/render/cut-list';
import { formatNumber } from '../../../lib/format';
import { SceneSvg } from './scene-svg';

const pct = (v: number) => `${formatNumber(v * 100)} %`;
const m2 = (mm2: number) => `${formatNumber(mm2 / 1e6, 2)} m²`;

/**
 * One sheet or roll of the plan, drawn to scale with the parts labelled (number, name, size, cabinet), the
 * numbered guillotine cuts and the hatched offcuts (the same drawing as the cut-diagram PDF), with its
 * legend, cut order and offcuts beside it.
 */
export function SheetCard({ label, sheet, parts, stock }: { label: string; sheet: LayoutSheet; parts: ReadonlyMap<string, CutPlanPartDto>; stock: CutPlanStockDto | undefined }) {
  const isRoll = sheet.kind === 'roll';
  const textMm = Math.max(12, Math.min(40, Math.max(sheet.width, sheet.height) / 80));
  const pad = textMm * 0.5;
  const prims = sheetPrims(sheet, parts, pad, pad, 1, { textMm, lineScale: textMm / 3 }, stock?.trimMm ?? 0);
  const offcutArea = (sheet.offcuts ?? []).reduce((a, o) => a + o.width * o.height, 0);
  const waste = Math.max(0, sheet.width * sheet.height - placedArea(sheet) - offcutArea);
  const title = isRoll
    ? `${label} · ${stock?.material ?? ''} ${formatNumber(stock?.thicknessMm ?? 0)} mm · ${formatNumber(sheet.width)} mm wide, ${formatNumber(sheet.height / 1000, 2)} m used`
    : `${label} · ${stock?.material ?? ''} ${formatNumber(stock?.thicknessMm ?? 0)} mm · ${formatNumber(sheet.width)} × ${formatNumber(sheet.height)} mm`;
  const cuts = [...sheet.cuts].sort((a, b) => a.order - b.order);

  return (
    <article className="rounded-xl border border-zinc-200 bg-white shadow-xs" data-testid="sheet-card">
      <header className="flex flex-wrap items-baseline justify-between gap-2 border-b border-zinc-100 px-5 py-3">
        <h3 className="text-[15px] font-bold text-zinc-900">{title}</h3>
        <p className="text-[13px] text-zinc-600 tabular-nums">
          Utilisation <strong>{pct(sheetUtilisation(sheet))}</strong> · {sheet.placements.length} parts · waste {m2(waste)}
          {sheet.offcuts?.length ? ` · ${sheet.offcuts.length} offcut${sheet.offcuts.length === 1 ? '' : 's'} to keep` : ''}
          {stock?.grain === 'length' ? ' · grain along the length' : ''}
        </p>
      </header>
      <div className="grid gap-5 p-5 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <SceneSvg
          prims={prims}
          widthMm={sheet.width + 2 * pad}
          heightMm={sheet.height + 2 * pad}
          title={title}
          className={isRoll ? 'mx-auto max-h-[70vh] w-auto max-w-full' : 'h-auto w-full'}
        />
        <div className="space-y-4 text-[13px]">
          <section>
            <h4 className="mb-1 font-bold text-zinc-800">Parts</h4>
            <ol className="max-h-64 space-y-0.5 overflow-y-auto pr-1">
              {sheet.placements.map((p, i) => {
                const part = parts.get(p.partId);
                const [w, h] = p.rotated ? [p.height, p.width] : [p.width, p.height];
                return (
                  <li key={`${p.partId}-${i}`} className="flex gap-1.5">
                    <span className="w-6 shrink-0 text-right tabular-nums text-zinc-400">{i + 1}.</span>
                    <span>
                      <span className="text-zinc-900">{part?.name ?? p.partId}</span>{' '}
                      <span className="tabular-nums text-zinc-600">
                        {formatNumber(w)} × {formatNumber(h)}
                      </span>
                      {p.rotated ? <span className="text-zinc-400"> (turned)</span> : null}
                      <span className="block text-xs text-zinc-500">{part?.cabinet}</span>
                    </span>
                  </li>
                );
              })}
            </ol>
          </section>
          {cuts.length > 0 ? (
            <section>
              <h4 className="mb-1 font-bold text-zinc-800">Cut order</h4>
              <ol className="max-h-48 space-y-0.5 overflow-y-auto pr-1 tabular-nums text-zinc-700">
                {cuts.map((c) => (
                  <li key={c.order}>
                    <span className="inline-block w-6 text-right text-red-700">{c.order}.</span> {c.kind === 'rip' ? 'Rip' : 'Cross'} cut,{' '}
                    {formatNumber(Math.hypot(c.x2 - c.x1, c.y2 - c.y1))} mm long, at {c.x1 === c.x2 ? `x ${formatNumber(c.x1)}` : `y ${formatNumber(c.y1)}`}
                  </li>
                ))}
              </ol>
            </section>
          ) : null}
          {sheet.offcuts?.length ? (
            <section>
              <h4 className="mb-1 font-bold text-zinc-800">Offcuts to keep</h4>
              <ul className="space-y-0.5 tabular-nums text-zinc-700">
                {sheet.offcuts.map((o, i) => (
                  <li key={i}>
                    {formatNumber(o.width)} × {formatNumber(o.height)} mm
                  </li>
                ))}
              </ul>
            </section>
          ) : null}
        </div>
      </div>
    </article>
  );
}
