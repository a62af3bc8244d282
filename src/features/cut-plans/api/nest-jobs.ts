import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CutPlanSettingsInput, NestJobDto } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { cutPlanKeys } from './keys';

const jobsPath = (workshopId: number) => `/api/workshops/${workshopId}/nest-jobs`;

export const startNestJob = (workshopId: number, body: { buildId: number; settings: CutPlanSettingsInput }) => api.post<NestJobDto>(jobsPath(workshopId), body);

export function useStartNestJob(workshopId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { buildId: number; settings: CutPlanSettingsInput }) => startNestJob(workshopId, body),
    meta: { inlineErrors: true },
    onSuccess: (job) => queryClient.setQueryData(cutPlanKeys.job(workshopId, job.id), job),
  });
}

export const isFinished = (job: NestJobDto | undefined) => job !== undefined && (job.status === 'done' || job.status === 'failed' || job.status === 'cancelled');

/**
 * A running job's state, read again every 400 ms until it has finished. Polling stops when a read fails (the
 * server cannot be reached, or it restarted and forgot the job: 404); the page says so and offers to check again.
 */
export function useNestJob(workshopId: number, jobId: string | null) {
  return useQuery({
    queryKey: cutPlanKeys.job(workshopId, jobId ?? ''),
    queryFn: () => api.get<NestJobDto>(`${jobsPath(workshopId)}/${jobId}`),
    enabled: jobId !== null,
    refetchInterval: (query) => (isFinished(query.state.data) || query.state.status === 'error' ? false : 400),
    staleTime: 0,
    // Make cut plan says "lost contact" or "not finished" itself.
    meta: { inlineErrors: true },
  });
}

/** What the page does with a job whose progress could not be read. */
export function jobReadProblem(error: { status: number } | null): 'lost' | 'offline' | null {
  if (!error) return null;
  // The job lives in the server's memory: after a restart it is gone and will not finish.
  return error.status === 404 ? 'lost' : 'offline';
}

export function useCancelNestJob(workshopId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (jobId: string) => api.post<NestJobDto>(`${jobsPath(workshopId)}/${jobId}/cancel`),
    onSuccess: (job) => queryClient.setQueryData(cutPlanKeys.job(workshopId, job.id), job),
  });
}
