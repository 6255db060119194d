import { getToken, type JWT } from 'next-auth/jwt';
import type { NextRequest } from 'next/server';
import { models } from '../../models';
import { env } from '../env';
import type { SessionUser } from './users';

/**
 * The signed-in user behind a request, re-read from the database every time: a JWT outlives
 * sign-out and role changes, so the token only names the user and the session version it was
 * issued under; a bumped version (sign-out, sign out everywhere) ends it.
 */
export async function userFromToken(token: JWT | null): Promise<SessionUser | null> {
  if (!token?.sub || typeof token.sv !== 'number') return null;
  if (!/^[0-9a-f-]{36}$/i.test(token.sub)) return null;
  const user = await models().User.findByPk(token.sub);
  if (!user || user.sessionVersion !== token.sv) return null;
  return { id: user.id, email: user.email, name: user.name, sessionVersion: user.sessionVersion };
}

const secureCookie = () => env().NEXTAUTH_URL.startsWith('https://');

export async function userFromRequest(req: NextRequest): Promise<SessionUser | null> {
  const token = await getToken({ req, secret: env().NEXTAUTH_SECRET, secureCookie: secureCookie() });
  return userFromToken(token);
}

/** For server components and server actions, which have cookies but no request object. */
export async function userFromCookies(cookies: Record<string, string>): Promise<SessionUser | null> {
  const req = { cookies, headers: {} } as unknown as NextRequest;
  const token = await getToken({ req, secret: env().NEXTAUTH_SECRET, secureCookie: secureCookie() });
  return userFromToken(token);
}
