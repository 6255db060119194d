import type { Metadata } from 'next';
import Link from 'next/link';
import { SignInForm } from '@/components/auth/sign-in-form';

export const metadata: Metadata = { title: 'Sign in' };

export default function SignInPage() {
  return (
    <>
      <h1 className="mb-4 text-xl font-semibold text-creek-900">Sign in</h1>
      <SignInForm />
      <p className="mt-4 text-sm text-creek-700">
        New to Runnel? <Link className="font-medium text-creek-600 underline" href="/sign-up">Create an account</Link>
      </p>
    </>
  );
}
