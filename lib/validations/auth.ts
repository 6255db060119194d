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

/** A token from a mailed link: base64url, 43 characters for 256 bits; anything else is refused as malformed. */
export const linkToken = z
  .string({ error: 'The link token must be text' })
  .regex(/^[A-Za-z0-9_-]{20,100}$/, 'The link is incomplete or altered; open it again from the mail');

export const ConfirmSignUpSchema = z.strictObject({ token: linkToken });
export const PasswordResetRequestSchema = z.strictObject({ email });
export const PasswordResetSchema = z.strictObject({ token: linkToken, password });
export const PasswordChangeSchema = z.strictObject({
  currentPassword: safeText('Current password', 256).pipe(z.string().min(1, 'Enter your current password')),
  newPassword: password,
});
export type PasswordChangeInput = z.infer<typeof PasswordChangeSchema>;

/** Accepting an invitation: signed in (token only) or as a new account (name and password too). */
export const AcceptInvitationSchema = z.strictObject({
  token: linkToken,
  name: nameText('Name').optional(),
  password: password.optional(),
});
export type AcceptInvitationInput = z.infer<typeof AcceptInvitationSchema>;
