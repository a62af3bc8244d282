import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '../../../shared/schemas/api.schema';
import { PageHeader } from '../../components/layouts/app-layout';
import { Alert } from '../../components/ui/alert';
import { Button } from '../../components/ui/button';
import { Spinner } from '../../components/ui/spinner';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { designsQueryOptions, useDesigns } from '../../features/designs/api/get-designs';
import { DesignsTable } from '../../features/designs/components/designs-table';
import { NewDesignDialog } from '../../features/designs/components/new-design-dialog';
import { parseId } from './params';
import { useWorkshop, workshopTitle } from './workshop';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    // Start loading, but show the page at once; the table shows its own spinner.
    void queryClient.prefetchQuery(designsQueryOptions(parseId(params.workshopId)));
    return null;
  };

export function DesignsRoute() {
  const { workshopId, membership } = useWorkshop();
  const designs = useDesigns(workshopId);
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  const canEdit = can(membership.role, 'editDesigns');
  const units = useMe().data?.user.units ?? 'mm';

  return (
    <>
      <title>{workshopTitle('Designs', membership.workshopName)}</title>
      <PageHeader
        title="Designs"
        description="Every cabinet design of this workshop."
        actions={
          canEdit ? (
            <Button variant="primary" onClick={() => setCreating(true)}>
              New design
            </Button>
          ) : null
        }
      />
      {designs.isPending ? <Spinner label="Loading designs…" /> : null}
      {designs.isError ? (
        <Alert
          tone="error"
          title="Could not load the designs"
          actions={<Button onClick={() => designs.refetch()}>Try again</Button>}
        >
          {designs.error.message}
        </Alert>
      ) : null}
      {designs.data ? (
        <DesignsTable
          workshopId={workshopId}
          designs={designs.data}
          canEdit={canEdit}
          designHref={(id) => paths.design.getHref(workshopId, id)}
          units={units}
        />
      ) : null}
      {canEdit ? (
        <NewDesignDialog
          workshopId={workshopId}
          units={units}
          open={creating}
          onClose={() => setCreating(false)}
          onCreated={(created) => {
            setCreating(false);
            navigate(paths.design.getHref(workshopId, created.id));
          }}
        />
      ) : null}
    </>
  );
}
