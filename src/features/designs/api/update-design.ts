import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DesignDto } from '../../../../shared/schemas/api.schema';
import type { DesignInput } from '../../../../shared/schemas/design.schema';
import { api } from '../../../lib/api-client';
import { designKeys } from './keys';

export interface UpdateDesignVariables {
  /** The version this edit started from; a newer one on the server answers 409. */
  version: number;
  design: DesignInput;
}

export const updateDesign = (workshopId: number, designId: number, body: UpdateDesignVariables) =>
  api.put<DesignDto>(`/api/workshops/${workshopId}/designs/${designId}`, body);

export function useUpdateDesign(workshopId: number, designId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateDesignVariables) => updateDesign(workshopId, designId, body),
    // 400 fields go next to their inputs and 409 gets its own choice, so no notice here.
    meta: { inlineErrors: true },
    onSuccess: (saved) => {
      queryClient.setQueryData(designKeys.detail(workshopId, designId), saved);
      return queryClient.invalidateQueries({ queryKey: designKeys.list(workshopId) });
    },
  });
}
