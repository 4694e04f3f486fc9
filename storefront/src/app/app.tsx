import type { QueryClient } from '@tanstack/react-query';
import { StrictMode } from 'react';
import { RouterProvider, type DataRouter } from 'react-router';
import { AppProvider } from './provider';

/** The whole app: the same tree in the browser and in the build-time render (prerender.tsx). */
export function App({ queryClient, router }: { queryClient: QueryClient; router: DataRouter }) {
  return (
    <StrictMode>
      <AppProvider queryClient={queryClient}>
        <RouterProvider router={router} />
      </AppProvider>
    </StrictMode>
  );
}

/** Settles once the router has the first screen's code and loader results (or its error). */
export function routerInitialized(router: DataRouter): Promise<void> {
  return new Promise((resolve) => {
    if (router.state.initialized) return resolve();
    const unsubscribe = router.subscribe((state) => {
      if (!state.initialized) return;
      unsubscribe();
      resolve();
    });
  });
}
