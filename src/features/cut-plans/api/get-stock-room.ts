import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListDto, StockItemDto } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { cutPlanKeys } from './keys';

/** The stock room's items, to choose the stock of a cut plan from. */
export const getStockRoom = (workshopId: number) => api.get<ListDto<StockItemDto>>(`/api/workshops/${workshopId}/stock`).then((r) => r.items);

export function useStockRoom(workshopId: number, enabled: boolean) {
  return useQuery({ ...queryOptions({ queryKey: cutPlanKeys.stockRoom(workshopId), queryFn: () => getStockRoom(workshopId) }), enabled });
}
