import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';

/** One `next start` of the built app, in its own process group. */
export interface AppInstance {
  port: number;
  /** The server's process group (it leads it): what its CPU time is read from. */
  pid: number;
  /** SIGTERM: the server stops accepting connections, finishes the requests it has, then exits. */
  drainAndStop: () => Promise<void>;
}

/** Polls `url` until it answers 200, or fails after `timeoutMs`. */
export async function waitForOk(url: string, timeoutMs: number, child?: ChildProcess): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    if (child && child.exitCode !== null)
      throw new Error(`${url}: the server exited (code ${child.exitCode}) before it answered`);
    try {
      const res = await fetch(url);
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`${url} did not answer 200 within ${timeoutMs / 1000} s`);
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

/** Starts the built app (`.next`) on 127.0.0.1:`port` and waits until its health check answers. */
export async function startAppInstance(port: number, env: NodeJS.ProcessEnv, logFile: string): Promise<AppInstance> {
  const log = fs.openSync(logFile, 'a');
  const child = spawn(
    process.execPath,
    ['node_modules/next/dist/bin/next', 'start', '--hostname', '127.0.0.1', '--port', String(port)],
    {
      env: { ...env, NODE_ENV: 'production', NEXT_TELEMETRY_DISABLED: '1', PORT: String(port) },
      stdio: ['ignore', log, log],
      detached: true,
    },
  );
  fs.closeSync(log);
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  try {
    await waitForOk(`http://127.0.0.1:${port}/api/health`, 90_000, child);
  } catch (error) {
    if (child.exitCode === null) process.kill(-child.pid!, 'SIGKILL');
    throw new Error(`${(error as Error).message} (log: ${logFile})`);
  }
  return {
    port,
    pid: child.pid!,
    drainAndStop: async () => {
      if (child.exitCode !== null) return;
      process.kill(-child.pid!, 'SIGTERM');
      const killLater = setTimeout(() => child.exitCode === null && process.kill(-child.pid!, 'SIGKILL'), 30_000);
      await exited;
      clearTimeout(killLater);
    },
  };
}
