import { NextResponse } from 'next/server';
import { HydraulicsInputError } from '../../hydraulics/errors';
import { AppError, type ApiErrorBody } from '../errors';

/** Any thrown value -> the API's one error shape. Unexpected errors are logged, never shown. */
export function errorResponse(error: unknown): NextResponse<ApiErrorBody> {
  if (error instanceof AppError) return NextResponse.json(error.toBody(), { status: error.status });
  if (error instanceof HydraulicsInputError) {
    const field = error.index === undefined ? error.field : `${error.field}.${error.index}`;
    const body = new AppError('bad_request', error.message, { [field]: [error.message] }).toBody();
    return NextResponse.json(body, { status: 400 });
  }
  console.error('[runnel] unexpected error in a request handler:', error);
  const body = new AppError('internal', 'Something went wrong on our side. Nothing was changed; try again.').toBody();
  return NextResponse.json(body, { status: 500 });
}

export function json<T>(data: T, status = 200): NextResponse<T> {
  return NextResponse.json(data, { status });
}
