import type { QueryClient } from '@tanstack/react-query';
import { useQuery } from '@tanstack/react-query';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { paths } from '../../config/paths';
import { ForgotPasswordForm, ResetPasswordForm } from '../../features/account/components/password-forms';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { AcceptInvitation } from '../../features/invitations/components/accept-invitation';
import { notify } from '../../lib/notify';

/** Pages opened from e-mailed links and the "forgot password" form: no workshop frame, no sign-in needed. */
export const meLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(meQueryOptions());
  return null;
};

export function ForgotPasswordRoute() {
  return (
    <AuthLayout
      title="Forgot your password?"
      subtitle="We e-mail you a link to choose a new one."
      footer={
        <Link to={paths.signIn.getHref()} className="text-accent-700 hover:underline">
          Back to sign-in
        </Link>
      }
    >
      <ForgotPasswordForm />
    </AuthLayout>
  );
}

export function ResetPasswordRoute() {
  const token = useParams().token ?? '';
  const navigate = useNavigate();
  return (
    <AuthLayout
      title="Choose a new password"
      footer={
        <>
          {/* A used or expired link ends here: the way on is a new link. */}
          <Link to={paths.forgotPassword.getHref()} className="text-accent-700 hover:underline">
            Ask for a new link
          </Link>
          <span className="mx-2 text-zinc-300">·</span>
          <Link to={paths.signIn.getHref()} className="text-accent-700 hover:underline">
            Back to sign-in
          </Link>
        </>
      }
    >
      <ResetPasswordForm
        token={token}
        onDone={() => {
          notify('Your password is changed. Sign in with the new one.', 'success');
          navigate(paths.signIn.getHref(), { replace: true });
        }}
      />
    </AuthLayout>
  );
}

export function InviteRoute() {
  const token = useParams().token ?? '';
  const navigate = useNavigate();
  const me = useQuery(meQueryOptions()).data ?? null;
  return (
    <AuthLayout
      title="Join a workshop"
      footer={
        me ? null : (
          <Link to={paths.signIn.getHref()} className="text-accent-700 hover:underline">
            Go to sign-in
          </Link>
        )
      }
    >
      <AcceptInvitation
        token={token}
        me={me}
        signInHref={paths.signIn.getHref(paths.invite.getHref(token))}
        onJoined={(workshopId) => navigate(paths.workshop.getHref(workshopId), { replace: true })}
      />
    </AuthLayout>
  );
}
