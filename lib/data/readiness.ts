import 'server-only';
import fs from 'node:fs';
import path from 'node:path';
import { QueryTypes } from 'sequelize';
import { db } from '../db';

export interface Readiness {
  ready: boolean;
  database: 'reachable' | 'unreachable';
  /** Migration files in migrations/ not yet applied to the database. */
  pendingMigrations: number;
}

function migrationFiles(): string[] {
  const dir = path.join(process.cwd(), 'migrations');
  return fs.existsSync(dir) ? fs.readdirSync(dir).filter((f) => f.endsWith('.cjs') || f.endsWith('.js')) : [];
}

/** Whether this instance can serve: the database answers and every migration has run. */
export async function readiness(): Promise<Readiness> {
  try {
    const rows = await db().query<{ name: string }>('SELECT name FROM "SequelizeMeta"', {
      type: QueryTypes.SELECT,
      retry: { max: 1 },
    });
    const applied = new Set(rows.map((r) => r.name));
    const pending = migrationFiles().filter((f) => !applied.has(f)).length;
    return { ready: pending === 0, database: 'reachable', pendingMigrations: pending };
  } catch {
    return { ready: false, database: 'unreachable', pendingMigrations: migrationFiles().length };
  }
}
