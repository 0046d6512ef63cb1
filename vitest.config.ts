import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    // Compile dist/ once before any test: the CLI tests run the built program.
    globalSetup: ['test/setup/buildOnce.ts'],
    // One fixed seed for every property-based test (fast-check), so failures reproduce.
    setupFiles: ['test/setup/propertySeed.ts'],
    testTimeout: 120_000,
    hookTimeout: 120_000,
    pool: 'forks',
  },
});
