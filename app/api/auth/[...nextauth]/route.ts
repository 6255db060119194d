import NextAuth from 'next-auth';
import type { NextRequest } from 'next/server';
import { authOptions } from '@/lib/auth/options';

// next-auth's own sign-in, sign-out and session endpoints (its checks are its own).
type Ctx = { params: Promise<{ nextauth: string[] }> };
const handler = (req: NextRequest, ctx: Ctx) => NextAuth(req, ctx, authOptions());

export { handler as GET, handler as POST };
