import { createHash, randomBytes } from 'node:crypto';

/** A link token: 256 random bits for the mail, and its SHA-256 for the database (never the token). */
export function newLinkToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashLinkToken(token) };
}

export function hashLinkToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

export const HOUR_MS = 60 * 60 * 1000;
/** How long each kind of link works. Common practice, no source: short for resets, longer for invitations. */
export const LINK_LIFETIME_MS = {
  'sign-up': 24 * HOUR_MS,
  'password-reset': 1 * HOUR_MS,
  invitation: 7 * 24 * HOUR_MS,
} as const;
