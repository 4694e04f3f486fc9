import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { conditions: ['@nappe/source'] },
  ssr: { resolve: { conditions: ['@nappe/source'] } },
  test: {
    include: ['src/**/*.spec.ts', 'test/**/*.e2e-spec.ts'],
    environment: 'node',
    pool: 'forks',
    testTimeout: 20_000,
    hookTimeout: 30_000,
    env: { NODE_ENV: 'test', LOG_LEVEL: 'silent' },
  },
});
