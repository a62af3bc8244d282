import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Plan } from '../../../../shared/schemas/plan.types';
import { api } from '../../../lib/api-client';
import { designKeys } from './keys';

export const getPlan = (workshopId: number, designId: number) =>
  api.get<Plan>(`/api/workshops/${workshopId}/designs/${designId}/plan`);

export const planQueryOptions = (workshopId: number, designId: number, version: number) =>
  queryOptions({
    queryKey: designKeys.plan(workshopId, designId, version),
    queryFn: () => getPlan(workshopId, designId),
    // A saved version's plan never changes.
    staleTime: Infinity,
    retry: false,
  });

export function usePlan(workshopId: number, designId: number, version: number) {
  return useQuery(planQueryOptions(workshopId, designId, version));
}
