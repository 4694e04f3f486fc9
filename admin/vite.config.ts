import react from '@vitejs/plugin-react';
import { defaultClientConditions } from 'vite';
import { defineConfig } from 'vitest/config';

const apiProxy = {
  '/api': { target: process.env.API_URL ?? 'http://localhost:3000' },
};

export default defineConfig({
  plugins: [react()],
  resolve: {
    // Read @nappe/shared from its TypeScript source: no prior build of shared is needed.
    conditions: ['@nappe/source', ...defaultClientConditions],
    // npm installs @hookform/resolvers again under web-kit/node_modules: resolved from here, it is
    // bundled once. It is the only one of web-kit's peers installed twice: adding the others here
    // changes no byte of the build.
    dedupe: ['@hookform/resolvers'],
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
