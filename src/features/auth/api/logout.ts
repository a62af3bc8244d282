import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { authKeys } from './keys';

export const logout = () => api.post<void>('/api/auth/logout', undefined, { authRedirect: false });

export function useLogout() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: logout,
    onSettled: () => {
      // Signed out (or the session had already ended): forget everything this user saw.
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), null);
    },
  });
}
