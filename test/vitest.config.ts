import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    root: new URL('..', import.meta.url).pathname,
    include: ['test/**/*.test.ts'],
    setupFiles: ['test/helpers/property-seed.ts'],
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
