import { getToken, type JWT } from 'next-auth/jwt';
import type { NextRequest } from 'next/server';
import { QueryTypes } from 'sequelize';
import { models } from '../../models';
import { db } from '../db';
import { env } from '../env';
import type { Role } from '../roles';
import type { SessionUser } from './users';

/**
 * The signed-in user behind a request, re-read from the database every time: a JWT outlives
 * sign-out and role changes, so the token only names the user and the session version it was
 * issued under; a bumped version (sign-out, sign out everywhere) ends it.
 */
/** The user id and session version a token names, or null for a token that names none. */
export function tokenSubject(token: JWT | null): { id: string; sessionVersion: number } | null {
  if (!token?.sub || typeof token.sv !== 'number') return null;
  if (!/^[0-9a-f-]{36}$/i.test(token.sub)) return null;
  return { id: token.sub, sessionVersion: token.sv };
}

export async function userFromToken(token: JWT | null): Promise<SessionUser | null> {
  if (!tokenSubject(token) || !token?.sub) return null;
  // Plain row, four columns: this runs on every request.
  const user = await models().User.findByPk(token.sub, {
    attributes: ['id', 'email', 'name', 'sessionVersion'],
    raw: true,
  });
  if (!user || user.sessionVersion !== token.sv) return null;
  return { id: user.id, email: user.email, name: user.name, sessionVersion: user.sessionVersion };
}

const secureCookie = () => env().NEXTAUTH_URL.startsWith('https://');

/**
 * Decoded tokens by the headers that carried them. Decoding (key derivation, then decryption) is
 * the costliest step of reading a session, and a browser sends the same cookie on every request.
 * Only what the token says is kept (a pure function of those headers), never past its expiry and
 * for a minute at most; the user is still re-read on every request, so sign-out ends it at once.
 */
const decodedTokens = new Map<string, { token: JWT | null; until: number }>();
const DECODED_TOKENS_MAX = 1000;
const DECODED_TOKEN_MS = 60_000;

export async function sessionTokenOf(req: NextRequest): Promise<JWT | null> {
  const key = `${req.headers.get('cookie') ?? ''}\n${req.headers.get('authorization') ?? ''}`;
  const now = Date.now();
  const hit = decodedTokens.get(key);
  if (hit && hit.until > now) return hit.token;
  const token = await getToken({ req, secret: env().NEXTAUTH_SECRET, secureCookie: secureCookie() });
  const expires = typeof token?.exp === 'number' ? token.exp * 1000 : now + DECODED_TOKEN_MS;
  if (decodedTokens.size >= DECODED_TOKENS_MAX) decodedTokens.delete(decodedTokens.keys().next().value!);
  decodedTokens.set(key, { token, until: Math.min(now + DECODED_TOKEN_MS, expires) });
  return token;
}

export async function userFromRequest(req: NextRequest): Promise<SessionUser | null> {
  return userFromToken(await sessionTokenOf(req));
}

/**
 * The user a token names, if its session is still current, and their role on the team, in one
 * query (every team handler asks both).
 */
export async function userAndRoleOf(
  subject: { id: string; sessionVersion: number },
  teamId: string | null,
): Promise<{ user: SessionUser | null; role: Role | null }> {
  const [row] = await db().query<{
    id: string;
    email: string;
    name: string;
    sessionVersion: number;
    role: Role | null;
  }>(
    `SELECT u.id, u.email, u.name, u.session_version AS "sessionVersion", m.role
       FROM users u LEFT JOIN memberships m ON m.user_id = u.id AND m.team_id = :teamId
      WHERE u.id = :userId`,
    { type: QueryTypes.SELECT, replacements: { userId: subject.id, teamId } },
  );
  if (!row || row.sessionVersion !== subject.sessionVersion) return { user: null, role: null };
  return { user: { id: row.id, email: row.email, name: row.name, sessionVersion: row.sessionVersion }, role: row.role };
}

/** For server components and server actions, which have cookies but no request object. */
export async function userFromCookies(cookies: Record<string, string>): Promise<SessionUser | null> {
  const req = { cookies, headers: {} } as unknown as NextRequest;
  const token = await getToken({ req, secret: env().NEXTAUTH_SECRET, secureCookie: secureCookie() });
  return userFromToken(token);
}
