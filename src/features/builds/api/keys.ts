/** Query keys for builds, general → specific, so a prefix invalidates everything below it. */
export const buildKeys = {
  all: ['builds'] as const,
  lists: () => [...buildKeys.all, 'list'] as const,
  list: (workshopId: number) => [...buildKeys.lists(), workshopId] as const,
  details: () => [...buildKeys.all, 'detail'] as const,
  detail: (workshopId: number, buildId: number) => [...buildKeys.details(), workshopId, buildId] as const,
};
