import 'server-only';
import { Logger, run, runOnce, type Runner } from 'graphile-worker';
import { env } from '../env';
import { JOB_TASKS } from './tasks';

const holder = globalThis as unknown as { runnelJobRunner?: Promise<Runner> };

/**
 * Starts the job worker in this server process (once): it listens for new jobs and polls for
 * retries whose back-off has passed. Jobs run off the request path.
 */
export function startJobWorker(): Promise<Runner> {
  holder.runnelJobRunner ??= run({
    connectionString: env().DATABASE_URL,
    concurrency: 2,
    noHandleSignals: false,
    pollInterval: 2000,
    taskList: JOB_TASKS,
  });
  return holder.runnelJobRunner;
}

const silent = new Logger(() => () => {});

/** Runs every job that is due now, then returns (tests, and a one-off drain from a script). */
export async function runDueJobs(options: { quiet?: boolean } = {}): Promise<void> {
  await runOnce({
    connectionString: env().DATABASE_URL,
    taskList: JOB_TASKS,
    ...(options.quiet ? { logger: silent } : {}),
  });
}
