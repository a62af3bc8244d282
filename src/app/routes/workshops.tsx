import { useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { paths } from '../../config/paths';
import { authKeys } from '../../features/auth/api/keys';
import { useLogout } from '../../features/auth/api/logout';
import { NewWorkshopForm } from '../../features/workshops/components/new-workshop-form';
import { WorkshopPicker } from '../../features/workshops/components/workshop-picker';
import { useSignedInUser } from './signed-in';

export function WorkshopsRoute() {
  const me = useSignedInUser();
  const logout = useLogout();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  return (
    <AuthLayout
      title="Choose a workshop"
      subtitle={`Signed in as ${me.user.email}.`}
      footer={
        <button
          type="button"
          className="text-accent-700 hover:underline"
          onClick={() => logout.mutate(undefined, { onSettled: () => navigate(paths.signIn.getHref(), { replace: true }) })}
        >
          Sign out
        </button>
      }
    >
      <div className="space-y-4">
        <WorkshopPicker memberships={me.memberships} hrefFor={(id) => paths.designs.getHref(id)} />
        <NewWorkshopForm
          startOpen={me.memberships.length === 0}
          onCreated={async (w) => {
            // The new membership comes with "who am I?"; the workshop's pages need it before they open.
            await queryClient.invalidateQueries({ queryKey: authKeys.me() });
            await navigate(paths.designs.getHref(w.id));
          }}
        />
      </div>
    </AuthLayout>
  );
}
