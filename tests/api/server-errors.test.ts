import { ConnectionRefusedError, DatabaseError } from 'sequelize';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { GET as listProjects } from '@/app/api/teams/[teamId]/projects/route';
import { log } from '@/lib/log';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';

/** Makes the list's own read fail once with `error`; every other statement (the session's role read) runs. */
function failListReadOnce(error: Error) {
  const sequelize = models().sequelize;
  const original = sequelize.query.bind(sequelize) as (...args: unknown[]) => Promise<unknown>;
  let failed = false;
  const spy = vi.spyOn(sequelize, 'query').mockImplementation(((...args: unknown[]) => {
    if (!failed && typeof args[0] === 'string' && args[0].includes('FROM projects WHERE team_id')) {
      failed = true;
      return Promise.reject(error);
    }
    return original(...args);
  }) as never);
  return { spy, failed: () => failed };
}

describe('a database failure inside a handler', () => {
  afterEach(() => vi.restoreAllMocks());

  it('is logged and answered with a generic 500 that leaks nothing', async () => {
    const f = await createTeamFixture();
    const secret = 'relation "projects" column "password_hash" detail';
    const injected = failListReadOnce(
      new DatabaseError(Object.assign(new Error(secret), { sql: 'SELECT 1' }) as never),
    );
    const logged = vi.spyOn(log(), 'error').mockImplementation(() => undefined);

    const res = await call(listProjects, {
      method: 'GET',
      path: '/x',
      params: { teamId: f.teamId },
      userId: f.users.viewer.id,
    });
    expect(injected.failed()).toBe(true);
    expect(res.status).toBe(500);
    expect(res.json.error.code).toBe('internal');
    expect(JSON.stringify(res.json)).not.toContain('password_hash');
    expect(logged).toHaveBeenCalled();
  });

  it('answers 503 with Retry-After, and no driver text, while the database cannot be reached', async () => {
    const f = await createTeamFixture();
    const driver = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5505'), { code: 'ECONNREFUSED' });
    const injected = failListReadOnce(new ConnectionRefusedError(driver as never));
    vi.spyOn(log(), 'warn').mockImplementation(() => undefined);

    const res = await call(listProjects, {
      method: 'GET',
      path: '/x',
      params: { teamId: f.teamId },
      userId: f.users.viewer.id,
    });
    expect(injected.failed()).toBe(true);
    expect(res.status).toBe(503);
    expect(res.json.error.code).toBe('service_unavailable');
    expect(Number(res.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(JSON.stringify(res.json)).not.toMatch(/ECONNREFUSED|127\.0\.0\.1|5505/);
  });

  it('marks API answers no-store', async () => {
    const f = await createTeamFixture();
    const res = await call(listProjects, {
      method: 'GET',
      path: '/x',
      params: { teamId: f.teamId },
      userId: f.users.viewer.id,
    });
    expect(res.status).toBe(200);
    expect(res.headers.get('cache-control')).toBe('no-store');
  });
});
