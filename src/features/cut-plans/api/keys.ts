/** Query keys for cut plans and nest jobs, general → specific. */
export const cutPlanKeys = {
  all: ['cut-plans'] as const,
  lists: () => [...cutPlanKeys.all, 'list'] as const,
  list: (workshopId: number, buildId?: number) => [...cutPlanKeys.lists(), workshopId, buildId ?? 'all'] as const,
  details: () => [...cutPlanKeys.all, 'detail'] as const,
  detail: (workshopId: number, planId: number) => [...cutPlanKeys.details(), workshopId, planId] as const,
  jobs: () => [...cutPlanKeys.all, 'job'] as const,
  job: (workshopId: number, jobId: string) => [...cutPlanKeys.jobs(), workshopId, jobId] as const,
  stockRoom: (workshopId: number) => [...cutPlanKeys.all, 'stock-room', workshopId] as const,
};
