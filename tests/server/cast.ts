import { randomUUID } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { db } from '@/lib/db';
import { models } from '@/models';
import { giveKnownPassword, KNOWN_PASSWORD } from '../support/account-fixtures';
import { ACTORS, createTeamFixture, createUser, type Actor } from '../support/api';
import { createLineFixture } from '../support/line-fixture';
import { createRouteFixtures } from '../support/routes';
import { BASE, live, signIn, type LiveAnswer } from './live';

export type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;
export type SignedInActor = Exclude<Actor, 'anonymous'>;

/** A string only team B's objects carry: no answer to team A's people may ever contain it. */
export const MARKER = `bq7-marker-${randomUUID().slice(0, 8)}`;

const SESSION_COOKIE = /^(__Secure-)?next-auth\.session-token=/;

/** Signs in through the running app's own sign-in flow; returns the session cookie. */
export async function signInCookie(email: string): Promise<string> {
  const res = await signIn(email, KNOWN_PASSWORD);
  const cookie = res.cookies.find((c) => SESSION_COOKIE.test(c));
  if (res.status !== 200 || !cookie)
    throw new Error(`sign-in of ${email} failed: ${res.status} ${res.text.slice(0, 200)}`);
  return cookie;
}

/**
 * Team A (one member per role, and an outsider who owns a team of their own) with every actor
 * signed in through the real flow, and team B whose every name carries MARKER.
 */
export interface Cast {
  a: Fixture;
  b: Fixture;
  cookies: Record<Actor, string | undefined>;
  /** Strings of team B that must never reach team A: the marker and B's members' addresses. */
  secretsOfB: string[];
}

export async function createCast(): Promise<Cast> {
  const a = await createTeamFixture();
  const b = await createTeamFixture();
  await giveKnownPassword(Object.values(a.users).map((u) => u.id));
  const cookies = { anonymous: undefined } as Record<Actor, string | undefined>;
  for (const actor of ACTORS) if (actor !== 'anonymous') cookies[actor] = await signInCookie(a.users[actor].email);
  await markTeam(b.teamId);
  const secretsOfB = [
    MARKER,
    ...Object.entries(b.users)
      .filter(([k]) => k !== 'outsider')
      .map(([, u]) => u.email),
  ];
  return { a, b, cookies, secretsOfB };
}

/** Signs the actor in again (after a case that ends its sessions on purpose). */
export async function renewSession(cast: Cast, actor: SignedInActor): Promise<void> {
  await giveKnownPassword([cast.a.users[actor].id]);
  cast.cookies[actor] = await signInCookie(cast.a.users[actor].email);
}

let markable: { table: string; column: string }[] | undefined;

/**
 * Appends MARKER to every name, note and text of team B: the team, its members' names, its
 * projects and whatever any table keeps per project. Run again after making more of B's objects.
 */
export async function markTeam(teamId: string): Promise<void> {
  markable ??= await db().query<{ table: string; column: string }>(
    `SELECT c.table_name AS "table", c.column_name AS "column" FROM information_schema.columns c
      WHERE c.table_schema = 'public' AND c.data_type IN ('text', 'character varying')
        AND c.column_name IN ('name', 'notes', 'note', 'caption', 'body', 'description', 'site_notes', 'summary', 'file_name')
        AND EXISTS (SELECT 1 FROM information_schema.columns p WHERE p.table_schema = 'public' AND p.table_name = c.table_name AND p.column_name = 'project_id')`,
    { type: QueryTypes.SELECT },
  );
  const q = (sql: string) => db().query(sql, { replacements: { teamId, marker: ` ${MARKER}`, like: `%${MARKER}%` } });
  await q(`UPDATE teams SET name = name || :marker WHERE id = :teamId AND name NOT LIKE :like`);
  await q(
    `UPDATE users SET name = name || :marker WHERE id IN (SELECT user_id FROM memberships WHERE team_id = :teamId) AND name NOT LIKE :like`,
  );
  await q(
    `UPDATE projects SET name = name || :marker, description = description || :marker, site_notes = site_notes || :marker WHERE team_id = :teamId AND name NOT LIKE :like`,
  );
  for (const { table, column } of markable) {
    const t = `"${table}"`;
    const c = `"${column}"`;
    await q(
      `UPDATE ${t} SET ${c} = ${c} || :marker WHERE project_id IN (SELECT id FROM projects WHERE team_id = :teamId) AND ${c} IS NOT NULL AND ${c} NOT LIKE :like`,
    );
  }
}

/**
 * A fresh project of team A (two imported routes, a line) and a fresh extra member, with the
 * shared actors: a call that deletes or rewrites something cannot colour the next call.
 */
export async function freshFixture(cast: Cast): Promise<Fixture> {
  const { Project, Membership } = models();
  const project = await Project.create({
    teamId: cast.a.teamId,
    name: 'Live project',
    description: '',
    siteNotes: '',
    unitSystem: 'metric',
  });
  const routes = await createRouteFixtures(project.id, cast.a.users.surveyor.id);
  const line = await createLineFixture(project.id);
  const extra = await createUser('extra');
  await Membership.create({ teamId: cast.a.teamId, userId: extra.id, role: 'viewer' });
  return {
    ...cast.a,
    projectId: project.id,
    users: { ...cast.a.users, extra },
    ...routes,
    lineRouteId: line.routeId,
    lineId: line.lineId,
  };
}

export interface CallInput {
  method: string;
  path: string;
  body?: unknown;
  upload?: { body: Uint8Array; contentType: string };
  headers?: Record<string, string>;
}

/** One request to the running app as `actor` (its session cookie, if any). */
export function request(cast: Cast, actor: Actor, input: CallInput): Promise<LiveAnswer> {
  const headers: Record<string, string> = { ...(input.headers ?? {}) };
  const cookie = cast.cookies[actor];
  if (cookie) headers.cookie = cookie;
  let body: BodyInit | undefined;
  if (input.upload) {
    body = input.upload.body as BodyInit;
    headers['content-type'] = input.upload.contentType;
  } else if (input.body !== undefined) {
    body = JSON.stringify(input.body);
    headers['content-type'] ??= 'application/json';
  }
  return live(input.path, { method: input.method, headers, body });
}

/** `teams/[teamId]/route.ts` with `{ teamId }` -> `/api/teams/<id>`. */
export function apiPath(file: string, params: Record<string, string>): string {
  const dir = file.replace(/\/?route\.ts$/, '');
  const filled = dir.replace(/\[([^\]]+)\]/g, (_m, key: string) => {
    if (!(key in params)) throw new Error(`no value for [${key}] in ${file}`);
    return encodeURIComponent(params[key]!);
  });
  return `/api/${filled}`;
}

export { BASE };
