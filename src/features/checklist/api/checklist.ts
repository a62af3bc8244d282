import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ChecklistDto, ChecklistTickInput } from '../../../../shared/schemas/api.schema';
import { historyKeys } from '../../../components/history/history-list';
import { api } from '../../../lib/api-client';

export const checklistKeys = {
  all: ['checklist'] as const,
  plan: (workshopId: number, planId: number) => [...checklistKeys.all, workshopId, planId] as const,
};

export const checklistQueryOptions = (workshopId: number, planId: number) =>
  queryOptions({
    queryKey: checklistKeys.plan(workshopId, planId),
    queryFn: () => api.get<ChecklistDto>(`/api/workshops/${workshopId}/cut-plans/${planId}/checklist`),
    // Several people tick at the saw: keep the list fresh.
    refetchInterval: 10_000,
  });

export function useChecklist(workshopId: number, planId: number) {
  return useQuery(checklistQueryOptions(workshopId, planId));
}

export function useTick(workshopId: number, planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ChecklistTickInput) => api.post<ChecklistDto>(`/api/workshops/${workshopId}/cut-plans/${planId}/checklist/ticks`, input),
    onSuccess: (list, input) => {
      queryClient.setQueryData(checklistKeys.plan(workshopId, planId), list);
      void queryClient.invalidateQueries({ queryKey: historyKeys.item(workshopId, 'plan', planId) });
      // A sheet changes the stock room.
      if (input.item === 'sheet') void queryClient.invalidateQueries({ queryKey: ['stock', workshopId] });
    },
  });
}
