import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { designKeys } from './keys';

export const deleteDesign = (workshopId: number, designId: number) =>
  api.delete(`/api/workshops/${workshopId}/designs/${designId}`);

export function useDeleteDesign(workshopId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (designId: number) => deleteDesign(workshopId, designId),
    meta: { inlineErrors: true },
    onSuccess: (_void, designId) => {
      queryClient.removeQueries({ queryKey: designKeys.detail(workshopId, designId) });
      return queryClient.invalidateQueries({ queryKey: designKeys.list(workshopId) });
    },
  });
}
