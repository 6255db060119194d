'use client';

import { signIn, signOut } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import type { FormEvent } from 'react';
import { selectTeam } from '@/app/actions/select-team';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { useForm } from '@/lib/forms/use-form';
import { useAcceptInvitation } from '@/lib/queries/invitations';
import { AcceptInvitationSchema } from '@/lib/validations/auth';

interface Props {
  token: string;
  email: string;
  /** Who is signed in in this browser, if anyone. */
  signedInAs: string | null;
}

/** Accepting as the signed-in account, or as a new account for the invited address. */
export function AcceptInvitation({ token, email, signedInAs }: Props) {
  const router = useRouter();
  const accept = useAcceptInvitation();
  const { fields, message, check, fail, setMessage } = useForm();

  async function land(teamId: string) {
    await selectTeam({ teamId });
    router.push('/team');
    router.refresh();
  }

  async function joinSignedIn() {
    try {
      const { joined } = await accept.mutateAsync({ token });
      await land(joined.teamId);
    } catch (error) {
      fail(error, 'You did not join. Try again.');
    }
  }

  async function joinAsNewAccount(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const input = check(AcceptInvitationSchema, { token, name: form.get('name'), password: form.get('password') });
    if (!input) return;
    try {
      const { joined } = await accept.mutateAsync(input);
      const result = await signIn('credentials', { email: joined.email, password: input.password, redirect: false });
      if (!result?.ok || result.error) {
        setMessage('You joined the team. Sign in with your new password to start.');
        return;
      }
      await land(joined.teamId);
    } catch (error) {
      fail(error, 'You did not join. Try again.');
    }
  }

  if (signedInAs && signedInAs !== email) {
    return (
      <div className="space-y-3 text-sm text-creek-800">
        <p role="alert">
          You are signed in as <strong>{signedInAs}</strong>, but this invitation is for <strong>{email}</strong>.
        </p>
        <Button
          tone="quiet"
          onClick={() => signOut({ callbackUrl: `/invitations/accept?token=${encodeURIComponent(token)}` })}
        >
          Sign out and continue
        </Button>
      </div>
    );
  }

  if (signedInAs) {
    return (
      <div className="space-y-4">
        <FormMessage message={message} />
        <Button className="w-full" onClick={joinSignedIn} disabled={accept.isPending}>
          {accept.isPending ? 'Joining…' : 'Join the team'}
        </Button>
      </div>
    );
  }

  const signInHref = `/sign-in?callbackUrl=${encodeURIComponent(`/invitations/accept?token=${token}`)}`;
  return (
    <div className="space-y-4">
      <form method="post" onSubmit={joinAsNewAccount} className="space-y-4" noValidate>
        <FormMessage message={message} />
        <TextField id="invited-email" label="E-mail" type="email" value={email} readOnly />
        <TextField id="name" label="Your name" autoComplete="name" errors={fields.name} required />
        <TextField
          id="password"
          label="Choose a password"
          type="password"
          autoComplete="new-password"
          hint="At least 10 characters; a long passphrase is best."
          errors={fields.password}
          required
        />
        <Button type="submit" className="w-full" disabled={accept.isPending}>
          {accept.isPending ? 'Joining…' : 'Create my account and join'}
        </Button>
      </form>
      <p className="text-sm text-creek-700">
        Already have a Runnel account with this address?{' '}
        <a className="font-medium text-creek-600 underline" href={signInHref}>
          Sign in
        </a>
        , then join.
      </p>
    </div>
  );
}
