import type { QueryClient } from '@tanstack/react-query';
import { useEffect, useMemo } from 'react';
import { createBrowserRouter, Outlet, RouterProvider, type RouteObject } from 'react-router-dom';
import { RouteError } from '../components/errors/route-error';
import { paths } from '../config/paths';
import { authKeys } from '../features/auth/api/keys';
import { api } from '../lib/api-client';
import * as designRoute from './routes/design';
import * as designsRoute from './routes/designs';
import * as homeRoute from './routes/home';
import * as membersRoute from './routes/members';
import { NotFoundRoute } from './routes/not-found';
import * as signedInRoute from './routes/signed-in';
import * as signInRoute from './routes/sign-in';
import * as signUpRoute from './routes/sign-up';
import * as workshopRoute from './routes/workshop';
import * as workshopsRoute from './routes/workshops';

/** The route tree; loaders warm the query cache with the same query options the pages read. */
export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      element: <Outlet />,
      errorElement: <RouteError />,
      children: [
        { path: paths.signIn.path, loader: signInRoute.clientLoader(queryClient), element: <signInRoute.SignInRoute /> },
        { path: paths.signUp.path, loader: signUpRoute.clientLoader(queryClient), element: <signUpRoute.SignUpRoute /> },
        {
          id: 'signed-in',
          loader: signedInRoute.clientLoader(queryClient),
          element: <Outlet />,
          errorElement: <RouteError />,
          children: [
            { index: true, loader: homeRoute.clientLoader(queryClient) },
            { path: paths.workshops.path, element: <workshopsRoute.WorkshopsRoute /> },
            {
              path: paths.workshop.path,
              loader: workshopRoute.clientLoader(queryClient),
              element: <workshopRoute.WorkshopRoute />,
              errorElement: <RouteError />,
              children: [
                { index: true, loader: workshopRoute.indexLoader },
                { path: 'designs', loader: designsRoute.clientLoader(queryClient), element: <designsRoute.DesignsRoute />, errorElement: <RouteError /> },
                {
                  path: 'designs/:designId',
                  loader: designRoute.clientLoader(queryClient),
                  element: <designRoute.DesignRoute />,
                  errorElement: <RouteError />,
                },
                { path: 'members', loader: membersRoute.clientLoader(queryClient), element: <membersRoute.MembersRoute />, errorElement: <RouteError /> },
              ],
            },
          ],
        },
        { path: '*', element: <NotFoundRoute /> },
      ],
    },
  ];
}

export function AppRouter({ queryClient }: { queryClient: QueryClient }) {
  const router = useMemo(() => createBrowserRouter(createRoutes(queryClient)), [queryClient]);

  // A 401 from any request (the session ended): forget the user and go to sign-in, coming back afterwards.
  useEffect(() => {
    api.setOnUnauthorized(() => {
      queryClient.setQueryData(authKeys.me(), null);
      const { pathname, search } = router.state.location;
      if (pathname === paths.signIn.path || pathname === paths.signUp.path) return;
      void router.navigate(paths.signIn.getHref(pathname + search));
    });
    return () => api.setOnUnauthorized(undefined);
  }, [queryClient, router]);

  return <RouterProvider router={router} />;
}
