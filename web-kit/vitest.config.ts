import react from '@vitejs/plugin-react';
import { defaultClientConditions } from 'vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  plugins: [react()],
  resolve: { conditions: ['@nappe/source', ...defaultClientConditions] },
  test: {
    environment: 'jsdom',
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['./src/testing/setup.ts'],
    css: false,
    // The forms' tests type and wait on Chakra components; a busy 2-core machine can take a
    // few seconds for one, past vitest's 5 s default.
    testTimeout: 20_000,
  },
});
