import { NextResponse } from 'next/server';
import { DATABASE_RETRY_AFTER_SECONDS, isConcurrentWriteConflict, isDatabaseUnavailable } from '../db-availability';
import { AppError, type ApiErrorBody } from '../errors';
import { log } from '../log';
import { domainRefusal } from './domain-errors';

/** API answers are per user and change with every write: never stored by a browser or a proxy. */
export const API_CACHE_CONTROL = 'no-store';

function withHeaders<T>(res: NextResponse<T>, retryAfterSeconds?: number): NextResponse<T> {
  res.headers.set('Cache-Control', API_CACHE_CONTROL);
  if (retryAfterSeconds !== undefined)
    res.headers.set('Retry-After', String(Math.max(1, Math.ceil(retryAfterSeconds))));
  return res;
}

/** Turns a refusal or a failure into the API's one error shape (no logging: see errorResponse). */
export function appErrorOf(error: unknown): AppError {
  if (error instanceof AppError) return error;
  const refusal = domainRefusal(error);
  if (refusal) return refusal;
  if (isDatabaseUnavailable(error)) {
    return new AppError(
      'service_unavailable',
      'The database cannot be reached just now; nothing was changed. Try again in a few seconds.',
      undefined,
      {
        retryAfterSeconds: DATABASE_RETRY_AFTER_SECONDS,
      },
    );
  }
  if (isConcurrentWriteConflict(error)) {
    return new AppError(
      'conflict',
      'Someone else changed this at the same moment, so nothing was changed. Reload and try again.',
    );
  }
  return new AppError('internal', 'Something went wrong on our side. Nothing was changed; try again.');
}

/** Any thrown value -> the API's one error shape. Unexpected errors are logged, never shown. */
export function errorResponse(error: unknown): NextResponse<ApiErrorBody> {
  const appError = appErrorOf(error);
  if (appError.code === 'internal') log().error({ err: error }, 'unexpected error in a request handler');
  if (appError.code === 'service_unavailable' && !(error instanceof AppError))
    log().warn({ err: error }, 'database unavailable during a request');
  return withHeaders(NextResponse.json(appError.toBody(), { status: appError.status }), appError.retryAfterSeconds);
}

export function json<T>(data: T, status = 200): NextResponse<T> {
  return withHeaders(NextResponse.json(data, { status }));
}
