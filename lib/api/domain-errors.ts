import { HydraulicsInputError } from '../../hydraulics/index';
import { AppError } from '../errors';
import { inputErrorText } from '../lines/input-error-words';
import { RouteEditError } from '../routes/errors';
import { SurveyImportError } from '../survey/errors';
import type { UnitSystem } from '../units/index';

/**
 * The one mapping from the domain's refusals to HTTP answers. Handlers and data functions throw the
 * domain's own errors; `appErrorOf` (lib/api/respond.ts) answers them through here:
 * - `HydraulicsInputError` (the engineering core): 400 at its field (`field.index`);
 * - `RouteEditError`: 400 at `points.<n>.<field>`, or 409 when the route changed under the edit;
 * - `SurveyImportError`: 413 for a file over the size limit, 415 for a binary file, else 400 at `file`.
 * Anything else is not a refusal: undefined, for the generic answers.
 */
export function domainRefusal(error: unknown): AppError | undefined {
  if (error instanceof HydraulicsInputError) {
    const field = error.index === undefined ? error.field : `${error.field}.${error.index}`;
    return new AppError('bad_request', error.message, { [field]: [error.message] });
  }
  if (error instanceof RouteEditError) {
    const key = error.pointNumber === undefined ? error.field : `points.${error.pointNumber - 1}.${error.field}`;
    return new AppError(error.kind === 'conflict' ? 'conflict' : 'bad_request', error.message, {
      [key]: [error.message],
    });
  }
  if (error instanceof SurveyImportError) {
    if (error.code === 'file-too-large')
      return new AppError('payload_too_large', error.message, { file: [error.message] });
    if (error.code === 'binary-content')
      return new AppError('unsupported_media_type', error.message, { file: [error.message] });
    return new AppError('bad_request', error.message, { file: [error.message] });
  }
  return undefined;
}

/**
 * The core's refusal of a line's design, in the words of the line page ("Pipe stretch 2: start: …")
 * and the project's units, at the design's field (`design.` for a saved line, none for a line given
 * whole to the stateless analysis), so both endpoints refuse the same design alike.
 */
export function lineDesignRefusal(
  error: HydraulicsInputError,
  system: UnitSystem,
  fieldPrefix: '' | 'design.',
): AppError {
  const field = `${fieldPrefix}${error.field}${error.index === undefined ? '' : `.${error.index}`}`;
  const words = inputErrorText(error, system);
  return new AppError('bad_request', `The design does not fit the line: ${words}`, { [field]: [words] });
}

/** A lift computation that failed on its input (a failed `Outcome` of lib/lift), refused at the field it names. */
export function failedOutcomeRefusal(failure: { error: string; field?: string }): AppError {
  return new AppError('bad_request', failure.error, { [failure.field ?? '_']: [failure.error] });
}
