'use client';

import { useRouter } from 'next/navigation';
import type { FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { useForm } from '@/lib/forms/use-form';
import { useResetPassword } from '@/lib/queries/accounts';
import { PasswordResetSchema } from '@/lib/validations/auth';

export function ResetPasswordForm({ token }: { token: string }) {
  const router = useRouter();
  const reset = useResetPassword();
  const { fields, message, check, fail } = useForm();

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const input = check(PasswordResetSchema, { token, password: new FormData(event.currentTarget).get('password') });
    if (!input) return;
    try {
      const { reset: done } = await reset.mutateAsync(input);
      router.push(`/sign-in?reset=${encodeURIComponent(done.email)}`);
    } catch (error) {
      fail(error, 'The password was not changed. Try again.');
    }
  }

  return (
    <form method="post" onSubmit={onSubmit} className="space-y-4" noValidate>
      <FormMessage message={message ?? fields.token?.[0]} />
      <TextField
        id="password"
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters; a long passphrase is best."
        errors={fields.password}
        required
      />
      <Button type="submit" className="w-full" disabled={reset.isPending}>
        {reset.isPending ? 'Saving…' : 'Set the new password'}
      </Button>
    </form>
  );
}
