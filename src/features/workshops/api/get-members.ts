import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListDto, MemberDto } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { workshopKeys } from './keys';

export const getMembers = (workshopId: number) =>
  api.get<ListDto<MemberDto>>(`/api/workshops/${workshopId}/members`).then((r) => r.items);

export const membersQueryOptions = (workshopId: number) =>
  queryOptions({ queryKey: workshopKeys.members(workshopId), queryFn: () => getMembers(workshopId) });

export function useMembers(workshopId: number) {
  return useQuery(membersQueryOptions(workshopId));
}
