import { ChakraProvider, defaultSystem } from '@chakra-ui/react';
import { act, render, screen } from '@testing-library/react';
import { createMemoryRouter, Outlet, RouterProvider } from 'react-router';
import { describe, expect, it } from 'vitest';
import { NavigationProgress } from './navigation-progress.js';

/** A layout with the bar and two screens; the second's loader waits until `arrive()` is called. */
function renderRouter() {
  let arrive: () => void = () => {};
  const router = createMemoryRouter(
    [
      {
        path: '/',
        element: (
          <>
            <NavigationProgress />
            <Outlet />
          </>
        ),
        children: [
          { index: true, element: <p>First screen</p> },
          {
            path: 'next',
            loader: () => new Promise<null>((resolve) => (arrive = () => resolve(null))),
            element: <p>Next screen</p>,
          },
        ],
      },
    ],
    { initialEntries: ['/'] },
  );
  render(
    <ChakraProvider value={defaultSystem}>
      <RouterProvider router={router} />
    </ChakraProvider>,
  );
  return { router, arrive: () => arrive() };
}

// role="progressbar" with an accessible name (WAI-ARIA 1.2, the progressbar role; a bar with no
// aria-valuenow is indeterminate).
describe('NavigationProgress', () => {
  it('shows nothing while no screen is loading', async () => {
    renderRouter();
    expect(await screen.findByText('First screen')).toBeInTheDocument();
    expect(screen.queryByRole('progressbar')).not.toBeInTheDocument();
  });

  it('shows the bar while the next screen loads, and removes it once it has arrived', async () => {
    const { router, arrive } = renderRouter();
    await screen.findByText('First screen');

    let navigation: Promise<void> | undefined;
    act(() => {
      navigation = router.navigate('/next');
    });
    const bar = await screen.findByRole('progressbar', { name: 'Loading the next page' });
    expect(bar).not.toHaveAttribute('aria-valuenow');
    expect(screen.getByText('First screen')).toBeInTheDocument();

    await act(async () => {
      arrive();
      await navigation;
    });
    expect(screen.getByText('Next screen')).toBeInTheDocument();
    expect(screen.queryByRole('progressbar')).not.toBeInTheDocument();
  });
});
