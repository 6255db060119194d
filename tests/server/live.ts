/** The running app (tests/server/global-setup.ts). */
export const BASE = () => process.env.RUNNEL_SERVER_URL ?? 'http://127.0.0.1:3110';

export interface LiveAnswer {
  status: number;
  headers: Headers;
  text: string;
  json: any;
  /** Cookies the answer set, as `name=value`. */
  cookies: string[];
}

export async function live(pathName: string, init: RequestInit = {}): Promise<LiveAnswer> {
  const res = await fetch(new URL(pathName, BASE()), { redirect: 'manual', ...init });
  const text = await res.text();
  let json: unknown = null;
  try {
    json = text ? JSON.parse(text) : null;
  } catch {
    json = null;
  }
  return {
    status: res.status,
    headers: res.headers,
    text,
    json,
    cookies: res.headers.getSetCookie().map((c) => c.split(';')[0]!),
  };
}

/** Signs in through next-auth's real flow: CSRF token, then the credentials form. */
export async function signIn(
  email: string,
  password: string,
  options: { forwardedFor?: string; cookies?: string[] } = {},
): Promise<LiveAnswer> {
  const csrf = await live('/api/auth/csrf');
  const cookie = [...csrf.cookies, ...(options.cookies ?? [])].join('; ');
  const form = new URLSearchParams({
    email,
    password,
    csrfToken: csrf.json.csrfToken,
    callbackUrl: `${BASE()}/projects`,
    json: 'true',
  });
  return live('/api/auth/callback/credentials', {
    method: 'POST',
    headers: {
      'content-type': 'application/x-www-form-urlencoded',
      cookie,
      ...(options.forwardedFor ? { 'x-forwarded-for': options.forwardedFor } : {}),
    },
    body: form.toString(),
  });
}

export const sessionStarted = (a: LiveAnswer) =>
  a.cookies.some((c) => /^(__Secure-)?next-auth\.session-token=./.test(c));
