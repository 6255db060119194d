import 'server-only';
import NextAuth from 'next-auth';
import type { NextRequest } from 'next/server';
import { appErrorOf } from '../api/respond';
import { env } from '../env';
import { AppError } from '../errors';
import { clientAddress } from '../http/client-address';
import { log } from '../log';
import { authOptions } from './options';
import {
  admitSignIn,
  DEVICE_COOKIE,
  knownDeviceCookie,
  knownDeviceOf,
  signInSucceeded,
  type SignInAttempt,
} from './sign-in-throttle';

type Ctx = { params: Promise<{ nextauth: string[] }> };

export const SIGN_IN_RATE_LIMITED = 'rate_limited';
const DEVICE_COOKIE_MAX_AGE_SECONDS = 180 * 24 * 60 * 60;

function errorAnswer(error: AppError, signInError: string): Response {
  // next-auth's browser client reads `url` (its `error` parameter) from any answer; the rest is the API's error shape.
  const url = new URL('/api/auth/error', env().NEXTAUTH_URL);
  url.searchParams.set('error', signInError);
  const headers = new Headers({ 'content-type': 'application/json', 'cache-control': 'no-store' });
  if (error.retryAfterSeconds !== undefined) headers.set('retry-after', String(error.retryAfterSeconds));
  return new Response(JSON.stringify({ url: url.toString(), ...error.toBody() }), { status: error.status, headers });
}

async function attemptOf(req: NextRequest): Promise<SignInAttempt | null> {
  let email: unknown;
  try {
    email = (await req.clone().formData()).get('email');
  } catch {
    return null;
  }
  if (typeof email !== 'string' || email.length === 0 || email.length > 320) return null;
  return {
    email,
    address: clientAddress(req.headers.get('x-forwarded-for'), env().RUNNEL_TRUSTED_PROXY_COUNT),
    knownDevice: knownDeviceOf(req.cookies.get(DEVICE_COOKIE)?.value, email),
  };
}

function startedSession(res: Response): boolean {
  return res.headers.getSetCookie().some((c) => /^(__Secure-)?next-auth\.session-token=[^;]+/.test(c));
}

/**
 * The credentials sign-in with its throttle around next-auth: count first (429 with Retry-After
 * when over a limit, before any password hashing), then next-auth checks the password; on success
 * the account's count is cleared and the browser is remembered as a known device.
 */
export async function credentialsSignIn(req: NextRequest, ctx: Ctx): Promise<Response> {
  const attempt = await attemptOf(req);
  if (attempt) {
    try {
      const admission = await admitSignIn(attempt);
      if (!admission.allowed) {
        const refusal = new AppError(
          'rate_limited',
          'Too many sign-in attempts. Wait a few minutes, then try again.',
          undefined,
          { retryAfterSeconds: admission.retryAfterSeconds },
        );
        return errorAnswer(refusal, SIGN_IN_RATE_LIMITED);
      }
    } catch (error) {
      const refusal = appErrorOf(error);
      log().warn({ err: error }, 'sign-in throttle unavailable');
      return errorAnswer(refusal, refusal.code === 'service_unavailable' ? 'unavailable' : 'internal');
    }
  }
  const res = await NextAuth(req, ctx, authOptions());
  if (attempt && startedSession(res)) {
    await signInSucceeded(attempt).catch((err: unknown) => log().warn({ err }, 'could not clear sign-in counts'));
    const secure = env().NEXTAUTH_URL.startsWith('https:') ? '; Secure' : '';
    res.headers.append(
      'set-cookie',
      `${DEVICE_COOKIE}=${knownDeviceCookie(attempt.email)}; Path=/api/auth; Max-Age=${DEVICE_COOKIE_MAX_AGE_SECONDS}; HttpOnly; SameSite=Lax${secure}`,
    );
  }
  return res;
}
