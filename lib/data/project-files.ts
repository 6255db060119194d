import 'server-only';
import { deleteObject, listKeys } from '../storage';

/** Where a project's stored files live: survey files and photos alike. */
export const projectStoragePrefix = (projectId: string) => `projects/${projectId}/`;

/** Removes every stored file of a project; run by the job queue after the project's delete committed. */
export async function deleteProjectFiles(projectId: string): Promise<number> {
  if (!/^[0-9a-f-]{36}$/i.test(projectId)) throw new Error('delete-project-files: not a project id');
  const keys = await listKeys(projectStoragePrefix(projectId));
  for (const key of keys) await deleteObject(key);
  return keys.length;
}
