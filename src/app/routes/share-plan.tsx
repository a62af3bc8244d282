import type { QueryClient } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/layouts/app-layout';
import { Card } from '../../components/ui/card';
import { paths } from '../../config/paths';
import { SharePanel } from '../../features/share/components/share-panel';
import { parseId } from './params';
import { requirePermission, useWorkshop, workshopTitle } from './workshop';

/** Owners, designers and makers share plans; viewers read what they are shown. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await requirePermission(queryClient, params, 'exportPlans');
    return null;
  };

export function SharePlanRoute() {
  const { workshopId, membership } = useWorkshop();
  const planId = parseId(useParams().planId);
  return (
    <>
      <title>{workshopTitle(`Share cut plan ${planId}`, membership.workshopName)}</title>
      <PageHeader
        title={`Share cut plan ${planId}`}
        description="A read-only link shows this one cut plan and its files to someone without an account. It expires, and you can withdraw it."
        back={<Link to={paths.checklist.getHref(workshopId, planId)} className="text-accent-700 hover:underline">← Checklist</Link>}
      />
      <Card className="max-w-3xl">
        <SharePanel workshopId={workshopId} planId={planId} />
      </Card>
    </>
  );
}
