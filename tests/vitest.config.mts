import { defineConfig } from 'vitest/config';
import path from 'node:path';

export default defineConfig({
  root: path.resolve(import.meta.dirname, '..'),
  resolve: {
    alias: {
      '@': path.resolve(import.meta.dirname, '..'),
      'server-only': path.resolve(import.meta.dirname, 'support/server-only-stub.ts'),
    },
  },
  test: {
    include: ['tests/**/*.test.ts'],
    exclude: ['tests/e2e/**', 'tests/server/**', 'node_modules/**'],
    environment: 'node',
    // API tests share one database; running files one at a time keeps them independent.
    fileParallelism: false,
    testTimeout: 20000,
    hookTimeout: 60000,
  },
});
