import pg from 'pg';
import { Sequelize } from 'sequelize';
import { RETRYABLE_CONNECTION_ERRORS } from './db-availability';
import { env } from './env';

export { RETRYABLE_CONNECTION_ERRORS };

function createSequelize(): Sequelize {
  return new Sequelize(env().DATABASE_URL, {
    dialect: 'postgres',
    dialectModule: pg,
    logging: false,
    pool: { max: 10, min: 0, idle: 10_000, acquire: 20_000 },
    // About 10 s of retries in all: a database restart or a short outage is waited out, not answered with an error.
    retry: { max: 8, match: RETRYABLE_CONNECTION_ERRORS, backoffBase: 200, backoffExponent: 1.5 },
    define: { underscored: true },
  });
}

// One instance per server process; hot reload in development would otherwise open a new pool per edit.
const holder = globalThis as unknown as { runnelSequelize?: Sequelize };

export function db(): Sequelize {
  holder.runnelSequelize ??= createSequelize();
  return holder.runnelSequelize;
}
