import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ListDto, SharedPlanDto, ShareLinkDto, ShareLinkInput } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';

export const shareKeys = {
  all: ['share-links'] as const,
  list: (workshopId: number, planId: number) => [...shareKeys.all, workshopId, planId] as const,
  shared: (token: string) => [...shareKeys.all, 'shared', token] as const,
};

const base = (workshopId: number, planId: number) => `/api/workshops/${workshopId}/cut-plans/${planId}/share-links`;

export const shareLinksQueryOptions = (workshopId: number, planId: number) =>
  queryOptions({ queryKey: shareKeys.list(workshopId, planId), queryFn: () => api.get<ListDto<ShareLinkDto>>(base(workshopId, planId)).then((r) => r.items) });

export function useShareLinks(workshopId: number, planId: number) {
  return useQuery(shareLinksQueryOptions(workshopId, planId));
}

export function useCreateShareLink(workshopId: number, planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ShareLinkInput) => api.post<ShareLinkDto>(base(workshopId, planId), input),
    meta: { inlineErrors: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shareKeys.list(workshopId, planId) }),
  });
}

export function useRevokeShareLink(workshopId: number, planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete(`${base(workshopId, planId)}/${id}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shareKeys.list(workshopId, planId) }),
  });
}

/** The public view of a share link (no account). */
export const sharedPlanQueryOptions = (token: string) =>
  queryOptions({
    queryKey: shareKeys.shared(token),
    queryFn: () => api.get<SharedPlanDto>(`/api/share/${encodeURIComponent(token)}`, { authRedirect: false }),
    retry: false,
    staleTime: 60_000,
  });

export const sharedExportHref = (token: string, file: string) => `/api/share/${encodeURIComponent(token)}/exports/${file}`;
