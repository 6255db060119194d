import type { Metadata } from 'next';
import { MissingLinkToken } from '@/components/auth/missing-link-token';
import { ResetPasswordForm } from '@/components/auth/reset-password-form';

export const metadata: Metadata = { title: 'Choose a new password' };

export default async function ChoosePasswordPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  if (!token) return <MissingLinkToken />;
  return (
    <>
      <h1 className="mb-4 text-xl font-semibold text-creek-900">Choose a new password</h1>
      <ResetPasswordForm token={token} />
    </>
  );
}
