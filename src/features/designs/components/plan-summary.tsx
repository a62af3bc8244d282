import type { ReactNode } from 'react';
import type { Plan } from '../../../../shared/schemas/plan.types';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { Spinner } from '../../../components/ui/spinner';
import { describeFormPath, fieldMessages } from '../../../lib/field-paths';
import { formatLength } from '../../../../shared/units/index';
import { formatNumber } from '../../../lib/format';
import { usePlan } from '../api/get-plan';
import { useLengthUnit } from './fields';

function Row({ label, value, strong, note }: { label: ReactNode; value: ReactNode; strong?: boolean; note?: ReactNode }) {
  return (
    <div className="flex items-baseline justify-between gap-3 py-1">
      <dt className={strong ? 'text-zinc-900' : 'text-zinc-600'}>
        {label}
        {note ? <span className="ml-1 text-xs text-zinc-400">{note}</span> : null}
      </dt>
      <dd className={strong ? 'font-bold text-zinc-900 tabular-nums' : 'text-zinc-800 tabular-nums'}>{value}</dd>
    </div>
  );
}

const litres = (value: number) => `${formatNumber(value, 2)} L`;
const minus = (value: number) => (value > 0 ? `− ${formatNumber(value, 2)} L` : '0 L');

export function PlanFigures({ plan }: { plan: Plan }) {
  const { volumes, port } = plan;
  const unit = useLengthUnit();
  const length = (mm: number) => formatLength(mm, unit);
  const panelCount = plan.panels.reduce((n, p) => n + p.quantity, 0);
  const liningCount = plan.liningPieces.reduce((n, p) => n + p.quantity, 0);
  return (
    <div className="space-y-4 text-sm">
      <dl data-testid="plan-volumes">
        <Row label="Gross internal" value={litres(volumes.grossLitres)} />
        <Row label="Braces" value={minus(volumes.bracesLitres)} />
        <Row label="Port tube" value={minus(volumes.portLitres)} />
        <Row label="Drivers" value={minus(volumes.driversLitres)} />
        <Row label="Lining fibre" value={minus(volumes.liningFibreLitres)} />
        <div className="mt-1 border-t border-zinc-200 pt-1">
          <Row label="Net volume" value={litres(volumes.netLitres)} strong />
        </div>
        {volumes.apparentLitresEstimate !== undefined ? (
          <Row label="Apparent with lining" note="(estimate)" value={`≈ ${litres(volumes.apparentLitresEstimate)}`} />
        ) : null}
      </dl>
      <dl className="border-t border-zinc-100 pt-3">
        {port ? (
          <>
            <Row label="Port tuning" value={`${formatNumber(port.tuningHz, 1)} Hz`} strong />
            <Row label="Effective port length" value={length(port.effectiveLengthMm)} />
            {port.lengthForTargetMm !== undefined && port.targetHz !== undefined ? (
              <Row
                label={`Length for ${formatNumber(port.targetHz)} Hz`}
                value={length(port.lengthForTargetMm)}
              />
            ) : null}
            {port.peakAirSpeedMs !== undefined ? (
              <Row label="Peak port air speed" value={`${formatNumber(port.peakAirSpeedMs)} m/s`} />
            ) : null}
          </>
        ) : (
          <Row label="Port tuning" value={<span className="text-zinc-500">sealed box (no port)</span>} />
        )}
      </dl>
      <dl className="border-t border-zinc-100 pt-3">
        <Row label="Panels to cut" value={panelCount} />
        <Row label="Lining pieces" value={liningCount} />
      </dl>
      {plan.warnings.length > 0 ? (
        <div className="border-t border-zinc-100 pt-3">
          <p className="mb-2 text-[13px] font-bold text-amber-900">
            {plan.warnings.length === 1 ? '1 warning' : `${plan.warnings.length} warnings`}
          </p>
          <ul className="space-y-2" data-testid="plan-warnings">
            {plan.warnings.map((w, i) => (
              <li key={`${w.code}-${i}`} className="rounded-md border border-amber-200 bg-amber-50 px-3 py-2 text-[13px] text-amber-900">
                {w.message}
              </li>
            ))}
          </ul>
        </div>
      ) : (
        <p className="border-t border-zinc-100 pt-3 text-[13px] text-zinc-500">No warnings.</p>
      )}
    </div>
  );
}

/** The plan of the saved version, beside the form: volumes, tuning, panel count, warnings. */
export function PlanSummary({
  workshopId,
  designId,
  version,
  dirty,
}: {
  workshopId: number;
  designId: number;
  version: number;
  dirty: boolean;
}) {
  const plan = usePlan(workshopId, designId, version);

  let body: ReactNode;
  if (plan.isPending) body = <Spinner label="Working out the plan…" />;
  else if (plan.isError) {
    const error = plan.error;
    if (error.isNotFound) {
      body = <p className="text-sm text-zinc-500">The plan is not available yet. The design itself is saved as usual.</p>;
    } else if (error.status === 400) {
      const messages = fieldMessages(error.fields);
      body = (
        <Alert tone="warning" title="This design cannot be planned yet">
          {messages.length > 0 ? (
            <ul className="list-disc space-y-0.5 pl-4">
              {messages.map((m) => (
                <li key={m.formPath}>
                  {describeFormPath(m.formPath)}: {m.message}
                </li>
              ))}
            </ul>
          ) : (
            error.message
          )}
        </Alert>
      );
    } else {
      body = (
        <Alert
          tone="info"
          title="The plan could not be worked out just now"
          actions={
            <Button size="sm" onClick={() => plan.refetch()}>
              Try again
            </Button>
          }
        >
          {error.message}
        </Alert>
      );
    }
  } else body = <PlanFigures plan={plan.data} />;

  return (
    <Card
      title="Plan"
      description={dirty ? 'Of the saved version. Save to update it.' : `Of the saved version ${version}.`}
      bodyClassName="px-5 py-4"
    >
      <div data-testid="plan-summary">{body}</div>
    </Card>
  );
}
