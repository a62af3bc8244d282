import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { workshopKeys } from './keys';

export const removeMember = (workshopId: number, userId: number) =>
  api.delete(`/api/workshops/${workshopId}/members/${userId}`);

export function useRemoveMember(workshopId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: number) => removeMember(workshopId, userId),
    meta: { inlineErrors: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: workshopKeys.members(workshopId) }),
  });
}
