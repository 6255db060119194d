import 'server-only';
import type { TaskList } from 'graphile-worker';
import { deleteProjectFiles, deleteStoredFiles } from '../data/project-files';
import { deliverOutboxMessage } from '../mail/deliver';
import type { JobPayloads } from './enqueue';

/** What the worker runs for each job name. */
export const JOB_TASKS: TaskList = {
  'send-mail': async (payload) => {
    const { outboxId } = payload as JobPayloads['send-mail'];
    await deliverOutboxMessage(outboxId);
  },
  'delete-project-files': async (payload) => {
    const { projectId } = payload as JobPayloads['delete-project-files'];
    await deleteProjectFiles(projectId);
  },
  'delete-stored-files': async (payload) => {
    const { keys } = payload as JobPayloads['delete-stored-files'];
    await deleteStoredFiles(keys);
  },
};
