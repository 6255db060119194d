import 'server-only';
import os from 'node:os';
import { Piscina } from 'piscina';
import { HydraulicsInputError } from '../../hydraulics/index';
import { AppError } from '../errors';
import { SurveyImportError } from '../survey/errors';
import type { TaskInput, TaskName, TaskOutput } from './tasks';
import { workerBundle } from './worker-bundle';
import type { WorkerFailure, WorkerReply } from './worker-entry';

/** Longest a task may run (queue wait included) before its thread is stopped. */
export const DEFAULT_TASK_TIME_LIMIT_MS = 20_000;
/** Tasks waiting beyond this many are refused with 503 rather than queued for minutes. */
const MAX_QUEUED_TASKS = 64;

/** Error classes a task may throw that callers catch by class; anything else comes back as a plain Error. */
const KNOWN_ERRORS: Record<string, new (...args: never[]) => Error> = {
  SurveyImportError,
  HydraulicsInputError,
  AppError,
};

const holder = globalThis as unknown as { runnelPool?: Promise<Piscina> };

function threadCount(): number {
  const configured = Number(process.env.RUNNEL_WORKER_THREADS);
  if (Number.isInteger(configured) && configured > 0) return configured;
  return Math.max(1, Math.min(4, os.availableParallelism() - 1));
}

function pool(): Promise<Piscina> {
  holder.runnelPool ??= workerBundle().then(
    (filename) =>
      new Piscina({
        filename,
        minThreads: 0,
        maxThreads: threadCount(),
        idleTimeout: 30_000,
        maxQueue: MAX_QUEUED_TASKS,
        // A parse makes millions of short-lived objects (cells, rows, drafts); a 64 MB young generation collects them
        // in fewer, cheaper passes: a 100,000-fix import's worker time went from 570-640 to 527-586 ms (medians).
        resourceLimits: { maxOldGenerationSizeMb: 1536, maxYoungGenerationSizeMb: 64 },
      }),
  );
  holder.runnelPool.catch(() => {
    holder.runnelPool = undefined;
  });
  return holder.runnelPool;
}

function rebuildError(failure: WorkerFailure): Error {
  const Known = KNOWN_ERRORS[failure.name];
  const error: Error = Known ? Object.create(Known.prototype) : new Error(failure.message);
  Object.assign(error, failure.fields, { name: failure.name, message: failure.message });
  return error;
}

export interface RunOptions {
  /** @default DEFAULT_TASK_TIME_LIMIT_MS */
  timeLimitMs?: number;
}

/**
 * Runs a CPU-heavy task (lib/workers/tasks.ts) on a worker thread, so the request thread keeps
 * answering others. Errors the task throws come back as their own class; a task over its time
 * limit is stopped (422); a full queue is a 503 with Retry-After.
 */
export async function runInWorker<K extends TaskName>(
  task: K,
  input: TaskInput<K>,
  options: RunOptions = {},
): Promise<TaskOutput<K>> {
  const limitMs = options.timeLimitMs ?? DEFAULT_TASK_TIME_LIMIT_MS;
  const workers = await pool();
  let reply: WorkerReply;
  try {
    reply = await workers.run({ task, input }, { signal: AbortSignal.timeout(limitMs) });
  } catch (error) {
    if (error instanceof Error && (error.name === 'AbortError' || error.name === 'TimeoutError')) {
      const seconds = Math.round(limitMs / 100) / 10;
      throw new AppError(
        'unprocessable',
        `Working on this took longer than ${seconds} s, so it was stopped; send a smaller file or a shorter line`,
      );
    }
    if (error instanceof Error && /queue is at limit/i.test(error.message)) {
      throw new AppError(
        'service_unavailable',
        'The server is busy with other work; try again in a few seconds',
        undefined,
        { retryAfterSeconds: 5 },
      );
    }
    throw error;
  }
  if (!reply.ok) throw rebuildError(reply.error);
  return reply.value as TaskOutput<K>;
}
