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
  },
  build: {
    rolldownOptions: {
      // @nappe/shared is pure TypeScript with no import-time side effects (STYLE.md), but its
      // package.json cannot say so to a bundler reading its source: without this, importing one
      // schema would carry the whole kitchen library (demo catalogue, mix balance…) along.
      treeshake: {
        moduleSideEffects: [{ test: /[\\/]shared[\\/]src[\\/]/, sideEffects: false }],
      },
    },
  },
  server: { port: 5173, strictPort: true, proxy: apiProxy },
  preview: { port: 5173, strictPort: true, proxy: apiProxy },
  test: {
    environment: 'jsdom',
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['./src/testing/setup.ts'],
    // Whole routes with lazy chunks, on a busy 2-core machine: role queries over a month grid
    // take a few seconds, well past vitest's 5 s default.
    testTimeout: 20_000,
    css: false,
  },
});
