import { publicRoute } from '@/lib/api/route';
import { db } from '@/lib/db';

// For load balancers and the scale test: answers 200 only while this instance reaches the database.
export const dynamic = 'force-dynamic';

export const GET = publicRoute({}, async () => {
  await db().query('SELECT 1');
  return { ok: true };
});
