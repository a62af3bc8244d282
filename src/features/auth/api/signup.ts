import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeDto, SignupInput } from '../../../../shared/schemas/api.schema';
import { api } from '../../../lib/api-client';
import { authKeys } from './keys';

export const signup = (input: SignupInput) => api.post<MeDto>('/api/auth/signup', input, { authRedirect: false });

export function useSignup() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signup,
    meta: { inlineErrors: true },
    onSuccess: (me) => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
