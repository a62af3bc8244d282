export const workshopKeys = {
  all: ['workshops'] as const,
  members: (workshopId: number) => [...workshopKeys.all, workshopId, 'members'] as const,
  settings: (workshopId: number) => [...workshopKeys.all, workshopId, 'settings'] as const,
};
