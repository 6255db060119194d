import { publicRoute } from '@/lib/api/route';
import { AppError } from '@/lib/errors';
import { readiness } from '@/lib/data/readiness';

/** Readiness: 200 when the database answers and every migration has run; 503 with Retry-After otherwise. */
export const GET = publicRoute({}, async () => {
  const state = await readiness();
  if (!state.ready) {
    const why =
      state.database === 'unreachable'
        ? 'the database cannot be reached'
        : `${state.pendingMigrations} migration(s) have not run`;
    throw new AppError('service_unavailable', `Not ready: ${why}`, undefined, { retryAfterSeconds: 5 });
  }
  return { status: 'ready', database: state.database, pendingMigrations: 0 };
});
