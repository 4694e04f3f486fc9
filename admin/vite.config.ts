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
