/** Query keys for designs, general → specific, so a prefix invalidates everything below it. */
export const designKeys = {
  all: ['designs'] as const,
  lists: () => [...designKeys.all, 'list'] as const,
  list: (workshopId: number) => [...designKeys.lists(), workshopId] as const,
  details: () => [...designKeys.all, 'detail'] as const,
  detail: (workshopId: number, designId: number) => [...designKeys.details(), workshopId, designId] as const,
  plans: () => [...designKeys.all, 'plan'] as const,
  /** A plan belongs to one saved version of a design. */
  plan: (workshopId: number, designId: number, version: number) =>
    [...designKeys.plans(), workshopId, designId, version] as const,
};
