import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { WorkshopDto, WorkshopUpdateInput } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { workshopKeys } from './keys';

export const getWorkshop = (workshopId: number) => api.get<WorkshopDto>(`/api/workshops/${workshopId}`);

/** The workshop's settings (every member reads them: the currency and the default cut settings are used on other pages). */
export const workshopQueryOptions = (workshopId: number) =>
  queryOptions({ queryKey: workshopKeys.settings(workshopId), queryFn: () => getWorkshop(workshopId) });

export function useWorkshopSettings(workshopId: number) {
  return useQuery(workshopQueryOptions(workshopId));
}

export const updateWorkshop = (workshopId: number, input: WorkshopUpdateInput) => api.patch<WorkshopDto>(`/api/workshops/${workshopId}`, input);

export function useUpdateWorkshop(workshopId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: WorkshopUpdateInput) => updateWorkshop(workshopId, input),
    meta: { inlineErrors: true },
    onSuccess: (saved) => queryClient.setQueryData(workshopKeys.settings(workshopId), saved),
  });
}

export const createWorkshop = (name: string) => api.post<WorkshopDto>('/api/workshops', { name });

export function useCreateWorkshop() {
  return useMutation({ mutationFn: createWorkshop, meta: { inlineErrors: true } });
}

export const deleteWorkshop = (workshopId: number, confirmName: string) => api.delete(`/api/workshops/${workshopId}`, undefined, { confirmName });

export function useDeleteWorkshop(workshopId: number) {
  return useMutation({ mutationFn: (confirmName: string) => deleteWorkshop(workshopId, confirmName), meta: { inlineErrors: true } });
}
