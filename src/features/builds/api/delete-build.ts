import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { buildKeys } from './keys';

export const deleteBuild = (workshopId: number, buildId: number) => api.delete(`/api/workshops/${workshopId}/builds/${buildId}`);

export function useDeleteBuild(workshopId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (buildId: number) => deleteBuild(workshopId, buildId),
    meta: { inlineErrors: true },
    onSuccess: (_void, buildId) => {
      queryClient.removeQueries({ queryKey: buildKeys.detail(workshopId, buildId) });
      return queryClient.invalidateQueries({ queryKey: buildKeys.list(workshopId) });
    },
  });
}
