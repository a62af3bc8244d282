import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BuildDto, ListDto } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { buildKeys } from './keys';

export const getBuilds = (workshopId: number) => api.get<ListDto<BuildDto>>(`/api/workshops/${workshopId}/builds`).then((r) => r.items);

export const buildsQueryOptions = (workshopId: number) => queryOptions({ queryKey: buildKeys.list(workshopId), queryFn: () => getBuilds(workshopId) });

export function useBuilds(workshopId: number) {
  return useQuery(buildsQueryOptions(workshopId));
}
