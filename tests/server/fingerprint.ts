import { QueryTypes } from 'sequelize';
import { db } from '@/lib/db';

// Counters that a refused request may legitimately move (rate limits) are not application data.
const NOT_DATA = new Set(['rate_limits', 'SequelizeMeta', 'SequelizeData']);

let tables: string[] | undefined;

async function dataTables(): Promise<string[]> {
  tables ??= (await db().query<{ name: string }>(`SELECT tablename AS name FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`, { type: QueryTypes.SELECT }))
    .map((t) => t.name)
    .filter((name) => !NOT_DATA.has(name));
  return tables;
}

/**
 * The database's fingerprint: per table, its row count and a hash of its rows (the sum of each
 * row's md5, so no sort is needed and the order rows are stored in does not matter). Two equal
 * fingerprints mean nothing was written in between. One round trip for every table.
 */
export async function fingerprint(): Promise<Record<string, string>> {
  const names = await dataTables();
  const parts = names.map((name) => {
    const quoted = `"${name.replace(/"/g, '""')}"`;
    const literal = `'${name.replace(/'/g, "''")}'`;
    return `SELECT ${literal} AS name, count(*)::text AS n, coalesce(sum(('x' || left(md5(t::text), 15))::bit(60)::bigint::numeric), 0)::text AS h FROM ${quoted} t`;
  });
  const rows = await db().query<{ name: string; n: string; h: string }>(parts.join(' UNION ALL '), { type: QueryTypes.SELECT });
  return Object.fromEntries(rows.map((r) => [r.name, `${r.n}:${r.h}`]));
}

/** Tables whose fingerprint differs, for a readable failure. */
export function changedTables(before: Record<string, string>, after: Record<string, string>): string[] {
  return [...new Set([...Object.keys(before), ...Object.keys(after)])].filter((name) => before[name] !== after[name]).sort();
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
