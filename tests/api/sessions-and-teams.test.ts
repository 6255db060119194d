import { beforeEach, describe, expect, it } from 'vitest';
import { POST as signOutEverywhere } from '@/app/api/accounts/sign-out-everywhere/route';
import { GET as getProject } from '@/app/api/projects/[projectId]/route';
import { DELETE as removeMember, PATCH as changeRole } from '@/app/api/teams/[teamId]/members/[userId]/route';
import { GET as listTeamProjects } from '@/app/api/teams/[teamId]/projects/route';
import { GET as listTeams } from '@/app/api/teams/route';
import { authOptions } from '@/lib/auth/options';
import { teamOfLine } from '@/lib/data/lines';
import { teamOfProject } from '@/lib/data/projects';
import { teamOfRoute } from '@/lib/data/routes';
import { models } from '@/models';
import { call, createTeamFixture, sessionCookie } from '../support/api';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;

describe('sessions', () => {
  let f: Fixture;
  beforeEach(async () => {
    f = await createTeamFixture();
  });

  it('"sign out everywhere" ends tokens issued before it', async () => {
    const oldCookie = await sessionCookie(f.users.designer.id);
    expect((await call(listTeams, { method: 'GET', path: '/api/teams', cookie: oldCookie })).status).toBe(200);
    expect(
      (await call(signOutEverywhere, { method: 'POST', path: '/api/accounts/sign-out-everywhere', cookie: oldCookie }))
        .status,
    ).toBe(200);
    expect((await call(listTeams, { method: 'GET', path: '/api/teams', cookie: oldCookie })).status).toBe(401);
    expect((await call(listTeams, { method: 'GET', path: '/api/teams', userId: f.users.designer.id })).status).toBe(
      200,
    );
  });

  it('a role change takes effect on the next request with the same token', async () => {
    const cookie = await sessionCookie(f.users.extra.id);
    const read = () =>
      call(getProject, { method: 'GET', path: '/api/projects/x', params: { projectId: f.projectId }, cookie });
    expect((await read()).status).toBe(200);
    await call(removeMember, {
      method: 'DELETE',
      path: '/x',
      params: { teamId: f.teamId, userId: f.users.extra.id },
      userId: f.users.owner.id,
    });
    expect((await read()).status).toBe(404);
  });

  it('a forged token signed with another secret is anonymous', async () => {
    const { encode } = await import('next-auth/jwt');
    const token = await encode({
      token: { sub: f.users.owner.id, sv: 0 },
      secret: 'another secret that is long enough to use',
    });
    const res = await call(listTeams, {
      method: 'GET',
      path: '/api/teams',
      cookie: `next-auth.session-token=${token}`,
    });
    expect(res.status).toBe(401);
  });
});

describe('sign-in', () => {
  const credentials = authOptions().providers[0] as unknown as {
    options: { authorize: (c: Record<string, string>, req: { headers: Record<string, string> }) => Promise<unknown> };
  };
  const authorize = (email: string, password: string) =>
    credentials.options.authorize({ email, password }, { headers: {} });

  it('accepts the right password and refuses a wrong one or an unknown e-mail alike', async () => {
    const user = await models().User.findOne({ where: { email: 'owner@example.test' } });
    expect(await authorize('owner@example.test', 'tarnbeck-demo-2026')).toMatchObject({ id: user!.id });
    expect(await authorize('owner@example.test', 'wrong password')).toBeNull();
    expect(await authorize('nobody@example.test', 'wrong password')).toBeNull();
  });
});

describe('teams', () => {
  let f: Fixture;
  beforeEach(async () => {
    f = await createTeamFixture();
  });

  it('the last owner can be neither demoted nor removed', async () => {
    const demote = await call(changeRole, {
      method: 'PATCH',
      path: '/x',
      params: { teamId: f.teamId, userId: f.users.owner.id },
      body: { role: 'designer' },
      userId: f.users.owner.id,
    });
    expect(demote.status).toBe(409);
    const remove = await call(removeMember, {
      method: 'DELETE',
      path: '/x',
      params: { teamId: f.teamId, userId: f.users.owner.id },
      userId: f.users.owner.id,
    });
    expect(remove.status).toBe(409);
    const m = await models().Membership.findOne({ where: { teamId: f.teamId, userId: f.users.owner.id } });
    expect(m!.role).toBe('owner');
  });

  it('an owner can step down once another owner exists', async () => {
    await call(changeRole, {
      method: 'PATCH',
      path: '/x',
      params: { teamId: f.teamId, userId: f.users.designer.id },
      body: { role: 'owner' },
      userId: f.users.owner.id,
    });
    const demote = await call(changeRole, {
      method: 'PATCH',
      path: '/x',
      params: { teamId: f.teamId, userId: f.users.owner.id },
      body: { role: 'viewer' },
      userId: f.users.owner.id,
    });
    expect(demote.status).toBe(200);
    expect(demote.json.member.role).toBe('viewer');
  });
});

describe("a team's project list", () => {
  let f: Fixture;
  beforeEach(async () => {
    f = await createTeamFixture();
  });

  it('lists every project exactly as the project read shows it, most recently changed first', async () => {
    const { Project } = models();
    const older = await Project.findByPk(f.projectId);
    await older!.update({
      frostDepthM: 0.9,
      decimalMark: ',',
      timeZone: 'Pacific/Auckland',
      archivedAt: new Date('2026-11-30T10:00:00Z'),
    });
    const newer = await Project.create({
      teamId: f.teamId,
      name: 'Upper tank line',
      description: 'to the ridge',
      siteNotes: 'gate code 4',
      unitSystem: 'us',
    });
    const res = await call(listTeamProjects, {
      method: 'GET',
      path: '/x',
      params: { teamId: f.teamId },
      userId: f.users.viewer.id,
    });
    expect(res.status).toBe(200);
    const one = async (projectId: string) =>
      (await call(getProject, { method: 'GET', path: '/x', params: { projectId }, userId: f.users.viewer.id })).json
        .project;
    expect(res.json.projects).toEqual([await one(newer.id), await one(f.projectId)]);
    expect(res.json.projects[1]).toMatchObject({
      frostDepthM: 0.9,
      decimalMark: ',',
      timeZone: 'Pacific/Auckland',
      archived: true,
    });
  });

  it("finds the team of a project and of a project's rows, and none for an id that names nothing", async () => {
    const missing = '00000000-0000-4000-8000-000000000000';
    expect(await teamOfProject(f.projectId)).toBe(f.teamId);
    expect(await teamOfRoute(f.routeId)).toBe(f.teamId);
    expect(await teamOfLine(f.lineId)).toBe(f.teamId);
    for (const lookup of [teamOfProject, teamOfRoute, teamOfLine]) expect(await lookup(missing)).toBeNull();
    // A project id is not a line id: each lookup reads its own table.
    expect(await teamOfLine(f.projectId)).toBeNull();
  });

  it('answers a team that does not exist as it answers a team the user is not in (404), and no session first (401)', async () => {
    const missing = { teamId: '00000000-0000-4000-8000-000000000000' };
    const other = await call(listTeamProjects, {
      method: 'GET',
      path: '/x',
      params: { teamId: f.teamId },
      userId: f.users.outsider.id,
    });
    const none = await call(listTeamProjects, { method: 'GET', path: '/x', params: missing, userId: f.users.owner.id });
    expect(other.status).toBe(404);
    expect(none.status).toBe(404);
    expect(none.json).toEqual(other.json);
    expect((await call(listTeamProjects, { method: 'GET', path: '/x', params: missing })).status).toBe(401);
  });
});
