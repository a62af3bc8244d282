import type { QueryClient } from '@tanstack/react-query';
import { data, Outlet, redirect, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can, type MembershipDto, type Permission } from '../../../shared/schemas/api.schema';
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

/**
 * A page only some roles may open (PRODUCT.md §2): other members get the calm "No access" page (403) before
 * anything loads, instead of a form the server would refuse. The server checks every request again.
 */
export async function requirePermission(queryClient: QueryClient, params: LoaderFunctionArgs['params'], permission: Permission): Promise<void> {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  const membership = findMembership(me, parseId(params.workshopId));
  if (!membership) throw data('Not a member of this workshop', { status: 403 });
  if (!can(membership.role, permission)) throw data(`The ${membership.role} role may not open this page`, { status: 403 });
}

/** `<title>`: the page, then the workshop, then the product. */
export function workshopTitle(page: string, workshopName: string): string {
  return `${page} · ${workshopName} · Boxwright`;
}

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
      // Always: the picker is also where a new workshop is started.
      switchWorkshopHref={paths.workshops.getHref()}
      nav={[
        { to: paths.designs.getHref(workshopId), label: 'Designs' },
        // A cut plan and its share page belong to builds; a plan's checklist to the checklists.
        { to: paths.builds.getHref(workshopId), label: 'Builds', alsoFor: /\/cut-plans\/\d+(\/share)?$/ },
        ...(can(membership.role, 'readStock') ? [{ to: paths.stock.getHref(workshopId), label: 'Stock room' }] : []),
        { to: paths.checklists.getHref(workshopId), label: 'Checklists', alsoFor: /\/cut-plans\/\d+\/checklist$/ },
        { to: paths.members.getHref(workshopId), label: 'Members' },
        ...(can(membership.role, 'manageWorkshop') ? [{ to: paths.workshopSettings.getHref(workshopId), label: 'Settings' }] : []),
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
