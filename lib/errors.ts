/**
 * Typed error codes and their HTTP status, in one place. Every API error leaves the server as
 * `{ "error": { "code", "message", "fields"? } }`.
 */
export const ERROR_STATUS = {
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  unprocessable: 422,
  rate_limited: 429,
  internal: 500,
  service_unavailable: 503,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;
/** Field path -> messages, e.g. `{ "name": ["Name is required"] }`. */
export type FieldErrors = Record<string, string[]>;

export interface ApiErrorBody {
  error: { code: ErrorCode; message: string; fields?: FieldErrors };
}

export interface AppErrorOptions {
  /** Sent as Retry-After (429, 503): when trying again can succeed. */
  retryAfterSeconds?: number;
}

export class AppError extends Error {
  readonly code: ErrorCode;
  readonly fields?: FieldErrors;
  readonly retryAfterSeconds?: number;

  constructor(code: ErrorCode, message: string, fields?: FieldErrors, options: AppErrorOptions = {}) {
    super(message);
    this.name = 'AppError';
    this.code = code;
    this.fields = fields;
    this.retryAfterSeconds = options.retryAfterSeconds;
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }

  toBody(): ApiErrorBody {
    return { error: { code: this.code, message: this.message, ...(this.fields ? { fields: this.fields } : {}) } };
  }
}

export const notFound = (what = 'Not found') => new AppError('not_found', what);
/**
 * A body names a record (a route, a line, a node, a revision...) that is not this project's:
 * another team's, or none at all. The same 404 as an id in the address, alike for both so nothing
 * tells them apart, with the field named so the form can show it.
 */
export const notInProject = (fields: FieldErrors, message = 'A record the request names is not part of this project') =>
  new AppError('not_found', message, fields);
export const forbidden = (message = 'Your role on this team does not allow this') => new AppError('forbidden', message);
export const unauthenticated = () => new AppError('unauthenticated', 'Sign in first');
