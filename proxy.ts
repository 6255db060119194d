import { withAuth } from 'next-auth/middleware';

// A convenience redirect to sign-in only; every page, handler and action checks the session itself.
export default withAuth({ pages: { signIn: '/sign-in' } });

export const config = { matcher: ['/projects/:path*', '/team/:path*', '/account/:path*'] };
