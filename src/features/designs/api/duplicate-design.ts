import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DesignDto } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { designKeys } from './keys';

export const duplicateDesign = (workshopId: number, designId: number) =>
  api.post<DesignDto>(`/api/workshops/${workshopId}/designs/${designId}/duplicate`);

export function useDuplicateDesign(workshopId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (designId: number) => duplicateDesign(workshopId, designId),
    onSuccess: (copy) => {
      queryClient.setQueryData(designKeys.detail(workshopId, copy.id), copy);
      return queryClient.invalidateQueries({ queryKey: designKeys.list(workshopId) });
    },
  });
}
