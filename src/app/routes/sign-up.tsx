import type { QueryClient } from '@tanstack/react-query';
import { Link, redirect, useNavigate } from 'react-router-dom';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { paths } from '../../config/paths';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { SignUpForm } from '../../features/auth/components/sign-up-form';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (me) throw redirect(paths.home.getHref());
  return null;
};

export function SignUpRoute() {
  const navigate = useNavigate();
  return (
    <AuthLayout
      title="Create a workshop"
      subtitle="A workshop holds your designs, stock and builds. You can invite your team to it."
      footer={
        <>
          Already have an account?{' '}
          <Link to={paths.signIn.getHref()} className="text-accent-700 hover:underline">
            Sign in
          </Link>
        </>
      }
    >
      <SignUpForm
        onSignedUp={(me) => {
          const first = me.memberships[0];
          navigate(first ? paths.designs.getHref(first.workshopId) : paths.home.getHref(), { replace: true });
        }}
      />
    </AuthLayout>
  );
}
