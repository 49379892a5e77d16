/// <reference types="vitest/config" />
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { fileURLToPath } from 'node:url';

const here = (path: string) => fileURLToPath(new URL(path, import.meta.url));

const alias = {
  '@shared': here('./shared'),
  '@server': here('./server'),
  '@search': here('./search'),
  '@': here('./src'),
};

// Tests that need MariaDB, the search service or SMTP expect the environment that
// `npm test` (server/cli/test.ts) prepares; tests/shared runs anywhere.
export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: { alias },
  server: { proxy: { '/api': 'http://127.0.0.1:3000', '/oai': 'http://127.0.0.1:3000' } },
  build: { outDir: 'dist', sourcemap: true, chunkSizeWarningLimit: 1500 },
  test: {
    projects: [
      {
        resolve: { alias },
        test: { name: 'shared', include: ['tests/shared/**/*.test.ts'], environment: 'node' },
      },
      {
        resolve: { alias },
        test: {
          name: 'server',
          include: ['tests/server/**/*.test.ts', 'tests/search/**/*.test.ts'],
          environment: 'node',
          setupFiles: ['tests/support/setup-database.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        plugins: [react()],
        test: { name: 'client', include: ['tests/client/**/*.test.tsx'], environment: 'happy-dom' },
      },
      {
        resolve: { alias },
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 180_000,
          hookTimeout: 180_000,
        },
      },
    ],
  },
});
