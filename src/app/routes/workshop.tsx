import type { QueryClient } from '@tanstack/react-query';
import { data, Outlet, redirect, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can, type MembershipDto } from '../../../shared/schemas/api.schema';
import { AppLayout } from '../../components/layouts/app-layout';
import { paths } from '../../config/paths';
import { findMembership, meQueryOptions } from '../../features/auth/api/get-me';
import { useLogout } from '../../features/auth/api/logout';
import { ROLE_LABELS } from '../../lib/roles';
import { parseId } from './params';
import { useSignedInUser } from './signed-in';

/** `/w/:workshopId/…` is only for members of that workshop (the server checks it again on every request). */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const workshopId = parseId(params.workshopId);
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (!findMembership(me, workshopId)) throw data('Not a member of this workshop', { status: 403 });
    return null;
  };

export const indexLoader = ({ params }: LoaderFunctionArgs) => redirect(paths.designs.getHref(parseId(params.workshopId)));

/** The current workshop and the signed-in user's role in it. */
export function useWorkshop(): { workshopId: number; membership: MembershipDto; userId: number } {
  const me = useSignedInUser();
  const workshopId = parseId(useParams().workshopId);
  const membership = findMembership(me, workshopId);
  if (!membership) throw data('Not a member of this workshop', { status: 403 });
  return { workshopId, membership, userId: me.user.id };
}

export function WorkshopRoute() {
  const me = useSignedInUser();
  const { workshopId, membership } = useWorkshop();
  const logout = useLogout();
  const navigate = useNavigate();
  return (
    <AppLayout
      homeHref={paths.designs.getHref(workshopId)}
      workshopName={membership.workshopName}
      roleLabel={ROLE_LABELS[membership.role]}
      switchWorkshopHref={me.memberships.length > 1 ? paths.workshops.getHref() : undefined}
      nav={[
        { to: paths.designs.getHref(workshopId), label: 'Designs' },
        { to: paths.builds.getHref(workshopId), label: 'Builds' },
        ...(can(membership.role, 'readStock') ? [{ to: paths.stock.getHref(workshopId), label: 'Stock room' }] : []),
        { to: paths.checklists.getHref(workshopId), label: 'Checklists' },
        { to: paths.members.getHref(workshopId), label: 'Members' },
        ...(can(membership.role, 'manageMembers')
          ? [
              { to: paths.invitations.getHref(workshopId), label: 'Invitations' },
              { to: paths.sentMail.getHref(workshopId), label: 'Sent mail' },
            ]
          : []),
      ]}
      userEmail={me.user.email}
      signingOut={logout.isPending}
      onSignOut={() => logout.mutate(undefined, { onSettled: () => navigate(paths.signIn.getHref(), { replace: true }) })}
    >
      <Outlet />
    </AppLayout>
  );
}
