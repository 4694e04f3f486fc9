import react from '@vitejs/plugin-react';
import { readFileSync } from 'node:fs';
import { defaultClientConditions } from 'vite';
import { defineConfig } from 'vitest/config';

const apiProxy = {
  '/api': { target: process.env.API_URL ?? 'http://localhost:3000' },
};

/**
 * What @nappe/web-kit/auth imports are its peer dependencies. npm installs some of them again under
 * web-kit/node_modules (@hookform/resolvers): resolved from this app's root, each is bundled once.
 */
const webKit = JSON.parse(
  readFileSync(new URL('../web-kit/package.json', import.meta.url), 'utf8'),
) as { peerDependencies: Record<string, string> };

export default defineConfig({
  plugins: [react()],
  resolve: {
    // Read @nappe/shared from its TypeScript source: no prior build of shared is needed.
    conditions: ['@nappe/source', ...defaultClientConditions],
    dedupe: Object.keys(webKit.peerDependencies),
  },
  build: {
    rolldownOptions: {
      treeshake: {
        // @nappe/web-kit's modules do nothing when imported, but its package.json cannot say so to
        // a bundler reading its source: said here, importing the query keys from
        // @nappe/web-kit/auth at startup leaves the forms (and zod, react-hook-form) to the
        // screens that use them.
        moduleSideEffects: [{ test: /[\\/]web-kit[\\/]src[\\/]/, sideEffects: false }],
      },
    },
  },
  server: { port: 5174, strictPort: true, proxy: apiProxy },
  preview: { port: 5174, strictPort: true, proxy: apiProxy },
  test: {
    environment: 'jsdom',
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['./src/testing/setup.ts'],
    css: false,
    // Whole-route tests of the kitchen editors type into long forms; on a busy 2-core machine
    // one can take well over vitest's default 5 s.
    testTimeout: 30_000,
  },
});
