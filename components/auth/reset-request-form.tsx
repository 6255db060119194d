'use client';

import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { useForm } from '@/lib/forms/use-form';
import { useRequestPasswordReset } from '@/lib/queries/accounts';
import { PasswordResetRequestSchema } from '@/lib/validations/auth';
import { CheckYourMail } from './check-your-mail';

export function ResetRequestForm() {
  const request = useRequestPasswordReset();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { fields, message, check, fail } = useForm();

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const input = check(PasswordResetRequestSchema, { email: new FormData(event.currentTarget).get('email') });
    if (!input) return;
    try {
      setSentTo((await request.mutateAsync(input.email)).email);
    } catch (error) {
      fail(error, 'The request did not go through. Try again.');
    }
  }

  if (sentTo) return <CheckYourMail email={sentTo} what="choose a new password" />;
  return (
    <form method="post" onSubmit={onSubmit} className="space-y-4" noValidate>
      <FormMessage message={message} />
      <TextField id="email" label="E-mail" type="email" autoComplete="email" errors={fields.email} required />
      <Button type="submit" className="w-full" disabled={request.isPending}>
        {request.isPending ? 'Sending…' : 'Send me a reset link'}
      </Button>
    </form>
  );
}
