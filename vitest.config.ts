import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';

const r = (p: string) => fileURLToPath(new URL(p, import.meta.url));

export default defineConfig({
  test: {
    projects: [
      {
        test: { name: 'shared', include: ['test/shared/**/*.test.ts'], environment: 'node' },
      },
      {
        test: {
          name: 'frontend',
          include: ['test/frontend/**/*.test.{ts,tsx}'],
          environment: 'jsdom',
        },
        resolve: { alias: { '@': r('./frontend/src'), '@shared': r('./shared/src') } },
      },
      {
        test: {
          name: 'api',
          include: ['test/backend/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['test/support/api-global-setup.ts'],
          fileParallelism: false,
          testTimeout: 20000,
          hookTimeout: 30000,
        },
      },
      {
        test: {
          name: 'e2e',
          include: ['test/e2e/**/*.e2e.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 60000,
          hookTimeout: 60000,
        },
      },
    ],
  },
});
