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
  const inner = (error as { original?: unknown; parent?: unknown }).original ?? (error as { parent?: unknown }).parent ?? error.cause;
  return isDatabaseUnavailable(inner, depth + 1);
}
