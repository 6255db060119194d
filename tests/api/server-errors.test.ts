import { DatabaseError } from 'sequelize';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { GET as listProjects } from '@/app/api/teams/[teamId]/projects/route';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';

describe('a database failure inside a handler', () => {
  afterEach(() => vi.restoreAllMocks());

  it('is logged and answered with a generic 500 that leaks nothing', async () => {
    const f = await createTeamFixture();
    const secret = 'relation "projects" column "password_hash" detail';
    vi.spyOn(models().Project, 'findAll').mockRejectedValueOnce(new DatabaseError(Object.assign(new Error(secret), { sql: 'SELECT 1' }) as never));
    const logged = vi.spyOn(console, 'error').mockImplementation(() => undefined);

    const res = await call(listProjects, { method: 'GET', path: '/x', params: { teamId: f.teamId }, userId: f.users.viewer.id });
    expect(res.status).toBe(500);
    expect(res.json.error.code).toBe('internal');
    expect(JSON.stringify(res.json)).not.toContain('password_hash');
    expect(logged).toHaveBeenCalled();
  });
});
