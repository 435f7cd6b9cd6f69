import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

// One config for the app and the tests. Unit and component tests run in Node
// (component files opt into jsdom with a docblock); browser tests in test/e2e
// start their own preview server and Debian's chromium.
export default defineConfig({
  plugins: [react()],
  worker: { format: 'es' },
  test: {
    include: ['test/**/*.test.ts', 'test/**/*.test.tsx'],
    environment: 'node',
    testTimeout: 20000,
    hookTimeout: 120000,
  },
});
