import { PageLoader } from '@nappe/web-kit/react';
import type { QueryClient } from '@tanstack/react-query';
import { Navigate, type RouteObject } from 'react-router';
import { paths } from '../config/paths';
import { homeScreen, menusScreen, screenRecipes } from './first-screens';
import { guestOnlyLoader, requireUserLoader } from './guards';
import { ErrorPage } from './routes/error-page';
import { Layout } from './routes/layout';
import {
  homeLoader,
  layoutLoader,
  menuDetailLoader,
  menusLoader,
  type ScreenLoaderOptions,
} from './screen-loaders';

/**
 * Every screen is its own chunk, fetched on first visit; the layout and the error page are
 * in the entry so that a failed chunk still has somewhere to land. The loaders of the screens a
 * visit usually starts on are in the entry too, so that their data and their code load together.
 */
export function createRoutes(
  queryClient: QueryClient,
  options: ScreenLoaderOptions = {},
): RouteObject[] {
  return withScreenRecipes([
    {
      path: paths.home.path,
      element: <Layout />,
      errorElement: <ErrorPage />,
      hydrateFallbackElement: <PageLoader />,
      loader: layoutLoader(queryClient, options),
      // The studio's card is asked for once; the screens keep it fresh.
      shouldRevalidate: () => false,
      children: [
        {
          errorElement: <ErrorPage />,
          children: [
            {
              index: true,
              loader: homeLoader(queryClient, options),
              lazy: async () => ({ Component: (await homeScreen()).HomeRoute }),
            },
            {
              path: paths.howBookingWorks.path,
              lazy: async () => ({
                Component: (await import('./routes/how-booking-works')).HowBookingWorksRoute,
              }),
            },
            {
              path: paths.menus.path,
              loader: menusLoader(queryClient, options),
              lazy: async () => ({ Component: (await menusScreen()).MenusRoute }),
            },
            {
              path: paths.menu.path,
              loader: menuDetailLoader(queryClient),
              lazy: async () => ({
                Component: (await import('./routes/menu-detail')).MenuDetailRoute,
              }),
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
              path: paths.forgotPassword.path,
              loader: guestOnlyLoader(queryClient),
              lazy: async () => ({
                Component: (await import('./routes/forgot-password')).ForgotPasswordRoute,
              }),
            },
            {
              // Open to anyone with the link, signed in or not: the new password ends every session.
              path: paths.resetPassword.path,
              lazy: async () => ({
                Component: (await import('./routes/reset-password')).ResetPasswordRoute,
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
  ]);
}

/**
 * Every screen's `lazy` also loads the recipes of the screens' components (theme/screen-recipes),
 * in parallel with the screen's own code, so that they are never startup JavaScript and are in
 * place before any screen renders.
 */
function withScreenRecipes(routes: RouteObject[]): RouteObject[] {
  return routes.map((route) => {
    const { lazy, children } = route;
    const withRecipes = typeof lazy === 'function' ? { lazy: loadingScreenRecipes(lazy) } : {};
    return {
      ...route,
      ...withRecipes,
      ...(children ? { children: withScreenRecipes(children) } : {}),
    } as RouteObject;
  });
}

function loadingScreenRecipes<T>(lazy: () => Promise<T>): () => Promise<T> {
  return async () => (await Promise.all([lazy(), screenRecipes()]))[0];
}
