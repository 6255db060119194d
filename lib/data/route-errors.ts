import 'server-only';
import { AppError } from '../errors';
import { RouteEditError } from '../routes/errors';
import { SurveyImportError } from '../survey/errors';

/** Domain refusals as API errors; anything else is left for the generic 500. */
export function asAppError(error: unknown, fileName?: string): unknown {
  if (error instanceof RouteEditError) {
    const key = error.pointNumber === undefined ? error.field : `points.${error.pointNumber - 1}.${error.field}`;
    return new AppError(error.kind === 'conflict' ? 'conflict' : 'bad_request', error.message, { [key]: [error.message] });
  }
  if (error instanceof SurveyImportError) {
    const message = fileName ? `“${fileName}”, ${error.message}` : error.message;
    if (error.code === 'file-too-large') return new AppError('payload_too_large', message, { file: [message] });
    if (error.code === 'binary-content') return new AppError('unsupported_media_type', message, { file: [message] });
    return new AppError('bad_request', message, { file: [message] });
  }
  return error;
}

/** Runs `work`, turning domain refusals into API errors. */
export async function refusingPlainly<T>(work: () => Promise<T>, fileName?: string): Promise<T> {
  try {
    return await work();
  } catch (error) {
    throw asAppError(error, fileName);
  }
}
