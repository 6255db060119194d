export const SIGN_IN_RATE_LIMITED_MESSAGE = 'Too many failed attempts. Wait a few minutes, then try again.';

/** One message whether the e-mail is unknown or the password wrong: never reveal which. */
export function signInFailureMessage(error: string | null | undefined): string {
  if (error === 'rate_limited') return SIGN_IN_RATE_LIMITED_MESSAGE;
  if (error === 'unavailable') return 'Sign-in is not available for a moment. Try again in a few seconds.';
  if (error === 'internal') return 'Something went wrong on our side. Try again.';
  return 'That e-mail and password do not match an account.';
}
