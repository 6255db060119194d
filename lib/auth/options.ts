import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { models } from '../../models';
import { isDatabaseUnavailable } from '../db-availability';
import { env } from '../env';
import { log } from '../log';
import { SignInSchema } from '../validations/auth';
import { verifyPassword } from './password';
import { bumpSessionVersion } from './users';

/** The sign-in error code while the database cannot be reached. */
export const SIGN_IN_UNAVAILABLE = 'unavailable';

export function authOptions(): NextAuthOptions {
  return {
    secret: env().NEXTAUTH_SECRET,
    session: { strategy: 'jwt', maxAge: 30 * 24 * 60 * 60 },
    pages: { signIn: '/sign-in' },
    providers: [
      CredentialsProvider({
        name: 'E-mail and password',
        credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
        // Attempts are counted before this runs (lib/auth/sign-in-route.ts). An unknown e-mail is
        // checked against a decoy hash, so both refusals take the same time and look the same.
        async authorize(credentials) {
          const parsed = SignInSchema.safeParse({ email: credentials?.email, password: credentials?.password });
          if (!parsed.success) return null;
          const { email, password } = parsed.data;
          let user;
          let ok;
          try {
            user = await models().User.findOne({ where: { email } });
            ok = await verifyPassword(user?.passwordHash ?? null, password);
          } catch (error) {
            // next-auth puts a thrown message in the sign-in URL: give it a code, never the driver's text.
            const unavailable = isDatabaseUnavailable(error);
            log()[unavailable ? 'warn' : 'error']({ err: error }, 'sign-in could not check the password');
            throw new Error(unavailable ? SIGN_IN_UNAVAILABLE : 'internal');
          }
          // An address never confirmed cannot sign in (accounts are made verified; this guards older rows).
          if (!user || !ok || !user.emailVerifiedAt) return null;
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
