import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CutPlanDto, CutPlanSummaryDto, ListDto } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { cutPlanKeys } from './keys';

export const getCutPlans = (workshopId: number, buildId?: number) =>
  api.get<ListDto<CutPlanSummaryDto>>(`/api/workshops/${workshopId}/cut-plans${buildId ? `?buildId=${buildId}` : ''}`).then((r) => r.items);

export const cutPlansQueryOptions = (workshopId: number, buildId?: number) =>
  queryOptions({ queryKey: cutPlanKeys.list(workshopId, buildId), queryFn: () => getCutPlans(workshopId, buildId) });

export function useCutPlans(workshopId: number, buildId?: number) {
  return useQuery(cutPlansQueryOptions(workshopId, buildId));
}

export const getCutPlan = (workshopId: number, planId: number) => api.get<CutPlanDto>(`/api/workshops/${workshopId}/cut-plans/${planId}`);

/** A cut plan never changes once made: cached for good. */
export const cutPlanQueryOptions = (workshopId: number, planId: number) =>
  queryOptions({ queryKey: cutPlanKeys.detail(workshopId, planId), queryFn: () => getCutPlan(workshopId, planId), staleTime: Infinity });

export function useCutPlan(workshopId: number, planId: number) {
  return useQuery(cutPlanQueryOptions(workshopId, planId));
}
