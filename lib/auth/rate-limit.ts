import { env } from '../env';

/**
 * Failed sign-ins counted per key (e-mail, IP) in a sliding window held in this server process.
 * Checked before any hashing so a flood of guesses costs the server nothing. One process serves
 * Runnel; a multi-process deployment would move this to the database.
 */
const failures = new Map<string, number[]>();

function recent(key: string, now: number): number[] {
  const windowMs = env().RUNNEL_SIGNIN_WINDOW_SECONDS * 1000;
  const kept = (failures.get(key) ?? []).filter((t) => now - t < windowMs);
  if (kept.length > 0) failures.set(key, kept);
  else failures.delete(key);
  return kept;
}

export function signInBlocked(emailAddress: string, ip: string, now = Date.now()): boolean {
  const e = env();
  return (
    recent(`email:${emailAddress}`, now).length >= e.RUNNEL_SIGNIN_MAX_FAILURES_PER_EMAIL ||
    recent(`ip:${ip}`, now).length >= e.RUNNEL_SIGNIN_MAX_FAILURES_PER_IP
  );
}

export function recordSignInFailure(emailAddress: string, ip: string, now = Date.now()): void {
  for (const key of [`email:${emailAddress}`, `ip:${ip}`]) failures.set(key, [...recent(key, now), now]);
}

export function clearSignInFailures(emailAddress: string): void {
  failures.delete(`email:${emailAddress}`);
}

/** For tests: forget every counted failure. */
export function resetSignInLimits(): void {
  failures.clear();
}
