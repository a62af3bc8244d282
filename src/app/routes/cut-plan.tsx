import type { QueryClient } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/layouts/app-layout';
import { ButtonLink } from '../../components/ui/button';
import { Card } from '../../components/ui/card';
import { HistoryList } from '../../components/history/history-list';
import { can } from '../../../shared/schemas/api.schema';
import { Spinner } from '../../components/ui/spinner';
import { LoadError } from '../../components/ui/states';
import { paths } from '../../config/paths';
import { formatDateTime, formatNumber } from '../../lib/format';
import { cutPlanQueryOptions, useCutPlan } from '../../features/cut-plans/api/get-cut-plans';
import { CutPlanView } from '../../features/cut-plans/components/cut-plan-view';
import { workshopQueryOptions, useWorkshopSettings } from '../../features/workshops/api/workshop-settings';
import { parseId } from './params';
import { useWorkshop, workshopTitle } from './workshop';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(cutPlanQueryOptions(parseId(params.workshopId), parseId(params.planId)));
    void queryClient.prefetchQuery(workshopQueryOptions(parseId(params.workshopId)));
    return null;
  };

export function CutPlanRoute() {
  const { workshopId, membership } = useWorkshop();
  const planId = parseId(useParams().planId);
  const plan = useCutPlan(workshopId, planId);
  const currency = useWorkshopSettings(workshopId).data?.currency;

  if (plan.isPending)
    return (
      <>
        <title>{workshopTitle(`Cut plan ${planId}`, membership.workshopName)}</title>
        <Spinner label="Loading the cut plan…" />
      </>
    );
  if (plan.isError)
    return (
      <>
        <title>{workshopTitle(`Cut plan ${planId}`, membership.workshopName)}</title>
        <LoadError what="the cut plan" error={plan.error} onRetry={() => plan.refetch()} />
      </>
    );
  const p = plan.data;
  const s = p.settings;
  return (
    <>
      <title>{workshopTitle(`Cut plan ${p.id}: ${p.buildName}`, membership.workshopName)}</title>
      <PageHeader
        back={
          p.buildId ? (
            <Link to={paths.build.getHref(workshopId, p.buildId)} className="text-accent-700 hover:underline">
              ← {p.buildName}
            </Link>
          ) : undefined
        }
        title={`Cut plan ${p.id} — ${p.buildName}`}
        actions={
          <>
            <ButtonLink to={paths.checklist.getHref(workshopId, p.id)}>Checklist</ButtonLink>
            {can(membership.role, 'exportPlans') ? <ButtonLink to={paths.sharePlan.getHref(workshopId, p.id)}>Share or send</ButtonLink> : null}
          </>
        }
        description={`${s.mode === 'guillotine' ? 'Guillotine cuts' : 'Free layout (CNC)'} · kerf ${formatNumber(s.kerfMm)} mm · edge trim ${formatNumber(s.trimMm)} mm · offcuts kept from ${formatNumber(s.minOffcutMm)} mm · made ${formatDateTime(p.createdAt)}${p.createdBy ? ` by ${p.createdBy}` : ''}`}
      />
      <CutPlanView workshopId={workshopId} plan={p} currency={currency} />
      <Card title="History" className="mt-8 max-w-3xl">
        <HistoryList workshopId={workshopId} subjectType="plan" subjectId={p.id} />
      </Card>
    </>
  );
}
