import type { QueryClient } from '@tanstack/react-query';
import { Link, redirect, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { paths, safeRedirect } from '../../config/paths';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { SignInForm } from '../../features/auth/components/sign-in-form';

/** Already signed in: go where the user was heading. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (me) throw redirect(safeRedirect(new URL(request.url).searchParams.get('redirectTo')));
    return null;
  };

export function SignInRoute() {
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const redirectTo = params.get('redirectTo');
  return (
    <AuthLayout
      title="Sign in"
      subtitle={redirectTo ? 'Please sign in to continue.' : 'Welcome back to your workshop.'}
      footer={
        <>
          <Link to={paths.forgotPassword.getHref()} className="text-accent-700 hover:underline">
            Forgot your password?
          </Link>
          <span className="mx-2 text-zinc-300">·</span>
          New here?{' '}
          <Link to={paths.signUp.getHref()} className="text-accent-700 hover:underline">
            Create a workshop
          </Link>
        </>
      }
    >
      <SignInForm onSignedIn={() => navigate(safeRedirect(redirectTo), { replace: true })} />
    </AuthLayout>
  );
}
