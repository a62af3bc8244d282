import type { CutPlanDto } from '../../../../shared/schemas/api.schema';
import { CuttingCautions } from '../../../components/cut-plan/cautions';
import { PlanSheets } from '../../../components/cut-plan/plan-sheets';
import { PlanTotals } from '../../../components/cut-plan/plan-totals';
import { Alert } from '../../../components/ui/alert';
import { ExportsPanel } from './exports-panel';

/** The whole cut plan: totals, warnings, exports, cautions, then every sheet and roll of every material. */
export function CutPlanView({ workshopId, plan, currency }: { workshopId: number; plan: CutPlanDto; currency?: string | null }) {
  return (
    <div className="space-y-6">
      <PlanTotals totals={plan.totals} currency={currency} />

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

      <CuttingCautions />

      <PlanSheets groups={plan.groups} parts={plan.parts} stock={plan.stock} />
    </div>
  );
}
