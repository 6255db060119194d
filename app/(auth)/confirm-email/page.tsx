import type { Metadata } from 'next';
import { ConfirmEmailForm } from '@/components/auth/confirm-email-form';
import { MissingLinkToken } from '@/components/auth/missing-link-token';

export const metadata: Metadata = { title: 'Confirm your address' };

export default async function ConfirmEmailPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  if (!token) return <MissingLinkToken />;
  return (
    <>
      <h1 className="mb-2 text-xl font-semibold text-creek-900">Confirm your address</h1>
      <p className="mb-4 text-sm text-creek-700">
        One click and your Runnel account is ready, with a team of your own.
      </p>
      <ConfirmEmailForm token={token} />
    </>
  );
}
