import { PageHeader } from '../../components/layouts/app-layout';
import { SentMailList } from '../../features/mail-outbox/components/sent-mail-list';
import { useWorkshop } from './workshop';

export function SentMailRoute() {
  const { workshopId, membership } = useWorkshop();
  return (
    <>
      <title>{`Sent mail · ${membership.workshopName} · Boxwright`}</title>
      <PageHeader title="Sent mail" description="E-mail Boxwright sent for this workshop: invitations and cut plan links. Only owners see this page." />
      <div className="max-w-4xl">
        <SentMailList workshopId={workshopId} />
      </div>
    </>
  );
}
