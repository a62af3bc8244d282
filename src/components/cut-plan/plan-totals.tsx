import type { CutPlanTotalsDto } from '../../../shared/schemas/api.schema';
import { money, sheetsBoundText } from '../../../shared/render/cut-diagram';
import { formatNumber } from '../../lib/format';

function Figure({ label, value, detail, testId }: { label: string; value: string; detail?: string; testId?: string }) {
  return (
    <div className="rounded-xl border border-zinc-200 bg-white px-4 py-3 shadow-xs" data-testid={testId}>
      <p className="text-xs text-zinc-500">{label}</p>
      <p className="mt-0.5 text-lg font-bold text-zinc-900 tabular-nums">{value}</p>
      {detail ? <p className="text-xs text-zinc-500">{detail}</p> : null}
    </div>
  );
}

function sheetsDetail(t: CutPlanTotalsDto): string | undefined {
  const parts = [t.remnantsUsed ? `and ${t.remnantsUsed} remnant${t.remnantsUsed === 1 ? '' : 's'}` : '', sheetsBoundText(t.sheetsUsed, t.sheetsLowerBound)].filter(Boolean);
  return parts.length ? parts.join(' · ') : undefined;
}

/** A cut plan's totals in six figures: sheets, lining, cost, lining weight, utilisation, parts. `currency`: the workshop's ISO 4217 code, shown after the cost. */
export function PlanTotals({ totals: t, currency }: { totals: CutPlanTotalsDto; currency?: string | null }) {
  return (
    <div className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-6" data-testid="cut-plan-totals">
      <Figure label="Sheets" value={String(t.sheetsUsed)} detail={sheetsDetail(t)} testId="total-sheets" />
      <Figure label="Lining roll" value={`${formatNumber(t.rollLengthMm / 1000, 2)} m`} />
      <Figure label="Material cost" value={t.cost === null ? '—' : money(t.cost, currency)} testId="total-cost" detail={t.cost === null ? 'no prices in the stock' : t.costIncomplete ? 'some stock has no price' : 'at stock prices'} />
      <Figure label="Lining weight" value={t.liningMassKg === null ? '—' : `${formatNumber(t.liningMassKg, 2)} kg`} />
      <Figure label="Utilisation" value={`${formatNumber(t.utilisation * 100)} %`} detail={`waste ${formatNumber(t.wasteM2, 2)} m²`} />
      <Figure label="Parts" value={`${t.partsPlaced} placed`} detail={t.partsUnplaced ? `${t.partsUnplaced} not placed` : 'all placed'} />
    </div>
  );
}
