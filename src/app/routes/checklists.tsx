import type { QueryClient } from '@tanstack/react-query';
import { Link, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/layouts/app-layout';
import { ButtonLink } from '../../components/ui/button';
import { Spinner } from '../../components/ui/spinner';
import { EmptyState, LoadError } from '../../components/ui/states';
import { paths } from '../../config/paths';
import { floorPlansQueryOptions, useFloorPlans } from '../../features/checklist/api/plans';
import { formatDateTime } from '../../lib/format';
import { parseId } from './params';
import { useWorkshop, workshopTitle } from './workshop';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(floorPlansQueryOptions(parseId(params.workshopId)));
    return null;
  };

/** The floor: every cut plan, each with its build checklist. */
export function ChecklistsRoute() {
  const { workshopId, membership } = useWorkshop();
  const plans = useFloorPlans(workshopId);
  return (
    <>
      <title>{workshopTitle('Checklists', membership.workshopName)}</title>
      <PageHeader title="Build checklists" description="Pick a cut plan to tick its pieces and sheets as they are cut." />
      {plans.isPending ? <Spinner label="Loading the cut plans…" /> : null}
      {plans.isError ? <LoadError what="the cut plans" error={plans.error} onRetry={() => plans.refetch()} /> : null}
      {plans.data?.length === 0 ? (
        <EmptyState
          title="No cut plans yet"
          action={
            <ButtonLink to={paths.builds.getHref(workshopId)} variant="primary">
              Go to builds
            </ButtonLink>
          }
        >
          A checklist comes with every cut plan. Make a cut plan from a build first.
        </EmptyState>
      ) : null}
      <ul className="grid gap-3 md:grid-cols-2">
        {plans.data?.map((p) => (
          <li key={p.id}>
            <Link
              to={paths.checklist.getHref(workshopId, p.id)}
              className="block min-h-16 rounded-xl border border-zinc-200 bg-white px-5 py-4 shadow-xs hover:border-accent-300 hover:bg-accent-50/40"
            >
              <span className="block text-base font-bold text-zinc-900">{p.buildName}</span>
              <span className="block text-[13px] text-zinc-500">
                Cut plan {p.id} · {p.totals.sheetsUsed} sheets · {p.totals.partsPlaced} parts · {formatDateTime(p.createdAt)}
              </span>
            </Link>
          </li>
        ))}
      </ul>
    </>
  );
}
