import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeDto } from '../../../../shared/schemas/api.schema';
import { authKeys } from './keys';

/**
 * A request that ends signed in (sign-in, sign-up): another user's cached data must never show, so the
 * cache starts clean and then remembers who this is. Errors are shown by the form.
 */
export function useSignInMutation<TInput>(request: (input: TInput) => Promise<MeDto>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: request,
    meta: { inlineErrors: true },
    onSuccess: (me) => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
