import type { QueryClient } from '@tanstack/react-query';
import { redirect, useRouteLoaderData, type LoaderFunctionArgs } from 'react-router-dom';
import type { MeDto } from '../../../shared/schemas/api.schema';
import { paths } from '../../config/paths';
import { meQueryOptions, useMe } from '../../features/auth/api/get-me';

/** Every page below needs a signed-in user; without one, go to sign-in and come back afterwards. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs): Promise<MeDto> => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (!me) {
      const url = new URL(request.url);
      throw redirect(paths.signIn.getHref(url.pathname + url.search));
    }
    return me;
  };

/** The signed-in user: live from the query cache, falling back to what the loader saw. */
export function useSignedInUser(): MeDto {
  const fromLoader = useRouteLoaderData('signed-in') as MeDto;
  const { data } = useMe();
  return data ?? fromLoader;
}
