// The preview server's own tests (`npm test` runs them after the app's): the storefront's Vite
// settings (so src/ resolves as in the build), in Node rather than jsdom, as the server runs.
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';
import storefrontConfig from '../vite.config.js';

const storefront = storefrontConfig({ command: 'serve', mode: 'test' });

export default defineConfig({
  ...storefront,
  root: fileURLToPath(new URL('..', import.meta.url)),
  test: {
    environment: 'node',
    include: ['server/**/*.test.ts'],
    // Whole pages rendered with Chakra on a busy 2-core machine.
    testTimeout: 20_000,
  },
});
