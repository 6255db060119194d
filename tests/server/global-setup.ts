import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

/**
 * Starts the built app with `next start` on loopback (RUNNEL_SERVER_PORT, default 3110) in its own
 * process group, waits for /api/health, and stops the group afterwards. Its output goes to
 * .runtime/test/server.log, which the log test reads back for planted secrets.
 */
const root = path.resolve(import.meta.dirname, '../..');
/** Where a test names the one storage call the server must fail (lib/storage-faults.ts). */
export const STORAGE_FAULTS_FILE = path.join(root, '.runtime', 'test', 'storage-faults.json');
let server: ChildProcess | undefined;

export async function setup(): Promise<void> {
  const port = process.env.RUNNEL_SERVER_PORT ?? '3110';
  const base = `http://127.0.0.1:${port}`;
  process.env.RUNNEL_SERVER_URL = base;
  const logFile = path.join(root, '.runtime', 'test', 'server.log');
  fs.mkdirSync(path.dirname(logFile), { recursive: true });
  const out = fs.openSync(logFile, 'w');
  fs.rmSync(STORAGE_FAULTS_FILE, { force: true });
  server = spawn(
    process.execPath,
    ['node_modules/next/dist/bin/next', 'start', '--hostname', '127.0.0.1', '--port', port],
    {
      cwd: root,
      detached: true,
      stdio: ['ignore', out, out],
      // RUNNEL_STORAGE_FAULTS: the file tests/server/faults.test.ts writes to fail one storage call (test env only).
      env: {
        ...process.env,
        NODE_ENV: 'production',
        NEXT_TELEMETRY_DISABLED: '1',
        NEXTAUTH_URL: base,
        RUNNEL_LOG_LEVEL: 'info',
        RUNNEL_ENV: 'test',
        RUNNEL_STORAGE_FAULTS: STORAGE_FAULTS_FILE,
      },
    },
  );
  const deadline = Date.now() + 90_000;
  for (;;) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) return;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline || server.exitCode !== null)
      throw new Error(`next start did not answer on ${base}; see ${logFile}`);
    await new Promise((r) => setTimeout(r, 300));
  }
}

export async function teardown(): Promise<void> {
  if (server?.pid) {
    try {
      process.kill(-server.pid, 'SIGTERM');
    } catch {
      // already gone
    }
  }
}
