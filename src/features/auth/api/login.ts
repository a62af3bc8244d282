import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LoginInput, MeDto } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { authKeys } from './keys';

export const login = (input: LoginInput) => api.post<MeDto>('/api/auth/login', input, { authRedirect: false });

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    meta: { inlineErrors: true },
    onSuccess: (me) => {
      // Another user's cached data must never show: start clean, then remember who this is.
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
