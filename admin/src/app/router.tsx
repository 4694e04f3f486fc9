import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { createBrowserRouter, redirect, RouterProvider, type RouteObject } from 'react-router';
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
            ...kitchenRoutes(queryClient),
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

export function AppRouter({ queryClient }: { queryClient: QueryClient }) {
  const [router] = useState(() => createBrowserRouter(createRoutes(queryClient)));
  return <RouterProvider router={router} />;
}
