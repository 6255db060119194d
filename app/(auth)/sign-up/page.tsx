import type { Metadata } from 'next';
import Link from 'next/link';
import { SignUpForm } from '@/components/auth/sign-up-form';

export const metadata: Metadata = { title: 'Create an account' };

export default function SignUpPage() {
  return (
    <>
      <h1 className="mb-4 text-xl font-semibold text-creek-900">Create an account</h1>
      <SignUpForm />
      <p className="mt-4 text-sm text-creek-700">
        Already have one?{' '}
        <Link className="font-medium text-creek-600 underline" href="/sign-in">
          Sign in
        </Link>
      </p>
    </>
  );
}
