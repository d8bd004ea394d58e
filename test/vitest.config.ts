import {fileURLToPath} from 'node:url';
import {defineConfig} from 'vitest/config';

// Kept under test/ so the top level holds only what the project layout names.
export default defineConfig({
  root: fileURLToPath(new URL('..', import.meta.url)),
  test: {
    environment: 'node',
    include: ['test/**/*.test.ts'],
    env: {TZ: 'UTC'},
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
