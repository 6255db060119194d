import path from 'node:path';
import { defineConfig } from '@playwright/test';

const port = Number(process.env.PORT ?? 3100);
const root = path.resolve(__dirname, '../..');

// Debian's Chromium, never a downloaded browser; flags keep it off the (closed) network.
export default defineConfig({
  testDir: '.',
  testMatch: '**/*.spec.ts',
  // Desktop for every spec; the phone project (390 px wide, touch) runs the phone-width checks.
  projects: [
    { name: 'desktop', testIgnore: '**/phone.spec.ts' },
    {
      name: 'phone',
      testMatch: '**/phone.spec.ts',
      use: { viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true },
    },
  ],
  outputDir: path.join(root, 'test-results'),
  fullyParallel: false,
  workers: 1,
  retries: 0,
  reporter: [['list']],
  timeout: 90_000,
  // A shared 2-core machine can take longer than the default 5 s for a save or a first worker start;
  // waiting longer changes no assertion.
  expect: { timeout: 15_000 },
  use: {
    baseURL: process.env.E2E_BASE_URL ?? `http://127.0.0.1:${port}`,
    launchOptions: {
      executablePath: '/usr/bin/chromium',
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    },
    trace: 'off',
    screenshot: 'only-on-failure',
  },
  webServer: process.env.E2E_BASE_URL
    ? undefined
    : {
        command: `node node_modules/next/dist/bin/next start --hostname 127.0.0.1 --port ${port}`,
        cwd: root,
        url: `http://127.0.0.1:${port}/sign-in`,
        reuseExistingServer: false,
        timeout: 120_000,
        env: { ...process.env, NEXT_TELEMETRY_DISABLED: '1', NODE_ENV: 'production' } as Record<string, string>,
      },
});
