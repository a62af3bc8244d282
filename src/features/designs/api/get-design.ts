import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DesignDto } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { designKeys } from './keys';

export const getDesign = (workshopId: number, designId: number) =>
  api.get<DesignDto>(`/api/workshops/${workshopId}/designs/${designId}`);

export const designQueryOptions = (workshopId: number, designId: number) =>
  queryOptions({ queryKey: designKeys.detail(workshopId, designId), queryFn: () => getDesign(workshopId, designId) });

export function useDesign(workshopId: number, designId: number) {
  return useQuery(designQueryOptions(workshopId, designId));
}
