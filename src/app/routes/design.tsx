import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '../../../shared/schemas/api.schema';
import { PageHeader } from '../../components/layouts/app-layout';
import { paths } from '../../config/paths';
import { designQueryOptions } from '../../features/designs/api/get-design';
import { DesignEditor } from '../../features/designs/components/design-editor';
import { formatSizeMm } from '../../lib/format';
import { parseId } from './params';
import { useWorkshop } from './workshop';

/** The design must load before the form can start from it; a 404/403 goes to the route's error view. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(designQueryOptions(parseId(params.workshopId), parseId(params.designId)));
    return null;
  };

export function DesignRoute() {
  const { workshopId, membership } = useWorkshop();
  const designId = parseId(useParams().designId);
  const { data } = useSuspenseQuery(designQueryOptions(workshopId, designId));
  const { outer } = data.design;
  return (
    <>
      <PageHeader
        back={
          <Link to={paths.designs.getHref(workshopId)} className="text-zinc-500 hover:text-zinc-900">
            ← All designs
          </Link>
        }
        title={<span data-testid="design-title">{data.name}</span>}
        description={`Outer size ${formatSizeMm(outer.width, outer.height, outer.depth)}`}
      />
      <DesignEditor key={designId} workshopId={workshopId} initial={data} canEdit={can(membership.role, 'editDesigns')} />
    </>
  );
}
