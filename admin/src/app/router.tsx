import { PageLoader } from '@nappe/web-kit/react';
import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { createBrowserRouter, redirect, RouterProvider, type RouteObject } from 'react-router';
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
      path: paths.acceptInvitation.path,
      errorElement: <ErrorPage />,
      hydrateFallbackElement: <PageLoader />,
      lazy: async () => ({
        Component: (await import('./routes/accept-invitation')).AcceptInvitationRoute,
      }),
    },
    {
      path: paths.forgotPassword.path,
      loader: guestOnlyLoader(queryClient),
      errorElement: <ErrorPage />,
      hydrateFallbackElement: <PageLoader />,
      lazy: async () => ({
        Component: (await import('./routes/forgot-password')).ForgotPasswordRoute,
      }),
    },
    {
      // Open to anyone with the link, signed in or not: the new password ends every session.
      path: paths.resetPassword.path,
      errorElement: <ErrorPage />,
      hydrateFallbackElement: <PageLoader />,
      lazy: async () => ({
        Component: (await import('./routes/reset-password')).ResetPasswordRoute,
      }),
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
            ...kitchenRoutes(queryClient),
            ...prepRoutes(queryClient),
            ...allergyNotesRoutes(queryClient),
            ...ordersRoutes(queryClient),
            ...studioRoutes(queryClient),
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

/** Kitchen: Ingredients, Recipes, Desserts, Menus — each screen its own chunk. */
function kitchenRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    { path: 'kitchen', loader: () => redirect(paths.ingredients.getHref()) },
    {
      path: paths.ingredients.path,
      lazy: async () => {
        const m = await import('./routes/kitchen/ingredients');
        return { Component: m.IngredientsRoute, loader: m.ingredientsLoader(queryClient) };
      },
    },
    {
      path: paths.newIngredient.path,
      lazy: async () => {
        const m = await import('./routes/kitchen/ingredient');
        return { Component: m.IngredientRoute, loader: m.ingredientLoader(queryClient) };
      },
    },
    {
      path: paths.ingredient.path,
      lazy: async () => {
        const m = await import('./routes/kitchen/ingredient');
        return { Component: m.IngredientRoute, loader: m.ingredientLoader(queryClient) };
      },
    },
    {
      path: paths.recipes.path,
      lazy: async () => {
        const m = await import('./routes/kitchen/recipes');
        return { Component: m.RecipesRoute, loader: m.recipesLoader(queryClient) };
      },
    },
    {
      path: paths.newRecipe.path,
      lazy: async () => {
        const m = await import('./routes/kitchen/recipe');
        return { Component: m.RecipeRoute, loader: m.recipeLoader(queryClient) };
      },
    },
    {
      path: paths.recipe.path,
      lazy: async () => {
        const m = await import('./routes/kitchen/recipe');
        return { Component: m.RecipeRoute, loader: m.recipeLoader(queryClient) };
      },
    },
    {
      path: paths.recipeScale.path,
      lazy: async () => {
        const m = await import('./routes/kitchen/recipe-scale');
        return { Component: m.RecipeScaleRoute, loader: m.recipeScaleLoader(queryClient) };
      },
    },
    {
      path: paths.desserts.path,
      lazy: async () => {
        const m = await import('./routes/kitchen/desserts');
        return { Component: m.DessertsRoute, loader: m.dessertsLoader(queryClient) };
      },
    },
    {
      path: paths.newDessert.path,
      lazy: async () => {
        const m = await import('./routes/kitchen/dessert');
        return { Component: m.DessertRoute, loader: m.dessertLoader(queryClient) };
      },
    },
    {
      path: paths.dessert.path,
      lazy: async () => {
        const m = await import('./routes/kitchen/dessert');
        return { Component: m.DessertRoute, loader: m.dessertLoader(queryClient) };
      },
    },
    {
      path: paths.menus.path,
      lazy: async () => {
        const m = await import('./routes/kitchen/menus');
        return { Component: m.MenusRoute, loader: m.menusLoader(queryClient) };
      },
    },
    {
      path: paths.newMenu.path,
      lazy: async () => {
        const m = await import('./routes/kitchen/menu');
        return { Component: m.MenuRoute, loader: m.menuLoader(queryClient) };
      },
    },
    {
      path: paths.menu.path,
      lazy: async () => {
        const m = await import('./routes/kitchen/menu');
        return { Component: m.MenuRoute, loader: m.menuLoader(queryClient) };
      },
    },
  ];
}

/** Prep: Plan, Schedule, Labels — each screen its own chunk. */
function prepRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    { path: 'prep', loader: () => redirect(paths.prepPlan.getHref()) },
    {
      path: paths.prepPlan.path,
      lazy: async () => {
        const m = await import('./routes/prep/plan');
        return { Component: m.PrepPlanRoute, loader: m.prepPlanLoader(queryClient) };
      },
    },
    {
      path: paths.prepSchedule.path,
      lazy: async () => {
        const m = await import('./routes/prep/schedule');
        return { Component: m.PrepScheduleRoute, loader: m.prepScheduleLoader(queryClient) };
      },
    },
    {
      path: paths.prepLabels.path,
      lazy: async () => {
        const m = await import('./routes/prep/labels');
        return { Component: m.PrepLabelsRoute, loader: m.prepLabelsLoader(queryClient) };
      },
    },
  ];
}

/** Allergy notes: the list of events, one event's notes, its staff briefing — each its own chunk. */
function allergyNotesRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: paths.allergyNotes.path,
      lazy: async () => {
        const m = await import('./routes/allergy-notes/allergy-notes');
        return { Component: m.AllergyNotesRoute, loader: m.allergyNotesLoader(queryClient) };
      },
    },
    {
      path: paths.orderAllergyNotes.path,
      lazy: async () => {
        const m = await import('./routes/allergy-notes/order-allergy-notes');
        return {
          Component: m.OrderAllergyNotesRoute,
          loader: m.orderAllergyNotesLoader(queryClient),
        };
      },
    },
    {
      path: paths.briefing.path,
      lazy: async () => {
        const m = await import('./routes/allergy-notes/briefing');
        return { Component: m.BriefingRoute, loader: m.briefingLoader(queryClient) };
      },
    },
  ];
}

/** Orders (the inbox and one order) and the Calendar — each screen its own chunk. */
function ordersRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: paths.orders.path,
      lazy: async () => {
        const m = await import('./routes/orders/orders');
        return { Component: m.OrdersRoute, loader: m.ordersLoader(queryClient) };
      },
    },
    {
      path: paths.order.path,
      lazy: async () => {
        const m = await import('./routes/orders/order');
        return { Component: m.OrderRoute, loader: m.orderLoader(queryClient) };
      },
    },
    {
      path: paths.calendar.path,
      lazy: async () => {
        const m = await import('./routes/calendar');
        return { Component: m.CalendarRoute, loader: m.calendarLoader(queryClient) };
      },
    },
  ];
}

/** Insights and Studio → Settings (chef): each screen its own chunk; recharts only in Insights'. */
function studioRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: paths.insights.path,
      lazy: async () => {
        const m = await import('./routes/insights');
        return { Component: m.InsightsRoute, loader: m.insightsLoader(queryClient) };
      },
    },
    {
      path: paths.settings.path,
      lazy: async () => {
        const m = await import('./routes/studio/settings');
        return { Component: m.SettingsRoute, loader: m.settingsLoader(queryClient) };
      },
    },
  ];
}

export function AppRouter({ queryClient }: { queryClient: QueryClient }) {
  const [router] = useState(() => createBrowserRouter(createRoutes(queryClient)));
  return <RouterProvider router={router} />;
}
