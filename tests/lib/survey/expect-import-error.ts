import { expect } from 'vitest';
import { SurveyImportError, type SurveyImportErrorCode } from '../../../lib/survey/errors';

export interface ExpectedError {
  code: SurveyImportErrorCode;
  line?: number;
  column?: string;
  field?: string;
  message?: RegExp;
}

/** Runs `fn`, requires a SurveyImportError, and checks its code and where it points. */
export function expectImportError(fn: () => unknown, expected: ExpectedError): SurveyImportError {
  let caught: unknown;
  try {
    fn();
  } catch (e) {
    caught = e;
  }
  expect(caught, 'expected the import to fail').toBeInstanceOf(SurveyImportError);
  const err = caught as SurveyImportError;
  expect(err.code).toBe(expected.code);
  if (expected.line !== undefined) expect(err.line).toBe(expected.line);
  if (expected.column !== undefined) expect(err.column).toBe(expected.column);
  if (expected.field !== undefined) expect(err.field).toBe(expected.field);
  if (expected.message) expect(err.message).toMatch(expected.message);
  expect(err.message.length).toBeGreaterThan(10);
  return err;
}
