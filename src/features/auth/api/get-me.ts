import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MeDto, MembershipDto } from '../../../../shared/schemas/api.schema';
import { api, isApiError } from '../../../lib/api-client';
import { authKeys } from './keys';

/** Who is signed in; `null` when nobody is (a 401 is an expected answer here, not an error). */
export async function getMe(): Promise<MeDto | null> {
  try {
    return await api.get<MeDto>('/api/auth/me', { authRedirect: false });
  } catch (error) {
    if (isApiError(error) && error.isUnauthorized) return null;
    throw error;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: getMe,
    staleTime: 5 * 60_000,
  });

export function useMe() {
  return useQuery(meQueryOptions());
}

export function findMembership(me: MeDto | null | undefined, workshopId: number): MembershipDto | undefined {
  return me?.memberships.find((m) => m.workshopId === workshopId);
}
