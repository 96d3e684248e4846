import { defineConfig } from 'vitest/config';

// Unit tests sit beside the code (*.test.ts); integration tests against the real database live in
// tests/integration. `npm test` runs both with a freshly migrated and seeded database.
export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['{engine,canvas,components,lib,app,models}/**/*.test.{ts,tsx}'],
          environment: 'node',
          // Command-line tests spawn tsx; a loaded 2-core machine needs more than the 5 s default.
          testTimeout: 30_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'integration',
          include: ['tests/integration/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
