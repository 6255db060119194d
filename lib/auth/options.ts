import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { models } from '../../models';
import { env } from '../env';
import { SignInSchema } from '../validations/auth';
import { verifyPassword } from './password';
import { clearSignInFailures, recordSignInFailure, signInBlocked } from './rate-limit';
import { bumpSessionVersion } from './users';

export const SIGN_IN_RATE_LIMITED = 'rate_limited';

function clientIp(headers: Record<string, unknown> | undefined): string {
  const forwarded = headers?.['x-forwarded-for'];
  if (typeof forwarded === 'string' && forwarded.length > 0) return forwarded.split(',')[0]!.trim();
  const real = headers?.['x-real-ip'];
  return typeof real === 'string' && real.length > 0 ? real : 'local';
}

export function authOptions(): NextAuthOptions {
  return {
    secret: env().NEXTAUTH_SECRET,
    session: { strategy: 'jwt', maxAge: 30 * 24 * 60 * 60 },
    pages: { signIn: '/sign-in' },
    providers: [
      CredentialsProvider({
        name: 'E-mail and password',
        credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
        async authorize(credentials, req) {
          const parsed = SignInSchema.safeParse({ email: credentials?.email, password: credentials?.password });
          if (!parsed.success) return null;
          const { email, password } = parsed.data;
          const ip = clientIp(req?.headers as Record<string, unknown> | undefined);
          if (signInBlocked(email, ip)) throw new Error(SIGN_IN_RATE_LIMITED);

          const user = await models().User.findOne({ where: { email } });
          const ok = await verifyPassword(user?.passwordHash ?? null, password);
          // An address never confirmed cannot sign in (accounts are made verified; this guards old rows).
          if (!user || !ok || !user.emailVerifiedAt) {
            recordSignInFailure(email, ip);
            return null;
          }
          clearSignInFailures(email);
          return { id: user.id, email: user.email, name: user.name, sessionVersion: user.sessionVersion };
        },
      }),
    ],
    callbacks: {
      async jwt({ token, user }) {
        if (user) token.sv = (user as { sessionVersion?: number }).sessionVersion ?? 0;
        return token;
      },
      async session({ session, token }) {
        if (session.user && token.sub) (session.user as { id?: string }).id = token.sub;
        return session;
      },
    },
    events: {
      async signOut({ token }) {
        if (token?.sub) await bumpSessionVersion(token.sub);
      },
    },
  };
}
