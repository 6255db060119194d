'use client';

import type { FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { useFormErrors } from '@/lib/forms/use-form-errors';
import { useAddMember } from '@/lib/queries/members';
import { ROLE_LABELS, ROLES } from '@/lib/roles';
import { AddMemberSchema } from '@/lib/validations/teams';

export function AddMemberForm({ teamId }: { teamId: string }) {
  const add = useAddMember(teamId);
  const { fields, message, check, fail } = useFormErrors();

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const formElement = event.currentTarget;
    const form = new FormData(formElement);
    const input = check(AddMemberSchema, { email: form.get('email'), role: form.get('role') });
    if (!input) return;
    try {
      await add.mutateAsync(input);
      formElement.reset();
    } catch (error) {
      fail(error, 'Not added. Try again.');
    }
  }

  return (
    <form onSubmit={onSubmit} className="grid gap-4 sm:grid-cols-[3fr_2fr_auto] sm:items-end" noValidate>
      <TextField id="email" label="Their Runnel e-mail" type="email" errors={fields.email} required />
      <SelectField id="role" label="Role" defaultValue="viewer" errors={fields.role}>
        {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
      </SelectField>
      <Button type="submit" disabled={add.isPending}>Add member</Button>
      <div className="sm:col-span-3"><FormMessage message={message} /></div>
    </form>
  );
}
