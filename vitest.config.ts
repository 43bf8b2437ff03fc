import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

// vitest 4 ignores vitest.workspace.ts: the projects live here.
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'chem',
          root: './packages/chem',
          include: ['src/**/*.test.ts'],
          environment: 'node',
          // Exhaustive agreement checks run thousands of searches; CI shares two cores with the rest.
          testTimeout: 60000,
        },
      },
      {
        test: {
          name: 'contracts',
          root: './packages/contracts',
          include: ['src/**/*.test.ts'],
          environment: 'node',
        },
      },
      {
        test: {
          name: 'api',
          root: './apps/api',
          include: ['src/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['./src/testing/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 20000,
          hookTimeout: 30000,
        },
      },
      {
        plugins: [react()],
        test: {
          name: 'web',
          root: './apps/web',
          include: ['src/**/*.test.{ts,tsx}'],
          environment: 'happy-dom',
          setupFiles: ['./src/testing/setup.ts'],
          testTimeout: 30000,
        },
      },
      {
        test: {
          name: 'e2e',
          root: './tests',
          include: ['e2e/**/*.e2e.test.ts'],
          environment: 'node',
          globalSetup: ['./e2e/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 60000,
          hookTimeout: 120000,
        },
      },
    ],
  },
});
