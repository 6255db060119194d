import { beforeEach, describe, expect, it } from 'vitest';
import { POST as createAccount } from '@/app/api/accounts/route';
import { PATCH as patchProject } from '@/app/api/projects/[projectId]/route';
import { POST as invite } from '@/app/api/teams/[teamId]/invitations/route';
import { GET as listProjects, POST as createProject } from '@/app/api/teams/[teamId]/projects/route';
import { models } from '@/models';
import { call, createTeamFixture } from '../support/api';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;

async function projectCount(teamId: string) {
  return models().Project.count({ where: { teamId } });
}

describe('bad input is refused with 400 and field errors, and nothing is written', () => {
  let f: Fixture;
  beforeEach(async () => {
    f = await createTeamFixture();
  });

  const create = (body: unknown, rawBody?: string) =>
    call(createProject, {
      method: 'POST',
      path: '/api/teams/x/projects',
      params: { teamId: f.teamId },
      body,
      rawBody,
      userId: f.users.designer.id,
    });

  const cases: [string, unknown, string][] = [
    ['a missing name', { description: 'x' }, 'name'],
    ['a number for a name', { name: 42 }, 'name'],
    ['an over-long name', { name: 'x'.repeat(121) }, 'name'],
    ['a blank name', { name: '   ' }, 'name'],
    ['a NUL byte in the description', { name: 'Line', description: 'a\u0000b' }, 'description'],
    ['an unknown unit system', { name: 'Line', unitSystem: 'imperial' }, 'unitSystem'],
    ['an unknown field', { name: 'Line', owner: 'me' }, 'owner'],
    ['an array instead of an object', [{ name: 'Line' }], '_'],
  ];

  it.each(cases)('project creation: %s', async (_label, body, field) => {
    const res = await create(body);
    expect(res.status).toBe(400);
    expect(res.json.error.code).toBe('bad_request');
    expect(Object.keys(res.json.error.fields)).toContain(field);
    expect(await projectCount(f.teamId)).toBe(1);
  });

  it('malformed JSON', async () => {
    const res = await create(undefined, '{"name": "Line",');
    expect(res.status).toBe(400);
    expect(res.json.error.message).toBe('Request body is not valid JSON');
    expect(await projectCount(f.teamId)).toBe(1);
  });

  it('a body over the size cap gets 413', async () => {
    const res = await create(undefined, JSON.stringify({ name: 'Line', description: 'x'.repeat(1_100_000) }));
    expect(res.status).toBe(413);
    expect(res.json.error.code).toBe('payload_too_large');
    expect(await projectCount(f.teamId)).toBe(1);
  });

  it('a malformed id in the address is refused before the database is asked', async () => {
    const res = await call(listProjects, {
      method: 'GET',
      path: '/api/teams/x/projects',
      params: { teamId: "1' OR '1'='1" },
      userId: f.users.owner.id,
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toContain('teamId');
  });

  it('an array where one id belongs is refused', async () => {
    const res = await call(invite, {
      method: 'POST',
      path: '/api/teams/x/invitations',
      params: { teamId: f.teamId },
      body: { email: [f.users.outsider.email, 'x@example.test'], role: 'viewer' },
      userId: f.users.owner.id,
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields)).toContain('email');
  });

  it('an empty update is refused and the project is unchanged', async () => {
    const before = await models().Project.findByPk(f.projectId);
    const res = await call(patchProject, {
      method: 'PATCH',
      path: '/api/projects/x',
      params: { projectId: f.projectId },
      body: {},
      userId: f.users.designer.id,
    });
    expect(res.status).toBe(400);
    const after = await models().Project.findByPk(f.projectId);
    expect(after!.updatedAt.getTime()).toBe(before!.updatedAt.getTime());
  });

  it('a project time zone: a real zone is kept, an unknown one is refused by name and nothing changes', async () => {
    const patch = (body: unknown) =>
      call(patchProject, {
        method: 'PATCH',
        path: '/api/projects/x',
        params: { projectId: f.projectId },
        body,
        userId: f.users.designer.id,
      });
    const bad = await patch({ timeZone: 'Mars/Olympus' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.json.error.fields)).toEqual(['timeZone']);
    expect((await models().Project.findByPk(f.projectId))!.timeZone).toBeNull();
    const good = await patch({ timeZone: 'America/Denver' });
    expect(good.status).toBe(200);
    expect((await models().Project.findByPk(f.projectId))!.timeZone).toBe('America/Denver');
  });

  it('sign-up: a weak password and a bad e-mail are named, and no account is made', async () => {
    const email = `not-an-email-${Date.now()}`;
    const res = await call(createAccount, {
      method: 'POST',
      path: '/api/accounts',
      body: { name: 'A', email, password: 'short' },
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.error.fields).sort()).toEqual(['email', 'password']);
    expect(await models().User.count({ where: { email } })).toBe(0);
  });

  it('sign-up: a taken e-mail gets the usual answer (no enumeration) and the existing account is untouched', async () => {
    const res = await call(createAccount, {
      method: 'POST',
      path: '/api/accounts',
      body: { name: 'Copy', email: f.users.owner.email, password: 'a long enough passphrase' },
    });
    expect(res.status).toBe(202);
    expect(res.json).toEqual({ status: 'check-your-mail', email: f.users.owner.email });
    const user = await models().User.findOne({ where: { email: f.users.owner.email } });
    expect(user!.name).toBe('Fixture owner');
  });
});
