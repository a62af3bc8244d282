import type { QueryClient } from '@tanstack/react-query';
import { useEffect, useMemo } from 'react';
import { createBrowserRouter, Outlet, RouterProvider, type RouteObject } from 'react-router-dom';
import { RouteError } from '../components/errors/route-error';
import { paths } from '../config/paths';
import { authKeys } from '../features/auth/api/keys';
import { AppLoading } from '../components/layouts/app-loading';
import { api, ApiError } from '../lib/api-client';
import * as accountLinks from './routes/account-links';
import * as homeRoute from './routes/home';
import { NotFoundRoute } from './routes/not-found';
import * as signedInRoute from './routes/signed-in';
import * as signInRoute from './routes/sign-in';
import * as signUpRoute from './routes/sign-up';
import * as workshopRoute from './routes/workshop';
import * as workshopsRoute from './routes/workshops';

type LazyPage = Awaited<ReturnType<Exclude<Extract<RouteObject['lazy'], (...args: never[]) => unknown>, undefined>>>;

/**
 * A page's code, loaded on its first visit. When it cannot be fetched (the server stopped, or a new version
 * replaced the files) the route's loader fails with a plain ApiError instead, so RouteError says what happened
 * and offers Reload; a failed `lazy` itself would leave a blank page.
 */
export function page(load: () => Promise<LazyPage>): () => Promise<LazyPage> {
  return async () => {
    try {
      return await load();
    } catch {
      return {
        loader: () => {
          throw new ApiError(0, 'page_not_loaded', 'This page could not be loaded: the server did not answer. Check the connection, then reload the page.');
        },
      };
    }
  };
}

/** The route tree; loaders warm the query cache with the same query options the pages read. */
export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      element: <Outlet />,
      errorElement: <RouteError />,
      // Shown while the first page's data loads (the signed-in check, the workshop).
      hydrateFallbackElement: <AppLoading />,
      children: [
        { path: paths.signIn.path, loader: signInRoute.clientLoader(queryClient), element: <signInRoute.SignInRoute /> },
        { path: paths.signUp.path, loader: signUpRoute.clientLoader(queryClient), element: <signUpRoute.SignUpRoute /> },
        // Pages opened from e-mailed links, and the "forgot password" form: no sign-in needed.
        { path: paths.forgotPassword.path, element: <accountLinks.ForgotPasswordRoute /> },
        { path: paths.resetPassword.path, element: <accountLinks.ResetPasswordRoute /> },
        { path: paths.invite.path, loader: accountLinks.meLoader(queryClient), element: <accountLinks.InviteRoute /> },
        {
          path: paths.sharedPlan.path,
          lazy: page(async () => ({ Component: (await import('./routes/shared-plan')).SharedPlanRoute })),
        },
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
                // The workshop pages load on first visit, so sign-in stays light.
                {
                  path: 'designs',
                  errorElement: <RouteError />,
                  lazy: page(async () => {
                    const m = await import('./routes/designs');
                    return { loader: m.clientLoader(queryClient), Component: m.DesignsRoute };
                  }),
                },
                {
                  path: 'designs/:designId',
                  errorElement: <RouteError />,
                  lazy: page(async () => {
                    const m = await import('./routes/design');
                    return { loader: m.clientLoader(queryClient), Component: m.DesignRoute };
                  }),
                },
                {
                  path: 'builds',
                  errorElement: <RouteError />,
                  lazy: page(async () => {
                    const m = await import('./routes/builds');
                    return { loader: m.clientLoader(queryClient), Component: m.BuildsRoute };
                  }),
                },
                {
                  path: 'builds/:buildId',
                  errorElement: <RouteError />,
                  lazy: page(async () => {
                    const m = await import('./routes/build');
                    return { loader: m.clientLoader(queryClient), Component: m.BuildRoute };
                  }),
                },
                {
                  path: 'cut-plans/:planId',
                  errorElement: <RouteError />,
                  lazy: page(async () => {
                    const m = await import('./routes/cut-plan');
                    return { loader: m.clientLoader(queryClient), Component: m.CutPlanRoute };
                  }),
                },
                {
                  path: 'stock',
                  errorElement: <RouteError />,
                  lazy: page(async () => {
                    const m = await import('./routes/stock');
                    return { loader: m.clientLoader(queryClient), Component: m.StockRoute };
                  }),
                },
                {
                  path: 'checklists',
                  errorElement: <RouteError />,
                  lazy: page(async () => {
                    const m = await import('./routes/checklists');
                    return { loader: m.clientLoader(queryClient), Component: m.ChecklistsRoute };
                  }),
                },
                {
                  path: 'cut-plans/:planId/checklist',
                  errorElement: <RouteError />,
                  lazy: page(async () => {
                    const m = await import('./routes/checklist');
                    return { loader: m.clientLoader(queryClient), Component: m.ChecklistRoute };
                  }),
                },
                {
                  path: 'cut-plans/:planId/share',
                  errorElement: <RouteError />,
                  lazy: page(async () => {
                    const m = await import('./routes/share-plan');
                    return { loader: m.clientLoader(queryClient), Component: m.SharePlanRoute };
                  }),
                },
                {
                  path: 'invitations',
                  errorElement: <RouteError />,
                  lazy: page(async () => {
                    const m = await import('./routes/invitations');
                    return { loader: m.clientLoader(queryClient), Component: m.InvitationsRoute };
                  }),
                },
                {
                  path: 'sent-mail',
                  errorElement: <RouteError />,
                  lazy: page(async () => {
                    const m = await import('./routes/sent-mail');
                    return { loader: m.clientLoader(queryClient), Component: m.SentMailRoute };
                  }),
                },
                {
                  path: 'members',
                  errorElement: <RouteError />,
                  lazy: page(async () => {
                    const m = await import('./routes/members');
                    return { loader: m.clientLoader(queryClient), Component: m.MembersRoute };
                  }),
                },
                {
                  path: 'settings',
                  errorElement: <RouteError />,
                  lazy: page(async () => {
                    const m = await import('./routes/workshop-settings');
                    return { loader: m.clientLoader(queryClient), Component: m.WorkshopSettingsRoute };
                  }),
                },
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
