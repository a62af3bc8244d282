import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useNavigate, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '../../components/layouts/app-layout';
import { Spinner } from '../../components/ui/spinner';
import { LoadError } from '../../components/ui/states';
import { paths } from '../../config/paths';
import { authKeys } from '../../features/auth/api/keys';
import { workshopQueryOptions, useWorkshopSettings } from '../../features/workshops/api/workshop-settings';
import { DeleteWorkshop } from '../../features/workshops/components/delete-workshop';
import { WorkshopSettingsForm } from '../../features/workshops/components/workshop-settings-form';
import { notify } from '../../lib/notify';
import { parseId } from './params';
import { requirePermission, useWorkshop, workshopTitle } from './workshop';

/** Owners only (PRODUCT.md §2 "workshop settings, deleting the workshop"). */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await requirePermission(queryClient, params, 'manageWorkshop');
    await queryClient.ensureQueryData(workshopQueryOptions(parseId(params.workshopId)));
    return null;
  };

export function WorkshopSettingsRoute() {
  const { workshopId, membership } = useWorkshop();
  const settings = useWorkshopSettings(workshopId);
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  // The workshop's name is in the header and the picker: both read "who am I?".
  const refreshMe = () => queryClient.invalidateQueries({ queryKey: authKeys.me() });
  const name = settings.data?.name ?? membership.workshopName;

  return (
    <>
      <title>{workshopTitle('Settings', membership.workshopName)}</title>
      <PageHeader title="Workshop settings" description="Only owners see this page. Changes apply to everyone in the workshop." />
      {settings.data ? (
        <div className="max-w-3xl space-y-6">
          <WorkshopSettingsForm
            // A new form after the settings change elsewhere would lose typing: keyed by workshop only.
            key={workshopId}
            workshop={settings.data}
            onSaved={(w) => {
              notify('Workshop settings saved.', 'success');
              if (w.name !== membership.workshopName) void refreshMe();
            }}
            onConflict={async () => (await settings.refetch()).data}
          />
          {/* Set apart from the settings above: a different kind of action. */}
          <div className="pt-6">
            <DeleteWorkshop
              workshopId={workshopId}
              workshopName={settings.data.name}
              onDeleted={async () => {
                // Leave the workshop's pages first: they need the membership that is now gone.
                await navigate(paths.workshops.getHref(), { replace: true });
                queryClient.removeQueries({ queryKey: workshopQueryOptions(workshopId).queryKey });
                await refreshMe();
                notify(`The workshop “${name}” was deleted.`, 'success');
              }}
            />
          </div>
        </div>
      ) : settings.isError ? (
        <LoadError what="the workshop settings" error={settings.error} onRetry={() => void settings.refetch()} />
      ) : (
        <Spinner label="Loading the settings…" />
      )}
    </>
  );
}
