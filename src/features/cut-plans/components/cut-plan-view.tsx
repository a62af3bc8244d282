import { useMemo } from 'react';
import { CAUTION_DUST, CAUTION_FIBRES, CAUTION_LIFTING, CAUTION_LOCAL_RULES, CAUTION_SAW } from '../../../../shared/render/cautions';
import { numberSheets } from '../../../../shared/render/cut-list';
import type { CutPlanDto } from '../../../../shared/schemas/api.schema';
import { Alert } from '../../../components/ui/alert';
import { formatNumber } from '../../../lib/format';
import { ExportsPanel } from './exports-panel';
import { SheetCard } from './sheet-card';

function Figure({ label, value, detail, testId }: { label: string; value: string; detail?: string; testId?: string }) {
  return (
    <div className="rounded-xl border border-zinc-200 bg-white px-4 py-3 shadow-xs" data-testid={testId}>
      <p className="text-xs text-zinc-500">{label}</p>
      <p className="mt-0.5 text-lg font-bold text-zinc-900 tabular-nums">{value}</p>
      {detail ? <p className="text-xs text-zinc-500">{detail}</p> : null}
    </div>
  );
}

const KIND_WORD = { sheet: 'Sheet', remnant: 'Remnant', roll: 'Roll' } as const;

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** "2 sheets and 1 remnant", "1 roll length". */
function countWords(sheets: CutPlanDto['groups'][number]['layout']['sheets']): string {
  const count = (kind: string) => sheets.filter((s) => (s.kind ?? 'sheet') === kind).length;
  const words = [count('sheet') ? plural(count('sheet'), 'sheet', 'sheets') : '', count('remnant') ? plural(count('remnant'), 'remnant', 'remnants') : '', count('roll') ? plural(count('roll'), 'roll length', 'roll lengths') : ''];
  return words.filter(Boolean).join(' and ') || 'nothing laid out';
}

/** The whole cut plan: totals, warnings, exports, cautions, then every sheet and roll of every material. */
export function CutPlanView({ workshopId, plan }: { workshopId: number; plan: CutPlanDto }) {
  const parts = useMemo(() => new Map(plan.parts.map((p) => [p.id, p])), [plan.parts]);
  const stockById = useMemo(() => new Map(plan.stock.map((s) => [s.id, s])), [plan.stock]);
  // Sheets numbered as on the cut-diagram PDF: 1, 2… for sheets and remnants, roll 1… for rolls.
  const labelOf = useMemo(() => {
    const numbered = numberSheets(plan.groups.map((g) => g.layout), plan.stock.map((s) => ({ id: s.id, kind: s.kind })));
    return new Map(numbered.map((e) => [e.sheet, e.kind === 'roll' ? `Roll ${e.label.replace('roll ', '')}` : `${KIND_WORD[e.kind]} ${e.label}`]));
  }, [plan.groups, plan.stock]);
  const t = plan.totals;

  return (
    <div className="space-y-6">
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-6" data-testid="cut-plan-totals">
        <Figure label="Sheets" value={String(t.sheetsUsed)} detail={t.remnantsUsed ? `and ${t.remnantsUsed} remnant${t.remnantsUsed === 1 ? '' : 's'}` : undefined} testId="total-sheets" />
        <Figure label="Lining roll" value={`${formatNumber(t.rollLengthMm / 1000, 2)} m`} />
        <Figure label="Material cost" value={t.cost === null ? '—' : t.cost.toFixed(2)} detail={t.cost === null ? 'no prices in the stock' : t.costIncomplete ? 'some stock has no price' : undefined} />
        <Figure label="Lining weight" value={t.liningMassKg === null ? '—' : `${formatNumber(t.liningMassKg, 2)} kg`} />
        <Figure label="Utilisation" value={`${formatNumber(t.utilisation * 100)} %`} detail={`waste ${formatNumber(t.wasteM2, 2)} m²`} />
        <Figure label="Parts" value={`${t.partsPlaced} placed`} detail={t.partsUnplaced ? `${t.partsUnplaced} not placed` : 'all placed'} />
      </div>

      {plan.warnings.length > 0 ? (
        <Alert tone="warning" title={`${plan.warnings.length} warning${plan.warnings.length === 1 ? '' : 's'}`}>
          <ul className="list-disc space-y-0.5 pl-5" data-testid="cut-plan-warnings">
            {plan.warnings.map((w, i) => (
              <li key={i}>{w.message}</li>
            ))}
          </ul>
        </Alert>
      ) : null}

      <ExportsPanel workshopId={workshopId} planId={plan.id} />

      <section aria-labelledby="cautions-heading" className="rounded-xl border border-amber-300 bg-amber-50 px-5 py-3.5 text-amber-950">
        <h2 id="cautions-heading" className="text-sm font-bold">
          Cautions before you cut
        </h2>
        <ul className="mt-1.5 grid gap-x-6 gap-y-1 text-xs leading-relaxed md:grid-cols-2" data-testid="cautions">
          {[CAUTION_DUST, CAUTION_SAW, CAUTION_LIFTING, CAUTION_FIBRES, CAUTION_LOCAL_RULES].map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </section>

      {plan.groups.map((g) => (
        <section key={g.key} className="space-y-4">
          <h2 className="text-lg font-bold text-zinc-900">
            {g.label}{' '}
            <span className="text-sm font-normal text-zinc-500">
              · {countWords(g.layout.sheets)}
              {g.layout.unplaced.length ? ` · ${g.layout.unplaced.reduce((a, u) => a + u.quantity, 0)} not placed` : ''}
            </span>
          </h2>
          {g.layout.sheets.length === 0 ? <p className="text-sm text-zinc-500">Nothing laid out for this material (see the warnings above).</p> : null}
          {g.layout.sheets.map((sheet, i) => {
            const label = labelOf.get(sheet) ?? `Sheet ${i + 1}`;
            return <SheetCard key={label} label={label} sheet={sheet} parts={parts} stock={stockById.get(sheet.stockId)} />;
          })}
        </section>
      ))}
    </div>
  );
}
