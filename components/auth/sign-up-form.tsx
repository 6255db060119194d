'use client';

import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import type { FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { useFormErrors } from '@/lib/forms/use-form-errors';
import { useSignUp } from '@/lib/queries/accounts';
import { ApiError } from '@/lib/queries/fetch-json';
import { SignUpSchema } from '@/lib/validations/auth';

export function SignUpForm() {
  const router = useRouter();
  const signUp = useSignUp();
  const { fields, message, check, fail } = useFormErrors();

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const input = check(SignUpSchema, { name: form.get('name'), email: form.get('email'), password: form.get('password') });
    if (!input) return;
    try {
      await signUp.mutateAsync(input);
      const result = await signIn('credentials', { email: input.email, password: input.password, redirect: false });
      if (result?.error) throw new Error('signed up, but signing in failed');
      router.push('/projects');
      router.refresh();
    } catch (error) {
      fail(error instanceof ApiError ? error : null, 'Your account was created but we could not sign you in. Try signing in.');
    }
  }

  return (
    <form method="post" onSubmit={onSubmit} className="space-y-4" noValidate>
      <FormMessage message={message} />
      <TextField id="name" label="Your name" autoComplete="name" errors={fields.name} required />
      <TextField id="email" label="E-mail" type="email" autoComplete="email" errors={fields.email} required />
      <TextField id="password" label="Password" type="password" autoComplete="new-password" hint="At least 10 characters; a long passphrase is best." errors={fields.password} required />
      <Button type="submit" className="w-full" disabled={signUp.isPending}>{signUp.isPending ? 'Creating…' : 'Create account'}</Button>
    </form>
  );
}
