'use client';

import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import type { FieldErrors } from '@/lib/errors';
import { ApiError } from '@/lib/queries/fetch-json';
import { useAddMember } from '@/lib/queries/members';
import { ROLE_LABELS, ROLES } from '@/lib/roles';
import { fieldErrorsOf } from '@/lib/validations/common';
import { AddMemberSchema } from '@/lib/validations/teams';

export function AddMemberForm({ teamId }: { teamId: string }) {
  const add = useAddMember(teamId);
  const [fields, setFields] = useState<FieldErrors>({});
  const [message, setMessage] = useState<string | null>(null);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const formElement = event.currentTarget;
    const form = new FormData(formElement);
    const parsed = AddMemberSchema.safeParse({ email: form.get('email'), role: form.get('role') });
    if (!parsed.success) return setFields(fieldErrorsOf(parsed.error));
    setFields({});
    setMessage(null);
    try {
      await add.mutateAsync(parsed.data);
      formElement.reset();
    } catch (error) {
      if (error instanceof ApiError) setFields(error.fields ?? {});
      setMessage(error instanceof Error ? error.message : 'Not added.');
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
