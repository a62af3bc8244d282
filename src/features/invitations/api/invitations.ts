import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { InvitationDto, InvitationInput, InvitationPreviewDto, ListDto } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';

export const invitationKeys = {
  all: ['invitations'] as const,
  list: (workshopId: number) => [...invitationKeys.all, workshopId] as const,
  preview: (token: string) => [...invitationKeys.all, 'link', token] as const,
};

export const invitationsQueryOptions = (workshopId: number) =>
  queryOptions({
    queryKey: invitationKeys.list(workshopId),
    queryFn: () => api.get<ListDto<InvitationDto>>(`/api/workshops/${workshopId}/invitations`).then((r) => r.items),
  });

export function useInvitations(workshopId: number) {
  return useQuery(invitationsQueryOptions(workshopId));
}

export function useInvite(workshopId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InvitationInput) => api.post<InvitationDto>(`/api/workshops/${workshopId}/invitations`, input),
    meta: { inlineErrors: true },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationKeys.list(workshopId) }),
  });
}

export function useRevokeInvitation(workshopId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete(`/api/workshops/${workshopId}/invitations/${id}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationKeys.list(workshopId) }),
  });
}

export const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: invitationKeys.preview(token),
    queryFn: () => api.get<InvitationPreviewDto>(`/api/invitations/${encodeURIComponent(token)}`, { authRedirect: false }),
    retry: false,
  });

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (password: string | undefined) =>
      api.post<{ workshopId: number }>(`/api/invitations/${encodeURIComponent(token)}/accept`, password ? { password } : {}, { authRedirect: false }),
    meta: { inlineErrors: true },
    // The person may now be signed in, with a new membership.
    onSuccess: () => queryClient.invalidateQueries(),
  });
}
