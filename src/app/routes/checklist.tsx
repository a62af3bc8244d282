import type { QueryClient } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '../../../shared/schemas/api.schema';
import { HistoryList } from '../../components/history/history-list';
import { PageHeader } from '../../components/layouts/app-layout';
import { ButtonLink } from '../../components/ui/button';
import { Card } from '../../components/ui/card';
import { Spinner } from '../../components/ui/spinner';
import { LoadError } from '../../components/ui/states';
import { paths } from '../../config/paths';
import { checklistQueryOptions, useChecklist } from '../../features/checklist/api/checklist';
import { BuildFiles } from '../../features/checklist/components/build-files';
import { ChecklistView } from '../../features/checklist/components/checklist-view';
import { parseId } from './params';
import { useWorkshop, workshopTitle } from './workshop';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(checklistQueryOptions(parseId(params.workshopId), parseId(params.planId)));
    return null;
  };

export function ChecklistRoute() {
  const { workshopId, membership } = useWorkshop();
  const planId = parseId(useParams().planId);
  const list = useChecklist(workshopId, planId);
  const canTick = can(membership.role, 'tickParts');
  return (
    <>
      <title>{workshopTitle(list.data ? `Checklist: ${list.data.buildName}` : 'Checklist', membership.workshopName)}</title>
      <PageHeader
        title={list.data ? `Checklist: ${list.data.buildName}` : 'Checklist'}
        description={canTick ? 'Tap a piece when it is cut. Every tick records who and when.' : 'Progress at the saw: owners and makers tick pieces as they are cut.'}
        back={<Link to={paths.checklists.getHref(workshopId)} className="text-accent-700 hover:underline">← All checklists</Link>}
        actions={
          can(membership.role, 'exportPlans') ? (
            <ButtonLink to={paths.sharePlan.getHref(workshopId, planId)}>Share or send this cut plan</ButtonLink>
          ) : null
        }
      />
      {list.isPending ? <Spinner label="Loading the checklist…" /> : null}
      {list.isError ? <LoadError what="the checklist" error={list.error} onRetry={() => list.refetch()} /> : null}
      {list.data ? <ChecklistView workshopId={workshopId} list={list.data} canTick={canTick} /> : null}
      <div className="mt-8 grid gap-6 lg:grid-cols-2">
        {list.data?.buildId ? (
          <Card title="Photos and files of this build">
            <BuildFiles workshopId={workshopId} buildId={list.data.buildId} canUpload={can(membership.role, 'uploadFiles')} />
          </Card>
        ) : null}
        <Card title="History">
          <HistoryList workshopId={workshopId} subjectType="plan" subjectId={planId} limit={12} />
        </Card>
      </div>
    </>
  );
}
