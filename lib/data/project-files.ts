import 'server-only';
import { enqueueJob } from '../jobs/enqueue';
import { log } from '../log';
import { deleteObject, listKeys } from '../storage';
import { models } from '../../models';

/** Where a project's stored files live: survey files and photos alike. */
export const projectStoragePrefix = (projectId: string) => `projects/${projectId}/`;

/** Removes every stored file of a project; run by the job queue after the project's delete committed. */
export async function deleteProjectFiles(projectId: string): Promise<number> {
  if (!/^[0-9a-f-]{36}$/i.test(projectId)) throw new Error('delete-project-files: not a project id');
  const keys = await listKeys(projectStoragePrefix(projectId));
  for (const key of keys) await deleteObject(key);
  return keys.length;
}

/** Removes stored files by key (only a project's); run by the job queue, retried until the store answers. */
export async function deleteStoredFiles(keys: readonly string[]): Promise<void> {
  for (const key of keys) {
    if (!key.startsWith('projects/')) throw new Error('delete-stored-files: not a project file');
    await deleteObject(key);
  }
}

/**
 * Removes files no row names any more (a write that failed after storing them, or a row deleted in
 * a transaction that also queued their removal): now if the store answers, else through the job
 * queue, retried until it does, so no file is left behind.
 */
export async function removeStoredFiles(keys: readonly string[], queued = false): Promise<void> {
  const left: string[] = [];
  for (const key of keys) {
    try {
      await deleteObject(key);
    } catch (err) {
      left.push(key);
      if (!queued) log().warn({ err, key }, 'could not remove a stored file now; queued for later');
    }
  }
  if (left.length === 0 || queued) return;
  await models()
    .sequelize.transaction((transaction) => enqueueJob(transaction, 'delete-stored-files', { keys: left }))
    .catch((err: unknown) => log().error({ err, keys: left }, 'could not queue the removal of stored files'));
}
