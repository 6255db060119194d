import 'server-only';
import type { z } from 'zod';
import { currentUser } from '../auth/current';
import type { SessionUser } from '../auth/users';
import { AppError, type FieldErrors } from '../errors';
import { log } from '../log';
import { fieldErrorsOf } from '../validations/common';
import { appErrorOf } from './respond';

/** What every server action returns: data, or a message with errors per field. */
export type ActionResult<T> =
  { ok: true; data: T } | { ok: false; code: string; message: string; fields?: FieldErrors };

/**
 * Builds a server action that parses its input, loads the signed-in user, then acts. Role checks
 * that depend on the input go through lib/api/membership inside `act`, as in route handlers.
 */
export function userAction<S extends z.ZodType, T>(
  schema: S,
  act: (input: z.output<S>, user: SessionUser) => Promise<T>,
) {
  return async (raw: unknown): Promise<ActionResult<T>> => {
    const parsed = schema.safeParse(raw);
    if (!parsed.success)
      return {
        ok: false,
        code: 'bad_request',
        message: 'Some fields are not valid',
        fields: fieldErrorsOf(parsed.error),
      };
    const user = await currentUser();
    if (!user) return { ok: false, code: 'unauthenticated', message: 'Sign in first' };
    try {
      return { ok: true, data: await act(parsed.data, user) };
    } catch (error) {
      if (error instanceof AppError)
        return { ok: false, code: error.code, message: error.message, fields: error.fields };
      const refusal = appErrorOf(error);
      if (refusal.code === 'internal') log().error({ err: error }, 'unexpected error in a server action');
      else log().warn({ err: error }, 'database unavailable during a server action');
      return { ok: false, code: refusal.code, message: refusal.message };
    }
  };
}
