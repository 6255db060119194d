/**
 * Errors that mean "the connection went away", not "the query is wrong". Sequelize's default
 * retry list matches nothing PostgreSQL raises, so a restarted database would fail requests.
 */
export const RETRYABLE_CONNECTION_ERRORS: RegExp[] = [
  /SequelizeConnectionError/,
  /SequelizeConnectionRefusedError/,
  /SequelizeConnectionAcquireTimeoutError/,
  /ECONNREFUSED/,
  /ECONNRESET/,
  /EPIPE/,
  /Connection terminated/i,
  /terminating connection/i,
  /the database system is (starting up|shutting down)/i,
  /Client has encountered a connection error/i,
  /not queryable/i,
];

const CONNECTION_ERROR_NAMES = new Set([
  'SequelizeConnectionError',
  'SequelizeConnectionRefusedError',
  'SequelizeConnectionAcquireTimeoutError',
  'SequelizeConnectionTimedOutError',
  'SequelizeHostNotFoundError',
  'SequelizeHostNotReachableError',
  'SequelizeAccessDeniedError',
  'SequelizeInvalidConnectionError',
]);

/** Seconds a client is told to wait when the database cannot be reached. */
export const DATABASE_RETRY_AFTER_SECONDS = 5;

/** True when `error` (or its cause) says the database could not be reached, as opposed to a bad query. */
export function isDatabaseUnavailable(error: unknown, depth = 0): boolean {
  if (!(error instanceof Error) || depth > 4) return false;
  if (CONNECTION_ERROR_NAMES.has(error.name)) return true;
  const text = `${error.name} ${error.message}`;
  if (RETRYABLE_CONNECTION_ERRORS.some((pattern) => pattern.test(text))) return true;
  const inner =
    (error as { original?: unknown; parent?: unknown }).original ??
    (error as { parent?: unknown }).parent ??
    error.cause;
  return isDatabaseUnavailable(inner, depth + 1);
}

// Two requests that changed the same thing at the same moment: unique key taken by the other,
// a deadlock the database broke, a serialisation failure. The loser's transaction rolled back whole.
const CONCURRENT_WRITE_CODES = new Set(['23505', '40P01', '40001']);

/** True when `error` (or its cause) is a write that lost a race with another request's write. */
export function isConcurrentWriteConflict(error: unknown, depth = 0): boolean {
  if (!(error instanceof Error) || depth > 4) return false;
  if (error.name === 'SequelizeUniqueConstraintError') return true;
  const code = (error as { code?: unknown }).code;
  if (typeof code === 'string' && CONCURRENT_WRITE_CODES.has(code)) return true;
  const inner =
    (error as { original?: unknown; parent?: unknown }).original ??
    (error as { parent?: unknown }).parent ??
    error.cause;
  return isConcurrentWriteConflict(inner, depth + 1);
}
