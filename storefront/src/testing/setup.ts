import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterAll, afterEach } from 'vitest';
import { api } from '../lib/api-client';
import { server } from './server';

// Lazy route chunks load on first visit; on a busy 2-core machine that can take over a second.
configure({ asyncUtilTimeout: 4000 });

// Listening before the test file's own imports run (not in beforeAll, which comes after them): a
// request a module makes as it is imported meets the fake API too, never a real server on this
// origin (jsdom's http://localhost:3000 is where the demo's API listens).
server.listen({ onUnhandledRequest: 'error' });
afterEach(() => {
  cleanup();
  server.resetHandlers();
  api.clearSession();
  window.sessionStorage.clear();
  window.localStorage.clear();
});
afterAll(() => server.close());

// jsdom lacks a few browser APIs that Chakra's components ask for.
if (!window.matchMedia) {
  window.matchMedia = (query: string) =>
    ({
      matches: false,
      media: query,
      onchange: null,
      addListener: () => {},
      removeListener: () => {},
      addEventListener: () => {},
      removeEventListener: () => {},
      dispatchEvent: () => false,
    }) as MediaQueryList;
}
window.scrollTo = (() => {}) as typeof window.scrollTo;
