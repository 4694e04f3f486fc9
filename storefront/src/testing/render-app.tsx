import { createQueryClient } from '@nappe/web-kit/react';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { AppProvider } from '../app/provider';
import { createRoutes } from '../app/router';

/** Renders the whole app, as the browser would, at `url`. */
export function renderApp(url: string) {
  const queryClient = createQueryClient({ queries: { retry: false } });
  const router = createMemoryRouter(createRoutes(queryClient), { initialEntries: [url] });
  const user = userEvent.setup();
  const view = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...view, user, router, queryClient };
}
