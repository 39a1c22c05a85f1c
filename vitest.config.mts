import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    projects: [
      {
        extends: true,
        test: { name: 'unit', include: ['tests/unit/**/*.test.ts'], environment: 'node' },
      },
      {
        extends: true,
        test: {
          name: 'integration',
          include: ['tests/integration/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          globalSetup: ['tests/integration/global-setup.ts'],
          testTimeout: 30000,
          hookTimeout: 60000,
        },
      },
      {
        extends: true,
        // Real app processes (web instances on the test build, job workers): npm test runs these after the build.
        test: {
          name: 'processes',
          include: ['tests/processes/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          globalSetup: ['tests/integration/global-setup.ts'],
          testTimeout: 180000,
          hookTimeout: 180000,
        },
      },
    ],
  },
});
