import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MailMessageDto } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';

export const mailKeys = {
  all: ['sent-mail'] as const,
  list: (workshopId: number) => [...mailKeys.all, workshopId] as const,
};

export const sentMailQueryOptions = (workshopId: number) =>
  queryOptions({
    queryKey: mailKeys.list(workshopId),
    queryFn: () => api.get<{ items: MailMessageDto[]; via: MailMessageDto['via'] }>(`/api/workshops/${workshopId}/mail`),
    refetchInterval: 5000,
  });

export function useSentMail(workshopId: number) {
  return useQuery(sentMailQueryOptions(workshopId));
}
