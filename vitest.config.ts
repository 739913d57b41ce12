import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

// One config, one project per suite; scripts/test.sh runs them one by one so each
// suite reports on its own line. Nest code needs legacy decorators with metadata.
const nestTransform = {
  oxc: { decorator: { legacy: true, emitDecoratorMetadata: true } },
} as const;

export default defineConfig({
  test: {
    projects: [
      {
        ...nestTransform,
        test: {
          name: 'api-unit',
          include: ['api/src/**/*.spec.ts', 'packages/*/**/*.spec.ts'],
          environment: 'node',
        },
      },
      {
        ...nestTransform,
        test: {
          name: 'reference',
          include: ['test/reference/**/*.spec.ts'],
          environment: 'node',
          testTimeout: 120_000,
        },
      },
      {
        ...nestTransform,
        test: {
          name: 'api-e2e',
          include: ['api/test/**/*.e2e-spec.ts'],
          environment: 'node',
          globalSetup: ['api/test/global-setup.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
          fileParallelism: false,
        },
      },
      {
        plugins: [react()],
        test: {
          name: 'pwa-unit',
          include: ['pwa/src/**/*.test.{ts,tsx}'],
          environment: 'jsdom',
          setupFiles: ['pwa/src/test/setup.ts'],
          testTimeout: 20_000,
        },
      },
      {
        test: {
          name: 'browser',
          include: ['test/browser/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['test/browser/global-setup.ts'],
          testTimeout: 90_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
