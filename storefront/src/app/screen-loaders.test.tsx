import { screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { summerMenu } from '../testing/booking-fixtures';
import { renderApp } from '../testing/render-app';
import { preloadMenus } from './screen-loaders';

afterEach(() => {
  for (const link of document.head.querySelectorAll('link[rel="preload"]')) link.remove();
});

describe('Menus asks for its largest image ahead of the card that shows it', () => {
  it('with the srcset and sizes of the first card’s <img>, so the browser reuses the answer', async () => {
    // HTML Standard, "Link type preload" (from memory): an image preload is matched to the <img>
    // that needs it by its imagesrcset and imagesizes, which must equal the img's srcset and sizes.
    preloadMenus(new URL('http://localhost/menus'));
    const link = await waitFor(() => {
      const found = document.head.querySelector('link[rel="preload"][as="image"]');
      expect(found).not.toBeNull();
      return found!;
    });
    expect(link.getAttribute('fetchpriority')).toBe('high');

    renderApp('/menus');
    const card = await screen.findByRole('article', { name: summerMenu.name });
    const img = card.querySelector('img')!;
    expect(img).toHaveAttribute('loading', 'eager');
    expect(link.getAttribute('imagesrcset')).toBe(img.getAttribute('srcset'));
    expect(link.getAttribute('imagesizes')).toBe(img.getAttribute('sizes'));
    expect(img.getAttribute('srcset')).toContain(summerMenu.photos[0]!.url);
  });
});
