import './env';
import { randomUUID } from 'node:crypto';
import { encode } from 'next-auth/jwt';
import { NextRequest } from 'next/server';
import { env } from '@/lib/env';
import type { Role } from '@/lib/roles';
import { models } from '@/models';
import { createLineFixture } from './line-fixture';
import { createRouteFixtures } from './routes';

// One argon2id hash reused by every fixture user: hashing per user would only slow the suite.
const FIXTURE_HASH =
  '$argon2id$v=19$m=65536,t=3,p=4$ep57i7k5O57/C8UwlfRrPw$1xC2a4RhR8x32uTIA2yHhQXymRqQ+RHLaAHk6LuXN44';

export type Actor = 'anonymous' | 'outsider' | Role;
export const ACTORS: Actor[] = ['anonymous', 'outsider', 'viewer', 'reviewer', 'surveyor', 'designer', 'owner'];

type RouteHandler = (
  req: NextRequest,
  ctx: { params: Promise<Record<string, string | string[] | undefined>> },
) => Promise<Response>;

export async function createUser(label: string): Promise<{ id: string; email: string }> {
  const email = `${label}-${randomUUID().slice(0, 8)}@fixture.test`;
  const user = await models().User.create({
    email,
    name: `Fixture ${label}`,
    passwordHash: FIXTURE_HASH,
    emailVerifiedAt: new Date(),
  });
  return { id: user.id, email };
}

/** A team with one member per role, an outsider with a team of their own, and one project. */
export async function createTeamFixture() {
  const { Team, Membership, Project } = models();
  const team = await Team.create({ name: 'Fixture team' });
  const users = {} as Record<Role | 'outsider' | 'extra', { id: string; email: string }>;
  for (const role of ['owner', 'designer', 'surveyor', 'reviewer', 'viewer'] as Role[]) {
    users[role] = await createUser(role);
    await Membership.create({ teamId: team.id, userId: users[role].id, role });
  }
  users.extra = await createUser('extra');
  await Membership.create({ teamId: team.id, userId: users.extra.id, role: 'viewer' });
  users.outsider = await createUser('outsider');
  const otherTeam = await Team.create({ name: 'Outsider team' });
  await Membership.create({ teamId: otherTeam.id, userId: users.outsider.id, role: 'owner' });
  const project = await Project.create({
    teamId: team.id,
    name: 'Fixture project',
    description: '',
    siteNotes: '',
    unitSystem: 'metric',
  });
  const routes = await createRouteFixtures(project.id, users.surveyor.id);
  const line = await createLineFixture(project.id);
  return { teamId: team.id, projectId: project.id, users, ...routes, lineRouteId: line.routeId, lineId: line.lineId };
}

/** A session cookie as next-auth would set it, carrying the user's current session version. */
export async function sessionCookie(userId: string): Promise<string> {
  const user = await models().User.findByPk(userId);
  if (!user) throw new Error(`fixture user ${userId} is gone`);
  const token = await encode({
    token: { sub: user.id, email: user.email, name: user.name, sv: user.sessionVersion },
    secret: env().NEXTAUTH_SECRET,
  });
  return `next-auth.session-token=${token}`;
}

export interface CallOptions {
  method: string;
  path: string;
  params?: Record<string, string>;
  body?: unknown;
  rawBody?: string | Uint8Array;
  userId?: string;
  cookie?: string;
  headers?: Record<string, string>;
}

export async function call(
  handler: RouteHandler,
  options: CallOptions,
): Promise<{ status: number; json: any; text: string; bytes: Buffer; headers: Headers }> {
  const headers: Record<string, string> = { ...(options.headers ?? {}) };
  const cookie = options.cookie ?? (options.userId ? await sessionCookie(options.userId) : undefined);
  if (cookie) headers.cookie = cookie;
  const bodyText = options.rawBody ?? (options.body === undefined ? undefined : JSON.stringify(options.body));
  if (bodyText !== undefined) headers['content-type'] ??= 'application/json';
  const req = new NextRequest(new URL(options.path, 'http://127.0.0.1:3100'), {
    method: options.method,
    headers,
    body: bodyText as BodyInit | undefined,
  });
  const res = await handler(req, { params: Promise.resolve(options.params ?? {}) });
  const bytes = Buffer.from(await res.clone().arrayBuffer());
  const text = await res.text();
  const isJson = (res.headers.get('content-type') ?? '').includes('json');
  return { status: res.status, json: text && isJson ? JSON.parse(text) : null, text, bytes, headers: res.headers };
}
