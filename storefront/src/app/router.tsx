import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { createBrowserRouter, Navigate, RouterProvider, type RouteObject } from 'react-router';
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
              path: paths.menus.path,
              lazy: async () => {
                const m = await import('./routes/menus');
                return { Component: m.MenusRoute, loader: m.menusLoader(queryClient) };
              },
            },
            {
              path: paths.menu.path,
              lazy: async () => {
                const m = await import('./routes/menu-detail');
                return { Component: m.MenuDetailRoute, loader: m.menuDetailLoader(queryClient) };
              },
            },
            {
              path: paths.dates.path,
              lazy: async () => {
                const m = await import('./routes/dates');
                return {
                  Component: m.DatesRoute,
                  loader: m.datesLoader(queryClient),
                  shouldRevalidate: m.shouldRevalidate,
                };
              },
            },
            {
              path: paths.book.path,
              lazy: async () => {
                const m = await import('./routes/book/book-layout');
                return { Component: m.BookLayoutRoute, loader: m.bookLoader(queryClient) };
              },
              children: [
                { index: true, element: <Navigate to="event" replace /> },
                {
                  path: 'event',
                  lazy: async () => ({
                    Component: (await import('./routes/book/event-step')).EventStepRoute,
                  }),
                },
                {
                  path: 'guests',
                  lazy: async () => ({
                    Component: (await import('./routes/book/guests-step')).GuestsStepRoute,
                  }),
                },
                {
                  path: 'review',
                  lazy: async () => ({
                    Component: (await import('./routes/book/review-step')).ReviewStepRoute,
                  }),
                },
                {
                  path: 'payment',
                  // Booking needs an account: a visitor signs in here and comes straight back.
                  loader: requireUserLoader(queryClient),
                  lazy: async () => ({
                    Component: (await import('./routes/book/payment-step')).PaymentStepRoute,
                  }),
                },
              ],
            },
            {
              path: paths.myEvents.path,
              lazy: async () => {
                const m = await import('./routes/my-events');
                return { Component: m.MyEventsRoute, loader: m.myEventsLoader(queryClient) };
              },
            },
            {
              path: paths.event.path,
              lazy: async () => {
                const m = await import('./routes/event-detail');
                return {
                  Component: m.EventDetailRoute,
                  loader: m.eventDetailLoader(queryClient),
                  shouldRevalidate: m.shouldRevalidate,
                };
              },
            },
            {
              path: paths.changeGuests.path,
              lazy: async () => {
                const m = await import('./routes/change-guests');
                return {
                  Component: m.ChangeGuestsRoute,
                  loader: m.changeGuestsLoader(queryClient),
                };
              },
            },
            {
              path: paths.booked.path,
              lazy: async () => {
                const m = await import('./routes/booked');
                return { Component: m.BookedRoute, loader: m.bookedLoader(queryClient) };
              },
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
