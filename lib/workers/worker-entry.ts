import { TASKS, type TaskName } from './tasks';

export interface WorkerRequest {
  task: TaskName;
  input: unknown;
}

/** An error as it crosses the thread boundary: its class name and own fields (classes do not survive cloning). */
export interface WorkerFailure {
  name: string;
  message: string;
  fields: Record<string, unknown>;
}

export type WorkerReply = { ok: true; value: unknown } | { ok: false; error: WorkerFailure };

/** A flat record of numbers, such as a core refusal's `values` (the figures a screen restates in its units). */
function isFigures(value: unknown): value is Record<string, number> {
  return (
    typeof value === 'object' &&
    value !== null &&
    Object.getPrototypeOf(value) === Object.prototype &&
    Object.values(value).every((v) => typeof v === 'number')
  );
}

function failureOf(error: unknown): WorkerFailure {
  if (!(error instanceof Error)) return { name: 'Error', message: String(error), fields: {} };
  const fields: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(error)) {
    if (value === undefined || ['string', 'number', 'boolean'].includes(typeof value) || isFigures(value))
      fields[key] = value;
  }
  return { name: error.name, message: error.message, fields };
}

/** The pool's worker: runs one named task and answers with its value or its error, never throwing. */
export default async function runTask(request: WorkerRequest): Promise<WorkerReply> {
  const task = TASKS[request.task] as ((input: unknown) => unknown) | undefined;
  if (!task)
    return { ok: false, error: { name: 'Error', message: `no worker task named ${request.task}`, fields: {} } };
  try {
    return { ok: true, value: await task(request.input) };
  } catch (error) {
    return { ok: false, error: failureOf(error) };
  }
}
