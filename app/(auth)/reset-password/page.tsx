import type { Metadata } from 'next';
import Link from 'next/link';
import { ResetRequestForm } from '@/components/auth/reset-request-form';

export const metadata: Metadata = { title: 'Reset your password' };

export default function ResetPasswordPage() {
  return (
    <>
      <h1 className="mb-2 text-xl font-semibold text-creek-900">Reset your password</h1>
      <p className="mb-4 text-sm text-creek-700">
        We mail a link to choose a new one. Every device signed in to the account is signed out when you do.
      </p>
      <ResetRequestForm />
      <p className="mt-4 text-sm text-creek-700">
        <Link className="font-medium text-creek-600 underline" href="/sign-in">
          Back to sign-in
        </Link>
      </p>
    </>
  );
}
