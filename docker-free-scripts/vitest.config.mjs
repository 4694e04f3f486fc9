import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: [
      '*.test.mjs',
      'payment-fake/**/*.test.mjs',
      'bench/**/*.test.mjs',
      'lib/**/*.test.mjs',
    ],
    environment: 'node',
    testTimeout: 20_000,
  },
});
