import { describe, expect, it } from 'vitest';
import { db } from '@/lib/db';
import { models } from '@/models';
import { createTeamFixture } from '../support/api';

describe('database', () => {
  it('survives its connections being cut: Sequelize retries instead of failing the request', async () => {
    const sequelize = db();
    await sequelize.query('SELECT 1');
    // Cut every other connection of this database, as a restart would.
    await sequelize.query(
      'SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE datname = current_database() AND pid <> pg_backend_pid()',
    );
    await sequelize.query('SELECT pg_terminate_backend(pg_backend_pid())').catch(() => undefined);
    const [rows] = await sequelize.query('SELECT 41 + 1 AS answer');
    expect(rows).toEqual([{ answer: 42 }]);
    expect(await models().User.count()).toBeGreaterThan(0);
  });

  it('models: deleting a team removes its memberships and projects, not its users', async () => {
    const f = await createTeamFixture();
    const { Team, Membership, Project, User } = models();
    await Team.destroy({ where: { id: f.teamId } });
    expect(await Membership.count({ where: { teamId: f.teamId } })).toBe(0);
    expect(await Project.count({ where: { teamId: f.teamId } })).toBe(0);
    expect(await User.count({ where: { id: f.users.owner.id } })).toBe(1);
  });

  it('models: the database refuses an unknown role even past the ORM', async () => {
    const f = await createTeamFixture();
    await expect(
      db().query("UPDATE memberships SET role = 'admin' WHERE team_id = :teamId", {
        replacements: { teamId: f.teamId },
      }),
    ).rejects.toThrow(/memberships_role_check/);
  });
});
