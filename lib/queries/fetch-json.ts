import type { ApiErrorBody, FieldErrors } from '../errors';

/** An API refusal as the client sees it: the code, a message for people, errors per field. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: FieldErrors,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

/** The one fetch helper of the client: JSON in, JSON out, refusals thrown as ApiError. */
export async function fetchJson<T>(
  url: string,
  init: {
    method?: string;
    body?: unknown;
    /** A file upload, sent as multipart/form-data instead of `body`. */ form?: FormData;
  } = {},
): Promise<T> {
  const res = await fetch(url, {
    method: init.method ?? 'GET',
    headers: init.body === undefined ? undefined : { 'content-type': 'application/json' },
    body: init.form ?? (init.body === undefined ? undefined : JSON.stringify(init.body)),
    credentials: 'same-origin',
  });
  if (res.status === 204) return undefined as T;
  const data = (await res.json().catch(() => null)) as unknown;
  if (!res.ok) {
    const err = (data as ApiErrorBody | null)?.error;
    throw new ApiError(
      res.status,
      err?.code ?? 'internal',
      err?.message ?? `Request failed (${res.status})`,
      err?.fields,
    );
  }
  return data as T;
}
