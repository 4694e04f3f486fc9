import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { createBrowserRouter, RouterProvider, type RouteObject } from 'react-router';
import { PageLoader } from '../components/ui/page-loader';
import { paths } from '../config/paths';
import { guestOnlyLoader, requireUserLoader } from './guards';
import { ErrorPage } from './routes/error-page';
import { Layout } from './routes/layout';

/**
 * Every screen is its own chunk, fetched on first visit; the layout and the error page are
 * in the entry so that a failed chunk still has somewhere to land.
 */
export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: paths.home.path,
      element: <Layout />,
      errorElement: <ErrorPage />,
      hydrateFallbackElement: <PageLoader />,
      children: [
        {
          errorElement: <ErrorPage />,
          children: [
            {
              index: true,
              lazy: async () => ({ Component: (await import('./routes/home')).HomeRoute }),
            },
            {
              path: paths.howBookingWorks.path,
              lazy: async () => ({
                Component: (await import('./routes/how-booking-works')).HowBookingWorksRoute,
              }),
            },
            {
              path: paths.myEvents.path,
              loader: requireUserLoader(queryClient),
              lazy: async () => ({ Component: (await import('./routes/my-events')).MyEventsRoute }),
            },
            {
              path: paths.signIn.path,
              loader: guestOnlyLoader(queryClient),
              lazy: async () => ({ Component: (await import('./routes/sign-in')).SignInRoute }),
            },
            {
              path: paths.createAccount.path,
              loader: guestOnlyLoader(queryClient),
              lazy: async () => ({
                Component: (await import('./routes/create-account')).CreateAccountRoute,
              }),
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
