import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CutPlanSummaryDto, ListDto } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';

/** The workshop's cut plans, to pick a checklist from. */
export const floorPlansQueryOptions = (workshopId: number) =>
  queryOptions({
    queryKey: ['checklist', workshopId, 'plans'] as const,
    queryFn: () => api.get<ListDto<CutPlanSummaryDto>>(`/api/workshops/${workshopId}/cut-plans`).then((r) => r.items),
  });

export function useFloorPlans(workshopId: number) {
  return useQuery(floorPlansQueryOptions(workshopId));
}
