import { QueryTypes } from 'sequelize';
import { db } from '@/lib/db';

// Counters that a refused request may legitimately move (rate limits) are not application data.
const NOT_DATA = new Set(['rate_limits', 'SequelizeMeta']);

/**
 * The database's fingerprint: per table, its row count and an md5 of its rows in order. Two equal
 * fingerprints mean nothing was written in between.
 */
export async function fingerprint(): Promise<Record<string, string>> {
  const tables = await db().query<{ name: string }>(`SELECT tablename AS name FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`, { type: QueryTypes.SELECT });
  const out: Record<string, string> = {};
  for (const { name } of tables) {
    if (NOT_DATA.has(name)) continue;
    const quoted = `"${name.replace(/"/g, '""')}"`;
    const [row] = await db().query<{ n: string; h: string | null }>(`SELECT count(*)::text AS n, md5(string_agg(t::text, '|' ORDER BY t::text)) AS h FROM ${quoted} t`, { type: QueryTypes.SELECT });
    out[name] = `${row!.n}:${row!.h ?? '-'}`;
  }
  return out;
}
