import { PageHeader } from '../../components/layouts/app-layout';
import { Card } from '../../components/ui/card';
import { InvitationsList } from '../../features/invitations/components/invitations-list';
import { InviteForm } from '../../features/invitations/components/invite-form';
import { useWorkshop } from './workshop';

export function InvitationsRoute() {
  const { workshopId, membership } = useWorkshop();
  return (
    <>
      <title>{`Invitations · ${membership.workshopName} · Boxwright`}</title>
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
