import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BuildDto } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { buildKeys } from './keys';

export const getBuild = (workshopId: number, buildId: number) => api.get<BuildDto>(`/api/workshops/${workshopId}/builds/${buildId}`);

export const buildQueryOptions = (workshopId: number, buildId: number) =>
  queryOptions({ queryKey: buildKeys.detail(workshopId, buildId), queryFn: () => getBuild(workshopId, buildId) });

export function useBuild(workshopId: number, buildId: number) {
  return useQuery(buildQueryOptions(workshopId, buildId));
}
