import type { Metadata } from 'next';
import Link from 'next/link';
import { SignInForm } from '@/components/auth/sign-in-form';
import { FormMessage } from '@/components/ui/form-message';

export const metadata: Metadata = { title: 'Sign in' };

type Search = { confirmed?: string; reset?: string; callbackUrl?: string };

/** Only a path inside Runnel may be the place to return to (never another site). */
const safeReturn = (url?: string) => (url && url.startsWith('/') && !url.startsWith('//') ? url : undefined);

export default async function SignInPage({ searchParams }: { searchParams: Promise<Search> }) {
  const { confirmed, reset, callbackUrl } = await searchParams;
  const notice = confirmed
    ? 'Your address is confirmed and your account is ready: sign in.'
    : reset
      ? 'Your password is changed: sign in with the new one.'
      : null;
  return (
    <>
      <h1 className="mb-4 text-xl font-semibold text-creek-900">Sign in</h1>
      <div className="mb-4">
        <FormMessage tone="ok" message={notice} />
      </div>
      <SignInForm email={confirmed ?? reset} returnTo={safeReturn(callbackUrl)} />
      <p className="mt-4 text-sm text-creek-700">
        <Link className="font-medium text-creek-600 underline" href="/reset-password">
          Forgot your password?
        </Link>
      </p>
      <p className="mt-2 text-sm text-creek-700">
        New to Runnel?{' '}
        <Link className="font-medium text-creek-600 underline" href="/sign-up">
          Create an account
        </Link>
      </p>
    </>
  );
}
