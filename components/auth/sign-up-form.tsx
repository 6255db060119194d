'use client';

import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import type { FieldErrors } from '@/lib/errors';
import { useSignUp } from '@/lib/queries/accounts';
import { ApiError } from '@/lib/queries/fetch-json';
import { fieldErrorsOf } from '@/lib/validations/common';
import { SignUpSchema } from '@/lib/validations/auth';

export function SignUpForm() {
  const router = useRouter();
  const signUp = useSignUp();
  const [fields, setFields] = useState<FieldErrors>({});
  const [message, setMessage] = useState<string | null>(null);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const parsed = SignUpSchema.safeParse({ name: form.get('name'), email: form.get('email'), password: form.get('password') });
    if (!parsed.success) {
      setFields(fieldErrorsOf(parsed.error));
      return;
    }
    setFields({});
    setMessage(null);
    try {
      await signUp.mutateAsync(parsed.data);
      const result = await signIn('credentials', { email: parsed.data.email, password: parsed.data.password, redirect: false });
      if (result?.error) throw new Error('signed up, but signing in failed');
      router.push('/projects');
      router.refresh();
    } catch (error) {
      if (error instanceof ApiError) {
        setFields(error.fields ?? {});
        setMessage(error.message);
      } else {
        setMessage('Your account was created but we could not sign you in. Try signing in.');
      }
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
