import { AuthLayout } from '../../components/layouts/auth-layout';
import { paths } from '../../config/paths';
import { useLogout } from '../../features/auth/api/logout';
import { WorkshopPicker } from '../../features/workshops/components/workshop-picker';
import { useNavigate } from 'react-router-dom';
import { useSignedInUser } from './signed-in';

export function WorkshopsRoute() {
  const me = useSignedInUser();
  const logout = useLogout();
  const navigate = useNavigate();
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
      <WorkshopPicker memberships={me.memberships} hrefFor={(id) => paths.designs.getHref(id)} />
    </AuthLayout>
  );
}
