import type { QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router-dom';
import { paths } from '../../config/paths';
import { meQueryOptions } from '../../features/auth/api/get-me';

/** `/`: straight to the designs of one's only workshop, or to the picker when there are several. */
export const clientLoader = (queryClient: QueryClient) => async () => {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (!me) throw redirect(paths.signIn.getHref());
  const only = me.memberships.length === 1 ? me.memberships[0] : undefined;
  throw redirect(only ? paths.designs.getHref(only.workshopId) : paths.workshops.getHref());
};
