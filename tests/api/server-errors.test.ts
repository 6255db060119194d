import { ConnectionRefusedError, DatabaseError } from 'sequelize';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { GET as listProjects } from '@/app/api/teams/[teamId]/projects/route';
import { log } from '@/lib/log';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';

describe('a database failure inside a handler', () => {
  afterEach(() => vi.restoreAllMocks());

  it('is logged and answered with a generic 500 that leaks nothing', async () => {
    const f = await createTeamFixture();
    const secret = 'relation "projects" column "password_hash" detail';
    vi.spyOn(models().Project, 'findAll').mockRejectedValueOnce(new DatabaseError(Object.assign(new Error(secret), { sql: 'SELECT 1' }) as never));
    const logged = vi.spyOn(log(), 'error').mockImplementation(() => undefined);

    const res = await call(listProjects, { method: 'GET', path: '/x', params: { teamId: f.teamId }, userId: f.users.viewer.id });
    expect(res.status).toBe(500);
    expect(res.json.error.code).toBe('internal');
    expect(JSON.stringify(res.json)).not.toContain('password_hash');
    expect(logged).toHaveBeenCalled();
  });

  it('answers 503 with Retry-After, and no driver text, while the database cannot be reached', async () => {
    const f = await createTeamFixture();
    const driver = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5505'), { code: 'ECONNREFUSED' });
    vi.spyOn(models().Project, 'findAll').mockRejectedValueOnce(new ConnectionRefusedError(driver as never));
    vi.spyOn(log(), 'warn').mockImplementation(() => undefined);

    const res = await call(listProjects, { method: 'GET', path: '/x', params: { teamId: f.teamId }, userId: f.users.viewer.id });
    expect(res.status).toBe(503);
    expect(res.json.error.code).toBe('service_unavailable');
    expect(Number(res.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(JSON.stringify(res.json)).not.toMatch(/ECONNREFUSED|127\.0\.0\.1|5505/);
  });

  it('marks API answers no-store', async () => {
    const f = await createTeamFixture();
    const res = await call(listProjects, { method: 'GET', path: '/x', params: { teamId: f.teamId }, userId: f.users.viewer.id });
    expect(res.status).toBe(200);
    expect(res.headers.get('cache-control')).toBe('no-store');
  });
});
