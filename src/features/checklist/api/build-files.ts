import { queryOptions, useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { DriverParamsDto, ListDto, UploadDto } from '../../../../shared/schemas/api.schema';
import { historyKeys } from '../../../components/history/history-list';
import { uploadFile } from '../../../components/history/upload-file';
import { api } from '../../../lib/api-client';

export const buildFileKeys = {
  all: ['build-files'] as const,
  list: (workshopId: number, buildId: number) => [...buildFileKeys.all, workshopId, buildId] as const,
};

export const buildFilesQueryOptions = (workshopId: number, buildId: number) =>
  queryOptions({
    queryKey: buildFileKeys.list(workshopId, buildId),
    queryFn: () => api.get<ListDto<UploadDto>>(`/api/workshops/${workshopId}/uploads?buildId=${buildId}`).then((r) => r.items),
  });

export function useBuildFiles(workshopId: number, buildId: number) {
  return useQuery(buildFilesQueryOptions(workshopId, buildId));
}

/** A file added or removed changes the list and the build's history (server: uploads.service.ts records it). */
function invalidateFilesAndHistory(queryClient: QueryClient, workshopId: number, buildId: number) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: buildFileKeys.list(workshopId, buildId) }),
    queryClient.invalidateQueries({ queryKey: historyKeys.item(workshopId, 'build', buildId) }),
  ]);
}

export function useUploadBuildFile(workshopId: number, buildId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ kind, file }: { kind: 'photo' | 'drivers-csv'; file: File }) =>
      uploadFile<UploadDto & { drivers?: DriverParamsDto[] }>(`/api/workshops/${workshopId}/uploads/${kind}?buildId=${buildId}`, file),
    meta: { inlineErrors: true },
    onSuccess: () => invalidateFilesAndHistory(queryClient, workshopId, buildId),
  });
}

export function useDeleteBuildFile(workshopId: number, buildId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete(`/api/workshops/${workshopId}/uploads/${id}`),
    onSuccess: () => invalidateFilesAndHistory(queryClient, workshopId, buildId),
  });
}

export const driversQueryOptions = (workshopId: number, uploadId: number) =>
  queryOptions({
    queryKey: [...buildFileKeys.all, workshopId, 'drivers', uploadId] as const,
    queryFn: () => api.get<ListDto<DriverParamsDto>>(`/api/workshops/${workshopId}/uploads/${uploadId}/drivers`).then((r) => r.items),
  });
