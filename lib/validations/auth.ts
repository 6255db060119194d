import { z } from 'zod';
import { email, nameText, safeText } from './common';

// Long passphrases are welcome; argon2 hashes every byte (bcrypt would drop those past the 72nd).
export const password = safeText('Password', 256).pipe(z.string().min(10, 'Password must be at least 10 characters'));

export const SignUpSchema = z.strictObject({
  name: nameText('Name'),
  email,
  password,
});
export type SignUpInput = z.infer<typeof SignUpSchema>;

export const SignInSchema = z.strictObject({
  email,
  password: safeText('Password', 256).pipe(z.string().min(1, 'Enter your password')),
});
export type SignInInput = z.infer<typeof SignInSchema>;
