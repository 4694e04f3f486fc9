import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { PREBUILT_PATH_ATTRIBUTE } from '../config/prebuilt';
import { render } from '../prerender';
import { summerMenu } from '../testing/booking-fixtures';
import { studioCard } from '../testing/fixtures';
import { startApp, type StartedApp } from './start-app';

/*
 * The pages rendered at build time must be taken over by React as they are. React's contract
 * for hydrateRoot (react.dev, "hydrateRoot": the first render must output the same markup as the
 * server; a mismatch is a bug React reports as a recoverable error and repairs by drawing the
 * page again on the client) is checked here: same nodes kept, no recoverable error.
 */

let started: StartedApp | undefined;
afterEach(() => {
  started?.root.unmount();
  started = undefined;
  document.body.replaceChildren();
  window.history.replaceState(null, '', '/');
});

/** Puts the build-time markup of `path` in the page, as the server sends it, at `address`. */
async function servePrebuilt(path: string, address = path) {
  const markup = await render(path);
  window.history.replaceState(null, '', address);
  const container = document.createElement('div');
  container.id = 'root';
  container.setAttribute(PREBUILT_PATH_ATTRIBUTE, path);
  container.innerHTML = markup;
  document.body.append(container);
  return container;
}

describe('pages rendered at build time', () => {
  it('Home: React takes the markup over without redrawing it, then fills in the data', async () => {
    const container = await servePrebuilt('/');
    const heading = screen.getByRole('heading', { level: 1 });
    expect(screen.getByText('A dessert studio')).toBeInTheDocument();
    const recoverable = vi.fn();

    started = await startApp(container, { onRecoverableError: recoverable });

    expect(started.hydrated).toBe(true);
    expect(await screen.findByText(`${studioCard.name} · ${studioCard.city}`)).toBeInTheDocument();
    const hero = within(screen.getByRole('region', { name: /evenings that matter/ }));
    expect(await hero.findByText(/^Plated desserts, finished at your table\./)).toBeInTheDocument();
    expect(screen.getByRole('heading', { level: 1 })).toBe(heading);
    expect(recoverable).not.toHaveBeenCalled();
  });

  it('Menus: the loading shapes are taken over, then the cards replace them', async () => {
    const container = await servePrebuilt('/menus');
    const heading = screen.getByRole('heading', { level: 1, name: 'Menus' });
    expect(screen.getByRole('status', { name: 'Loading the menus' })).toBeInTheDocument();
    const recoverable = vi.fn();

    started = await startApp(container, { onRecoverableError: recoverable });

    expect(await screen.findByRole('article', { name: summerMenu.name })).toBeInTheDocument();
    expect(screen.getByRole('heading', { level: 1, name: 'Menus' })).toBe(heading);
    expect(recoverable).not.toHaveBeenCalled();
  });

  it('markup rendered for another address is dropped: that page draws itself', async () => {
    // A static server answers every unknown address with index.html, which holds Home.
    const container = await servePrebuilt('/', '/how-booking-works');

    started = await startApp(container);

    expect(started.hydrated).toBe(false);
    expect(
      await screen.findByRole('heading', { level: 1, name: 'How booking works' }),
    ).toBeInTheDocument();
    await waitFor(() =>
      expect(screen.queryByRole('heading', { name: /evenings that matter/ })).toBeNull(),
    );
  });
});
