import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '../../../shared/schemas/api.schema';
import { PageHeader } from '../../components/layouts/app-layout';
import { Button, ButtonLink } from '../../components/ui/button';
import { Spinner } from '../../components/ui/spinner';
import { EmptyState, LoadError } from '../../components/ui/states';
import { paths } from '../../config/paths';
import { buildsQueryOptions, useBuilds } from '../../features/builds/api/get-builds';
import { BuildDialog } from '../../features/builds/components/build-dialog';
import { BuildsTable } from '../../features/builds/components/builds-table';
import { useDesigns } from '../../features/designs/api/get-designs';
import { parseId } from './params';
import { useWorkshop, workshopTitle } from './workshop';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(buildsQueryOptions(parseId(params.workshopId)));
    return null;
  };

export function BuildsRoute() {
  const { workshopId, membership } = useWorkshop();
  const builds = useBuilds(workshopId);
  const canEdit = can(membership.role, 'editDesigns');
  const designs = useDesigns(workshopId);
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);

  return (
    <>
      <title>{workshopTitle('Builds', membership.workshopName)}</title>
      <PageHeader
        title="Builds"
        description="The cabinets you make together, taken to a cut plan: panels on sheets, lining on rolls."
        actions={
          canEdit ? (
            <Button variant="primary" onClick={() => setCreating(true)} disabled={!designs.data?.length}>
              New build
            </Button>
          ) : null
        }
      />
      {builds.isPending ? <Spinner label="Loading builds…" /> : null}
      {builds.isError ? (
        <LoadError what="the builds" error={builds.error} onRetry={() => builds.refetch()} />
      ) : null}
      {builds.data?.length === 0 ? (
        <EmptyState
          title="No builds yet"
          action={
            canEdit && designs.data?.length ? (
              <Button variant="primary" onClick={() => setCreating(true)}>
                New build
              </Button>
            ) : canEdit && designs.data?.length === 0 ? (
              <ButtonLink to={paths.designs.getHref(workshopId)} variant="primary">
                Go to designs
              </ButtonLink>
            ) : undefined
          }
        >
          A build is the set of cabinets you make together: choose designs and how many of each, then make its cut plan.
          {canEdit && designs.data?.length === 0 ? ' Make a design first.' : ''}
        </EmptyState>
      ) : builds.data ? (
        <BuildsTable builds={builds.data} buildHref={(id) => paths.build.getHref(workshopId, id)} />
      ) : null}
      {canEdit && designs.data ? (
        <BuildDialog
          workshopId={workshopId}
          designs={designs.data.map((d) => ({ id: d.id, name: d.name }))}
          open={creating}
          onClose={() => setCreating(false)}
          onSaved={(saved) => {
            setCreating(false);
            navigate(paths.build.getHref(workshopId, saved.id));
          }}
        />
      ) : null}
    </>
  );
}
