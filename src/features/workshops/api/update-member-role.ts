import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MemberDto, Role } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { workshopKeys } from './keys';

export const updateMemberRole = (workshopId: number, userId: number, role: Role) =>
  api.patch<MemberDto>(`/api/workshops/${workshopId}/members/${userId}`, { role });

export function useUpdateMemberRole(workshopId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: number; role: Role }) => updateMemberRole(workshopId, userId, role),
    onSettled: () => queryClient.invalidateQueries({ queryKey: workshopKeys.members(workshopId) }),
  });
}
