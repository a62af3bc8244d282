import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DesignDto } from '../../../../shared/schemas/api.schema';
import type { DesignInput } from '../../../../shared/schemas/design.schema';
import { api } from '../../../lib/api-client';
import { designKeys } from './keys';

export const createDesign = (workshopId: number, design: DesignInput) =>
  api.post<DesignDto>(`/api/workshops/${workshopId}/designs`, design);

export function useCreateDesign(workshopId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (design: DesignInput) => createDesign(workshopId, design),
    meta: { inlineErrors: true },
    onSuccess: (created) => {
      queryClient.setQueryData(designKeys.detail(workshopId, created.id), created);
      return queryClient.invalidateQueries({ queryKey: designKeys.list(workshopId) });
    },
  });
}
