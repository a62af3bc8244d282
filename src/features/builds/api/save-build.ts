import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BuildDto, BuildInput } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { buildKeys } from './keys';

export const createBuild = (workshopId: number, build: BuildInput) => api.post<BuildDto>(`/api/workshops/${workshopId}/builds`, build);

export const updateBuild = (workshopId: number, buildId: number, body: { version: number; build: BuildInput }) =>
  api.put<BuildDto>(`/api/workshops/${workshopId}/builds/${buildId}`, body);

/** Creates a build, or saves a new version of `existing` (a stale version answers 409). */
export function useSaveBuild(workshopId: number, existing?: { id: number; version: number }) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (build: BuildInput) =>
      existing ? updateBuild(workshopId, existing.id, { version: existing.version, build }) : createBuild(workshopId, build),
    meta: { inlineErrors: true },
    onSuccess: (saved) => {
      queryClient.setQueryData(buildKeys.detail(workshopId, saved.id), saved);
      return queryClient.invalidateQueries({ queryKey: buildKeys.list(workshopId) });
    },
  });
}
