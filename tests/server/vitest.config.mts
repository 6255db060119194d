import { defineConfig } from 'vitest/config';
import path from 'node:path';
import LogsLastSequencer from './sequencer';

// Tests against a real `next start` on loopback (started by global-setup.ts after `next build`).
export default defineConfig({
  root: path.resolve(import.meta.dirname, '../..'),
  resolve: {
    alias: {
      '@': path.resolve(import.meta.dirname, '../..'),
      'server-only': path.resolve(import.meta.dirname, '../support/server-only-stub.ts'),
    },
  },
  test: {
    include: ['tests/server/**/*.test.ts'],
    environment: 'node',
    fileParallelism: false,
    // The log check reads what every other file made the server write: it runs last.
    sequence: { sequencer: LogsLastSequencer },
    globalSetup: [path.resolve(import.meta.dirname, 'global-setup.ts')],
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
