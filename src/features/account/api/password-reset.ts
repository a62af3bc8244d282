import { queryOptions, useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export const requestPasswordLink = (email: string) => api.post<{ message: string }>('/api/password-reset', { email }, { authRedirect: false });

export function useRequestPasswordLink() {
  return useMutation({ mutationFn: requestPasswordLink, meta: { inlineErrors: true } });
}

export const passwordLinkQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ['password-link', token] as const,
    queryFn: () => api.get<{ email: string }>(`/api/password-reset/${encodeURIComponent(token)}`, { authRedirect: false }),
    retry: false,
    staleTime: Infinity,
  });

export function useResetPassword(token: string) {
  return useMutation({
    mutationFn: (password: string) => api.post<void>(`/api/password-reset/${encodeURIComponent(token)}`, { password }, { authRedirect: false }),
    meta: { inlineErrors: true },
  });
}
