import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { createBrowserRouter, RouterProvider, type RouteObject } from 'react-router';
import { PageLoader } from '../components/ui/page-loader';
import { paths } from '../config/paths';
import { guestOnlyLoader, requireTeamMemberLoader } from './guards';
import { ErrorPage } from './routes/error-page';
import { Layout } from './routes/layout';

/**
 * Every screen is its own chunk, fetched on first visit; the shell and the error page are in
 * the entry so that a failed chunk still has somewhere to land.
 */
export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: paths.signIn.path,
      loader: guestOnlyLoader(queryClient),
      errorElement: <ErrorPage />,
      hydrateFallbackElement: <PageLoader />,
      lazy: async () => ({ Component: (await import('./routes/sign-in')).SignInRoute }),
    },
    {
      path: paths.today.path,
      element: <Layout />,
      loader: requireTeamMemberLoader(queryClient),
      errorElement: <ErrorPage />,
      hydrateFallbackElement: <PageLoader />,
      children: [
        {
          errorElement: <ErrorPage />,
          children: [
            {
              index: true,
              lazy: async () => ({ Component: (await import('./routes/today')).TodayRoute }),
            },
            {
              path: paths.team.path,
              lazy: async () => {
                const { TeamRoute, teamLoader } = await import('./routes/team');
                return { Component: TeamRoute, loader: teamLoader(queryClient) };
              },
            },
            {
              path: '*',
              lazy: async () => ({ Component: (await import('./routes/not-found')).NotFoundRoute }),
            },
          ],
        },
      ],
    },
  ];
}

export function AppRouter({ queryClient }: { queryClient: QueryClient }) {
  const [router] = useState(() => createBrowserRouter(createRoutes(queryClient)));
  return <RouterProvider router={router} />;
}
