import pino, { type DestinationStream, type Logger } from 'pino';

/**
 * The one logger: JSON lines on stdout. Fields that can hold secrets are removed by path, errors
 * are reduced to their class, message, database error code and stack (never Sequelize's `sql`,
 * `parameters` or `original`, which carry bind values such as password hashes), and every line is
 * scrubbed of the configured secrets before it is written, in case one sits inside a message.
 */
const REDACTED_PATHS = [
  'password',
  '*.password',
  'passwordHash',
  '*.passwordHash',
  'newPassword',
  '*.newPassword',
  'token',
  '*.token',
  'cookie',
  '*.cookie',
  'cookies',
  '*.cookies',
  'authorization',
  '*.authorization',
  'headers.cookie',
  'headers.authorization',
  '*.headers.cookie',
  '*.headers.authorization',
  'sql',
  '*.sql',
  'parameters',
  '*.parameters',
  'bind',
  '*.bind',
];

interface SerializedError {
  type: string;
  message: string;
  code?: string;
  stack?: string;
  cause?: SerializedError;
}

const QUOTED_VALUE = /"(?:[^"\\]|\\.){0,200}"/g;

/** An error as logged. PostgreSQL puts input values in some messages; those quoted values are masked. */
export function serializeError(error: unknown, depth = 0): SerializedError {
  if (!(error instanceof Error)) return { type: typeof error, message: String(error).slice(0, 200) };
  const named = error as Error & { code?: unknown; original?: { code?: unknown } };
  const code =
    typeof named.code === 'string'
      ? named.code
      : typeof named.original?.code === 'string'
        ? named.original.code
        : undefined;
  const isDatabase = error.name.startsWith('Sequelize');
  const message = isDatabase ? error.message.replace(QUOTED_VALUE, '"…"') : error.message;
  const cause = error.cause !== undefined && depth < 3 ? serializeError(error.cause, depth + 1) : undefined;
  return { type: error.name, message, code, stack: isDatabase ? undefined : error.stack, ...(cause ? { cause } : {}) };
}

function secretsToScrub(): string[] {
  const found: string[] = [];
  const url = process.env.DATABASE_URL;
  if (url) {
    try {
      const password = decodeURIComponent(new URL(url).password);
      if (password) found.push(password);
    } catch {
      // an unparsable URL is reported by lib/env.ts
    }
  }
  for (const name of ['NEXTAUTH_SECRET', 'RUNNEL_S3_SECRET_ACCESS_KEY', 'PGPASSWORD']) {
    const value = process.env[name];
    if (value && value.length >= 8) found.push(value);
  }
  return found;
}

function scrub(line: string): string {
  let out = line;
  for (const secret of secretsToScrub()) if (out.includes(secret)) out = out.split(secret).join('[secret]');
  return out;
}

/** A logger writing to `destination` (stdout when not given); tests pass a stream to read it back. */
export function createLogger(destination?: DestinationStream): Logger {
  const options = {
    level: process.env.RUNNEL_LOG_LEVEL ?? (process.env.NODE_ENV === 'test' ? 'warn' : 'info'),
    base: { app: 'runnel' },
    redact: { paths: REDACTED_PATHS, censor: '[redacted]' },
    serializers: { err: serializeError, error: serializeError },
    hooks: { streamWrite: scrub },
  };
  return destination ? pino(options, destination) : pino(options);
}

const holder = globalThis as unknown as { runnelLog?: Logger };

/** The process's logger. Log errors as `log().error({ err }, 'what was being done')`. */
export function log(): Logger {
  holder.runnelLog ??= createLogger();
  return holder.runnelLog;
}
