import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DesignSummaryDto, ListDto } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { designKeys } from './keys';

export const getDesigns = (workshopId: number) =>
  api.get<ListDto<DesignSummaryDto>>(`/api/workshops/${workshopId}/designs`).then((r) => r.items);

export const designsQueryOptions = (workshopId: number) =>
  queryOptions({ queryKey: designKeys.list(workshopId), queryFn: () => getDesigns(workshopId) });

export function useDesigns(workshopId: number) {
  return useQuery(designsQueryOptions(workshopId));
}
