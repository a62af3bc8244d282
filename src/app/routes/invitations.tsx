import { PageHeader } from '../../components/layouts/app-layout';
import { Card } from '../../components/ui/card';
import { InvitationsList } from '../../features/invitations/components/invitations-list';
import { InviteForm } from '../../features/invitations/components/invite-form';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { requirePermission, useWorkshop, workshopTitle } from './workshop';

/** Owners only. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await requirePermission(queryClient, params, 'manageMembers');
    return null;
  };

export function InvitationsRoute() {
  const { workshopId, membership } = useWorkshop();
  return (
    <>
      <title>{workshopTitle('Invitations', membership.workshopName)}</title>
      <PageHeader title="Invitations" description="Invite people by e-mail with a role. The link in the e-mail works once, for 7 days." />
      <div className="max-w-4xl space-y-6">
        <Card title="Invite someone">
          <InviteForm workshopId={workshopId} />
        </Card>
        <Card title="Sent invitations">
          <InvitationsList workshopId={workshopId} />
        </Card>
      </div>
    </>
  );
}
