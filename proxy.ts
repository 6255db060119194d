import { withAuth, type NextRequestWithAuth } from 'next-auth/middleware';
import { NextResponse, type NextFetchEvent, type NextRequest } from 'next/server';
import { contentSecurityPolicy, newNonce } from './lib/http/security-headers';

// Areas that need a session: the proxy only redirects there; every page, handler and action checks the session itself.
const SIGNED_IN_AREAS = ['/projects', '/team', '/account'];

function needsSession(path: string): boolean {
  return SIGNED_IN_AREAS.some((area) => path === area || path.startsWith(`${area}/`));
}

/**
 * Every HTML page gets a Content Security Policy with a fresh nonce. Next reads the nonce from the
 * request's policy header and puts it on its own scripts; pages render per request (the root
 * layout reads headers), so no cached page carries a stale nonce.
 */
function withPolicy(req: NextRequest): NextResponse {
  const nonce = newNonce();
  const policy = contentSecurityPolicy(nonce, { development: process.env.NODE_ENV === 'development' });
  const headers = new Headers(req.headers);
  headers.set('x-nonce', nonce);
  headers.set('content-security-policy', policy);
  const res = NextResponse.next({ request: { headers } });
  res.headers.set('Content-Security-Policy', policy);
  return res;
}

const redirectAnonymous = withAuth({ pages: { signIn: '/sign-in' } });

export default async function proxy(req: NextRequest, event: NextFetchEvent): Promise<Response> {
  if (needsSession(req.nextUrl.pathname)) {
    const redirect = await redirectAnonymous(req as NextRequestWithAuth, event);
    if (redirect) return redirect;
  }
  return withPolicy(req);
}

export const config = {
  matcher: [
    {
      source: '/((?!api/|_next/static|_next/image|icon.svg|favicon.ico).*)',
      missing: [
        { type: 'header', key: 'next-router-prefetch' },
        { type: 'header', key: 'purpose', value: 'prefetch' },
      ],
    },
  ],
};
