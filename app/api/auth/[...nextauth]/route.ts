import NextAuth from 'next-auth';
import type { NextRequest } from 'next/server';
import { authOptions } from '@/lib/auth/options';
import { credentialsSignIn } from '@/lib/auth/sign-in-route';

// next-auth's own sign-in, sign-out and session endpoints; the credentials sign-in goes through
// the throttle first (lib/auth/sign-in-route.ts).
type Ctx = { params: Promise<{ nextauth: string[] }> };

export async function GET(req: NextRequest, ctx: Ctx) {
  return NextAuth(req, ctx, authOptions());
}

export async function POST(req: NextRequest, ctx: Ctx) {
  const { nextauth } = await ctx.params;
  if (nextauth[0] === 'callback' && nextauth[1] === 'credentials') return credentialsSignIn(req, ctx);
  return NextAuth(req, ctx, authOptions());
}
