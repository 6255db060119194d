import type { Metadata } from 'next';
import Link from 'next/link';
import { MissingLinkToken } from '@/components/auth/missing-link-token';
import { AcceptInvitation } from '@/components/team/accept-invitation';
import { currentUser } from '@/lib/auth/current';
import { INVITATION_REFUSALS, viewInvitation } from '@/lib/data/invitations';
import { ROLE_LABELS } from '@/lib/roles';
import { linkToken } from '@/lib/validations/auth';

export const metadata: Metadata = { title: 'Join a team' };

export default async function AcceptInvitationPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  if (!token) return <MissingLinkToken />;
  const view = linkToken.safeParse(token).success ? await viewInvitation(token) : null;
  if (!view || view.state !== 'open') {
    return (
      <div className="space-y-3 text-sm text-creek-800">
        <h1 className="text-xl font-semibold text-creek-900">This invitation cannot be used</h1>
        <p role="alert">{INVITATION_REFUSALS[view && view.state !== 'open' ? view.state : 'unknown']}</p>
        <p>
          <Link className="font-medium text-creek-600 underline" href="/sign-in">
            Go to sign-in
          </Link>
        </p>
      </div>
    );
  }
  const user = await currentUser();
  return (
    <>
      <h1 className="mb-2 text-xl font-semibold text-creek-900">Join {view.teamName}</h1>
      <p className="mb-4 text-sm text-creek-700">
        {view.inviterName ?? 'The team owner'} invites <strong>{view.email}</strong> to work on the team&apos;s water
        systems as <strong>{ROLE_LABELS[view.role!]}</strong>.
      </p>
      <AcceptInvitation token={token} email={view.email!} signedInAs={user?.email ?? null} />
    </>
  );
}
