import { PageHeader } from '../../components/layouts/app-layout';
import { SentMailList } from '../../features/mail-outbox/components/sent-mail-list';
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { requirePermission, useWorkshop, workshopTitle } from './workshop';

/** Owners only: the mail holds invitation and share links. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await requirePermission(queryClient, params, 'manageMembers');
    return null;
  };

export function SentMailRoute() {
  const { workshopId, membership } = useWorkshop();
  return (
    <>
      <title>{workshopTitle('Sent mail', membership.workshopName)}</title>
      <PageHeader title="Sent mail" description="E-mail Boxwright sent for this workshop: invitations and cut plan links. Only owners see this page." />
      <div className="max-w-4xl">
        <SentMailList workshopId={workshopId} />
      </div>
    </>
  );
}
