'use client';

import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { useForm } from '@/lib/forms/use-form';
import { useChangePassword } from '@/lib/queries/accounts';
import { PasswordChangeSchema } from '@/lib/validations/auth';

/** A change signs out every device; this one signs straight back in with the new password. */
export function PasswordChangeForm({ email }: { email: string }) {
  const router = useRouter();
  const change = useChangePassword();
  const [done, setDone] = useState<string | null>(null);
  const { fields, message, check, fail } = useForm();

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const formElement = event.currentTarget;
    const form = new FormData(formElement);
    setDone(null);
    const input = check(PasswordChangeSchema, {
      currentPassword: form.get('currentPassword'),
      newPassword: form.get('newPassword'),
    });
    if (!input) return;
    try {
      await change.mutateAsync(input);
      const result = await signIn('credentials', { email, password: input.newPassword, redirect: false });
      if (!result?.ok || result.error) {
        router.push('/sign-in');
        return;
      }
      formElement.reset();
      setDone('Password changed. Every other device is signed out.');
      router.refresh();
    } catch (error) {
      fail(error, 'The password was not changed. Try again.');
    }
  }

  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate>
      <FormMessage message={message} />
      <FormMessage tone="ok" message={done} />
      <TextField
        id="currentPassword"
        label="Current password"
        type="password"
        autoComplete="current-password"
        errors={fields.currentPassword}
        required
      />
      <TextField
        id="newPassword"
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters; a long passphrase is best."
        errors={fields.newPassword}
        required
      />
      <Button type="submit" disabled={change.isPending}>
        {change.isPending ? 'Saving…' : 'Change password'}
      </Button>
    </form>
  );
}
