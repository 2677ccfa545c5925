import { defineConfig } from 'vitest/config';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const alias = { '@': root };

export default defineConfig({
  root,
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: { name: 'unit', root, include: ['tests/geometry/**/*.test.ts', 'tests/lib/**/*.test.ts', 'tests/scene/**/*.test.ts'], environment: 'node' },
      },
      {
        resolve: { alias },
        test: {
          name: 'api',
          root,
          include: ['tests/api/**/*.test.ts'],
          environment: 'node',
          // Each file gets its own SQLite database in a temp folder (see tests/api/helpers.ts).
          setupFiles: ['tests/api/setup.ts'],
          testTimeout: 30000,
          hookTimeout: 60000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'e2e',
          root,
          // The cluster test serves the same production build as the browser tests (built once by the global setup).
          include: ['tests/e2e/**/*.test.ts', 'tests/cluster/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/e2e/global-setup.ts'],
          testTimeout: 120000,
          hookTimeout: 120000,
          // A poll waits for a condition on the page; on a busy machine a server answer can take
          // seconds, so the default 1 s is only a floor for waiting, not a speed check.
          expect: { poll: { timeout: 20000 } },
          fileParallelism: false,
        },
      },
    ],
  },
});
