import { expect, type Page } from '@playwright/test';

export const DEMO_PASSWORD = 'tarnbeck-demo-2026';

/** Page object for the sign-in screen. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  // Sign-in hashes the password (argon2id): on a loaded machine it can take several seconds.
  await expect(page).toHaveURL(/\/projects$/, { timeout: 20_000 });
}

/** Fails the test on any console error or uncaught page error (a favicon 404 included). */
export function watchConsole(page: Page): string[] {
  const errors: string[] = [];
  page.on('console', (msg) => { if (msg.type() === 'error') errors.push(msg.text()); });
  page.on('pageerror', (err) => errors.push(err.message));
  return errors;
}
