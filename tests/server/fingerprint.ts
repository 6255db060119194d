import { QueryTypes } from 'sequelize';
import { db } from '@/lib/db';

// Counters that a refused request may legitimately move (rate limits) are not application data.
const NOT_DATA = new Set(['rate_limits', 'SequelizeMeta', 'SequelizeData']);

/** Runs a read on some database and returns its rows. */
export type ReadRows = (sql: string) => Promise<object[]>;
const appDatabase: ReadRows = (sql) => db().query(sql, { type: QueryTypes.SELECT });

let tables: string[] | undefined;

async function dataTables(rows: ReadRows = appDatabase): Promise<string[]> {
  const read = async () =>
    (
      (await rows(`SELECT tablename AS name FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`)) as {
        name: string;
      }[]
    )
      .map((t) => t.name)
      .filter((name) => !NOT_DATA.has(name));
  if (rows !== appDatabase) return read();
  tables ??= await read();
  return tables;
}

/**
 * The database's fingerprint: per table, its row count and a hash of its rows (the sum of each
 * row's md5, so no sort is needed and the order rows are stored in does not matter). Two equal
 * fingerprints mean nothing was written in between. One round trip for every table. The app's
 * database unless `rows` reads another (the backup tests' scratch database).
 */
export async function fingerprint(rows: ReadRows = appDatabase): Promise<Record<string, string>> {
  const names = await dataTables(rows);
  const parts = names.map((name) => {
    const quoted = `"${name.replace(/"/g, '""')}"`;
    const literal = `'${name.replace(/'/g, "''")}'`;
    return `SELECT ${literal} AS name, count(*)::text AS n, coalesce(sum(('x' || left(md5(t::text), 15))::bit(60)::bigint::numeric), 0)::text AS h FROM ${quoted} t`;
  });
  const result = (await rows(parts.join(' UNION ALL '))) as { name: string; n: string; h: string }[];
  return Object.fromEntries(result.map((r) => [r.name, `${r.n}:${r.h}`]));
}

/** Tables whose fingerprint differs, for a readable failure. */
export function changedTables(before: Record<string, string>, after: Record<string, string>): string[] {
  return [...new Set([...Object.keys(before), ...Object.keys(after)])]
    .filter((name) => before[name] !== after[name])
    .sort();
}

/**
 * Waits until the background work a previous request started (queued mail, network runs) is done,
 * so a fingerprint taken next only changes if a request under test writes. Jobs locked long ago
 * belong to a stopped server and are not waited for. Gives up after `ms`.
 */
export async function settle(ms = 8_000): Promise<void> {
  const deadline = Date.now() + ms;
  for (;;) {
    const [row] = await db().query<{ busy: string }>(
      `SELECT ((SELECT count(*) FROM graphile_worker._private_jobs WHERE (locked_at IS NULL AND attempts < max_attempts AND run_at <= now() + interval '1 second') OR locked_at > now() - interval '30 seconds') + (SELECT count(*) FROM network_jobs WHERE status IN ('queued', 'running') AND updated_at > now() - interval '20 seconds'))::text AS busy`,
      { type: QueryTypes.SELECT },
    );
    if (row!.busy === '0' || Date.now() > deadline) return;
    await new Promise((r) => setTimeout(r, 100));
  }
}

/**
 * A log of committed writes, for checking every single call cheaply: statement triggers with
 * transition tables on every data table note each INSERT, UPDATE and DELETE that touched a row
 * (in a schema of its own, so the fingerprint never sees it). A rolled-back write leaves no note,
 * like it leaves no row. `writesSince(mark)` is then one indexed query instead of hashing every
 * row of the database.
 */
const LOG = 'runnel_harness';

export async function startWriteLog(): Promise<number> {
  const q = (sql: string) => db().query(sql);
  await q(`CREATE SCHEMA IF NOT EXISTS ${LOG}`);
  await q(
    `CREATE TABLE IF NOT EXISTS ${LOG}.writes (id bigserial PRIMARY KEY, table_name text NOT NULL, op text NOT NULL, row_count bigint NOT NULL)`,
  );
  for (const [name, rows] of [
    ['note_new', 'new_rows'],
    ['note_old', 'old_rows'],
  ]) {
    await q(`CREATE OR REPLACE FUNCTION ${LOG}.${name}() RETURNS trigger LANGUAGE plpgsql AS $$
      DECLARE n bigint;
      BEGIN
        SELECT count(*) INTO n FROM ${rows};
        IF n > 0 THEN INSERT INTO ${LOG}.writes (table_name, op, row_count) VALUES (TG_TABLE_NAME, TG_OP, n); END IF;
        RETURN NULL;
      END $$`);
  }
  for (const name of await dataTables()) {
    const t = `"${name.replace(/"/g, '""')}"`;
    await q(
      `CREATE OR REPLACE TRIGGER ${LOG}_insert AFTER INSERT ON ${t} REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION ${LOG}.note_new()`,
    );
    await q(
      `CREATE OR REPLACE TRIGGER ${LOG}_update AFTER UPDATE ON ${t} REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION ${LOG}.note_new()`,
    );
    await q(
      `CREATE OR REPLACE TRIGGER ${LOG}_delete AFTER DELETE ON ${t} REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION ${LOG}.note_old()`,
    );
  }
  return writeMark();
}

/** The newest note: pass it to `writesSince` after the next call. */
export async function writeMark(): Promise<number> {
  const [row] = await db().query<{ mark: string }>(`SELECT coalesce(max(id), 0)::text AS mark FROM ${LOG}.writes`, {
    type: QueryTypes.SELECT,
  });
  return Number(row!.mark);
}

/** Writes committed after `mark`, as `INSERT comments ×1`, and the new mark. */
export async function writesSince(mark: number): Promise<{ writes: string[]; mark: number }> {
  const rows = await db().query<{ id: string; table_name: string; op: string; row_count: string }>(
    `SELECT id::text, table_name, op, row_count::text FROM ${LOG}.writes WHERE id > :mark ORDER BY id`,
    { type: QueryTypes.SELECT, replacements: { mark } },
  );
  return {
    writes: rows.map((r) => `${r.op} ${r.table_name} ×${r.row_count}`),
    mark: rows.length ? Number(rows[rows.length - 1]!.id) : mark,
  };
}

/** Removes the triggers and the log. */
export async function stopWriteLog(): Promise<void> {
  for (const name of await dataTables()) {
    const t = `"${name.replace(/"/g, '""')}"`;
    for (const op of ['insert', 'update', 'delete']) await db().query(`DROP TRIGGER IF EXISTS ${LOG}_${op} ON ${t}`);
  }
  await db().query(`DROP SCHEMA IF EXISTS ${LOG} CASCADE`);
}
