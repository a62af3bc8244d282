import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { can } from '../../../shared/schemas/api.schema';
import { PageHeader } from '../../components/layouts/app-layout';
import { membersQueryOptions } from '../../features/workshops/api/get-members';
import { MembersTable } from '../../features/workshops/components/members-table';
import { parseId } from './params';
import { useWorkshop, workshopTitle } from './workshop';

export const clientLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(membersQueryOptions(parseId(params.workshopId)));
    return null;
  };

export function MembersRoute() {
  const { workshopId, membership, userId } = useWorkshop();
  const canManage = can(membership.role, 'manageMembers');
  return (
    <>
      <title>{workshopTitle('Members', membership.workshopName)}</title>
      <PageHeader
        title="Members"
        description={
          canManage
            ? 'People in this workshop and their roles. As an owner you can change roles and remove members.'
            : 'People in this workshop and their roles.'
        }
      />
      <MembersTable workshopId={workshopId} canManage={canManage} currentUserId={userId} />
    </>
  );
}
