import type { CutPlanPartDto, CutPlanStockDto } from '../../../shared/schemas/api.schema';
import type { LayoutSheet } from '../../../shared/schemas/nest.schema';
import { sheetPrims, sheetUtilisation } from '../../../shared/render/cut-diagram';
import { placedArea } from '../../../shared/render/cut-list';
import { formatNumber } from '../../lib/format';
import { SceneSvg } from './scene-svg';

const pct = (v: number) => `${formatNumber(v * 100)} %`;
const m2 = (mm2: number) => `${formatNumber(mm2 / 1e6, 2)} m²`;

/** One line of the cut order in words: saw terms on boards, plain ones on a roll cut with a knife. */
export function cutWords(cut: { kind: string; x1: number; y1: number; x2: number; y2: number }, onRoll: boolean): string {
  const what = onRoll ? (cut.kind === 'rip' ? 'Cut along the roll' : 'Cut across the roll') : cut.kind === 'rip' ? 'Rip cut' : 'Cross cut';
  const where = cut.x1 === cut.x2 ? `x ${formatNumber(cut.x1)}` : `y ${formatNumber(cut.y1)}`;
  return `${what}, ${formatNumber(Math.hypot(cut.x2 - cut.x1, cut.y2 - cut.y1))} mm long, at ${where}`;
}

/**
 * One sheet or roll of the plan, drawn to scale with the parts labelled (number, name, size, cabinet), the
 * numbered guillotine cuts and the hatched offcuts (the same drawing as the cut-diagram PDF), with its
 * legend, cut order and offcuts beside it. `materialLabel` ("MDF 18 mm") names the material when the stock
 * is not known (a shared plan hides the stock).
 */
export function SheetCard({
  label,
  sheet,
  parts,
  stock,
  materialLabel,
}: {
  label: string;
  sheet: LayoutSheet;
  parts: ReadonlyMap<string, CutPlanPartDto>;
  stock: CutPlanStockDto | undefined;
  materialLabel?: string;
}) {
  const isRoll = (sheet.kind ?? stock?.kind) === 'roll';
  const textMm = Math.max(12, Math.min(40, Math.max(sheet.width, sheet.height) / 80));
  const pad = textMm * 0.5;
  const prims = sheetPrims(sheet, parts, pad, pad, 1, { textMm, lineScale: textMm / 3 }, stock?.trimMm ?? 0);
  const offcutArea = (sheet.offcuts ?? []).reduce((a, o) => a + o.width * o.height, 0);
  const waste = Math.max(0, sheet.width * sheet.height - placedArea(sheet) - offcutArea);
  const material = stock ? `${stock.material} ${formatNumber(stock.thicknessMm)} mm` : (materialLabel ?? '');
  const size = isRoll ? `${formatNumber(sheet.width)} mm wide, ${formatNumber(sheet.height / 1000, 2)} m used` : `${formatNumber(sheet.width)} × ${formatNumber(sheet.height)} mm`;
  const title = [label, material, size].filter(Boolean).join(' · ');
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
            <h4 className="mb-1 font-bold text-zinc-800">
              Parts <span className="font-normal text-zinc-500">({sheet.placements.length})</span>
            </h4>
            {/* Long lists scroll inside the card; tabIndex lets the keyboard scroll them too. */}
            <ol className="max-h-64 space-y-0.5 overflow-y-auto rounded pr-1" tabIndex={0} aria-label={`Parts on ${label}`}>
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
              <h4 className="mb-1 font-bold text-zinc-800">
                Cut order <span className="font-normal text-zinc-500">({cuts.length} cuts)</span>
              </h4>
              <ol className="max-h-48 space-y-0.5 overflow-y-auto rounded pr-1 tabular-nums text-zinc-700" tabIndex={0} aria-label={`Cut order of ${label}`}>
                {cuts.map((c) => (
                  <li key={c.order}>
                    <span className="inline-block w-6 text-right text-red-700">{c.order}.</span> {cutWords(c, isRoll)}
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
