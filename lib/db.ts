import pg from 'pg';
import { Sequelize } from 'sequelize';
import { env } from './env';

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

function createSequelize(): Sequelize {
  return new Sequelize(env().DATABASE_URL, {
    dialect: 'postgres',
    dialectModule: pg,
    logging: false,
    pool: { max: 10, min: 0, idle: 10_000, acquire: 20_000 },
    retry: { max: 6, match: RETRYABLE_CONNECTION_ERRORS, backoffBase: 200, backoffExponent: 1.5 },
    define: { underscored: true },
  });
}

// One instance per server process; hot reload in development would otherwise open a new pool per edit.
const holder = globalThis as unknown as { runnelSequelize?: Sequelize };

export function db(): Sequelize {
  holder.runnelSequelize ??= createSequelize();
  return holder.runnelSequelize;
}
