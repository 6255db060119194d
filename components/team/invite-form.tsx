'use client';

import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { useForm } from '@/lib/forms/use-form';
import { useInvite } from '@/lib/queries/invitations';
import { ROLE_LABELS, ROLES } from '@/lib/roles';
import { InviteMemberSchema } from '@/lib/validations/teams';

export function InviteForm({ teamId }: { teamId: string }) {
  const invite = useInvite(teamId);
  const [sent, setSent] = useState<string | null>(null);
  const { fields, message, check, fail } = useForm();

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const formElement = event.currentTarget;
    const form = new FormData(formElement);
    setSent(null);
    const input = check(InviteMemberSchema, { email: form.get('email'), role: form.get('role') });
    if (!input) return;
    try {
      const { invitation } = await invite.mutateAsync(input);
      setSent(`Invitation sent to ${invitation.email} as ${ROLE_LABELS[invitation.role]}. The link works for 7 days.`);
      formElement.reset();
    } catch (error) {
      fail(error, 'The invitation was not sent. Try again.');
    }
  }

  return (
    <form onSubmit={onSubmit} className="grid gap-4 sm:grid-cols-[3fr_2fr_auto] sm:items-end" noValidate>
      <TextField id="email" label="E-mail address" type="email" errors={fields.email} required />
      <SelectField id="role" label="Role" defaultValue="viewer" errors={fields.role}>
        {ROLES.map((r) => (
          <option key={r} value={r}>
            {ROLE_LABELS[r]}
          </option>
        ))}
      </SelectField>
      <Button type="submit" disabled={invite.isPending}>
        {invite.isPending ? 'Sending…' : 'Send invitation'}
      </Button>
      <div className="sm:col-span-3">
        <FormMessage message={message} />
        <FormMessage tone="ok" message={sent} />
      </div>
    </form>
  );
}
