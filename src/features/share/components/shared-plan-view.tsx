import type { SharedPlanDto } from '../../../../shared/schemas/api.schema';
import { CuttingCautions } from '../../../components/cut-plan/cautions';
import { PlanSheets } from '../../../components/cut-plan/plan-sheets';
import { PlanTotals } from '../../../components/cut-plan/plan-totals';
import { Alert } from '../../../components/ui/alert';
import { buttonClasses } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { formatDateTime, formatNumber } from '../../../lib/format';
import { sharedExportHref } from '../api/share-links';

/** The same words as the members' export buttons (features/cut-plans exports panel). */
const EXPORT_LABELS: Record<string, string> = {
  'cut-diagrams.pdf': 'Cut diagrams (PDF)',
  'cut-diagrams.svg': 'Cut diagrams (SVG, mm)',
  'cut-list.csv': 'Cut list (CSV)',
  'panels.dxf': 'Panels for CNC (DXF)',
  'stencils.pdf': 'Full-size stencils (PDF)',
};

/**
 * A shared cut plan, read-only, for someone without an account: the same totals, cautions and sheet drawings
 * as the members' cut plan page (numbered as on the PDF), the files, and when the link stops working.
 */
export function SharedPlanView({ token, plan }: { token: string; plan: SharedPlanDto }) {
  const s = plan.settings;
  return (
    <div className="space-y-6">
      <PlanTotals totals={plan.totals} currency={plan.currency} />
      {plan.warnings.length ? (
        <Alert tone="warning" title={`${plan.warnings.length} note${plan.warnings.length === 1 ? '' : 's'}`}>
          <ul className="list-disc space-y-0.5 pl-5">
            {plan.warnings.map((w, i) => (
              <li key={i}>{w.message}</li>
            ))}
          </ul>
        </Alert>
      ) : null}
      <Card
        title="Files"
        description="Print stencils at 100 % (actual size, not “fit to page”) and measure the calibration square on each page before cutting."
      >
        <div className="flex flex-wrap gap-2">
          {plan.exports.map((file) => (
            <a key={file} className={buttonClasses('secondary')} href={sharedExportHref(token, file)} download>
              {EXPORT_LABELS[file] ?? file}
            </a>
          ))}
        </div>
        <p className="mt-3 text-[13px] text-zinc-500">
          {s.mode === 'guillotine' ? 'Guillotine cuts (edge to edge: panel or table saw)' : 'Free layout (CNC)'} · kerf {formatNumber(s.kerfMm)} mm · edge trim{' '}
          {formatNumber(s.trimMm)} mm · offcuts kept from {formatNumber(s.minOffcutMm)} mm. This link works until {formatDateTime(plan.expiresAt)}.
        </p>
      </Card>
      <CuttingCautions />
      <PlanSheets groups={plan.groups} parts={plan.parts} />
    </div>
  );
}
