import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts'],
    testTimeout: 20_000,
    // The Astro builds the site and browser tests read, made once before any test file runs.
    globalSetup: ['tests/global-site-builds.ts'],
  },
});
