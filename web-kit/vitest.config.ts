import { defaultClientConditions } from 'vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { conditions: ['@nappe/source', ...defaultClientConditions] },
  test: {
    environment: 'jsdom',
    include: ['src/**/*.test.ts'],
  },
});
