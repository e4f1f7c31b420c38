import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['packages/*/test/**/*.test.ts', 'test/**/*.test.ts'],
    reporters: ['default', './test/support/summary-reporter.ts'],
    globalSetup: ['./test/support/build-cli.ts'],
    testTimeout: 60_000,
    // Two cores: the CLI end-to-end files spawn processes, so keep the pool small.
    maxWorkers: 2,
  },
});
