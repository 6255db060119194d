'use client';

import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { useForm } from '@/lib/forms/use-form';
import { useSignUp } from '@/lib/queries/accounts';
import { SignUpSchema } from '@/lib/validations/auth';
import { CheckYourMail } from './check-your-mail';

/** Sign-up asks for the address to be confirmed by mail before the account exists. */
export function SignUpForm() {
  const signUp = useSignUp();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { fields, message, check, fail } = useForm();

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const input = check(SignUpSchema, {
      name: form.get('name'),
      email: form.get('email'),
      password: form.get('password'),
    });
    if (!input) return;
    try {
      const answer = await signUp.mutateAsync(input);
      setSentTo(answer.email);
    } catch (error) {
      fail(error, 'Your account could not be started. Try again.');
    }
  }

  if (sentTo) return <CheckYourMail email={sentTo} what="confirm your address and finish creating your account" />;

  return (
    <form method="post" onSubmit={onSubmit} className="space-y-4" noValidate>
      <FormMessage message={message} />
      <TextField id="name" label="Your name" autoComplete="name" errors={fields.name} required />
      <TextField id="email" label="E-mail" type="email" autoComplete="email" errors={fields.email} required />
      <TextField
        id="password"
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters; a long passphrase is best."
        errors={fields.password}
        required
      />
      <Button type="submit" className="w-full" disabled={signUp.isPending}>
        {signUp.isPending ? 'Creating…' : 'Create account'}
      </Button>
    </form>
  );
}
