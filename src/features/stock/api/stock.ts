import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ListDto, StockInput, StockItemDto, UploadDto } from '../../../../shared/schemas/api.schema';
import { historyKeys } from '../../../components/history/history-list';
import { uploadFile } from '../../../components/history/upload-file';
import { api } from '../../../lib/api-client';

export const stockKeys = {
  all: ['stock'] as const,
  list: (workshopId: number) => [...stockKeys.all, workshopId] as const,
};

export const stockQueryOptions = (workshopId: number) =>
  queryOptions({
    queryKey: stockKeys.list(workshopId),
    queryFn: () => api.get<ListDto<StockItemDto>>(`/api/workshops/${workshopId}/stock`).then((r) => r.items),
  });

export function useStock(workshopId: number) {
  return useQuery(stockQueryOptions(workshopId));
}

export const stockCsvHref = (workshopId: number) => `/api/workshops/${workshopId}/stock/export.csv`;

function useInvalidate(workshopId: number) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: stockKeys.list(workshopId) }),
      queryClient.invalidateQueries({ queryKey: [...historyKeys.all, workshopId, 'stock'] }),
    ]);
}

export function useSaveStockItem(workshopId: number) {
  const invalidate = useInvalidate(workshopId);
  return useMutation({
    mutationFn: ({ id, version, item }: { id?: number; version?: number; item: StockInput }) =>
      id === undefined
        ? api.post<StockItemDto>(`/api/workshops/${workshopId}/stock`, item)
        : api.put<StockItemDto>(`/api/workshops/${workshopId}/stock/${id}`, { version, item }),
    meta: { inlineErrors: true },
    onSuccess: invalidate,
  });
}

export function useDeleteStockItem(workshopId: number) {
  const invalidate = useInvalidate(workshopId);
  return useMutation({
    mutationFn: (id: number) => api.delete(`/api/workshops/${workshopId}/stock/${id}`),
    // The confirm dialog shows the error.
    meta: { inlineErrors: true },
    onSuccess: invalidate,
  });
}

export function useImportStockCsv(workshopId: number) {
  const invalidate = useInvalidate(workshopId);
  return useMutation({
    mutationFn: (file: File) => uploadFile<UploadDto & { imported: number }>(`/api/workshops/${workshopId}/stock/import`, file),
    meta: { inlineErrors: true },
    onSuccess: invalidate,
  });
}
