import {defineConfig} from 'vitest/config';

export default defineConfig({
  test: {
    environment: 'node',
    include: ['test/**/*.test.ts'],
    env: {TZ: 'UTC'},
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
