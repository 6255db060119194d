import 'server-only';
import type { Transaction } from 'sequelize';
import { db } from '../db';

/** The queue's task names and their payloads (one place, so producer and worker agree). */
export interface JobPayloads {
  'send-mail': { outboxId: string };
  /** Removes every stored file of a deleted project (everything under `projects/<id>/`). */
  'delete-project-files': { projectId: string };
  /** Removes stored files whose rows are gone (a deleted photo or route, a write that failed after storing). */
  'delete-stored-files': { keys: string[] };
}
export type JobName = keyof JobPayloads;

/**
 * Adds a job in the caller's transaction: it exists exactly when the change that caused it was
 * committed. A failed job is retried with the queue's exponential back-off (e^attempts seconds,
 * capped at e^10 s) up to `maxAttempts` times.
 */
export async function enqueueJob<N extends JobName>(
  transaction: Transaction,
  name: N,
  payload: JobPayloads[N],
  options: { maxAttempts?: number } = {},
): Promise<void> {
  await db().query('SELECT graphile_worker.add_job(:name, CAST(:payload AS json), max_attempts := :maxAttempts)', {
    replacements: { name, payload: JSON.stringify(payload), maxAttempts: options.maxAttempts ?? 25 },
    transaction,
  });
}
