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
  page.on('console', (msg) => {
    if (msg.type() === 'error') errors.push(msg.text());
  });
  page.on('pageerror', (err) => errors.push(err.message));
  return errors;
}

/**
 * Starts a network run with its button and waits until that run (not an earlier one whose result
 * is still on screen) has ended and the page shows its result: the run buttons come back when the
 * page has fetched the network again after the run. Returns the run's final status.
 */
export async function runNetworkAndWait(page: Page, button: string, timeout = 120_000): Promise<string> {
  const main = page.locator('main').filter({ visible: true });
  // Both listeners go up before the click: a quick run can end on the page's first poll.
  const started = page.waitForResponse(
    (r) => new URL(r.url()).pathname.endsWith('/network/runs') && r.request().method() === 'POST',
  );
  const ended = page.waitForResponse(
    async (r) => {
      if (!/\/network\/runs\/[^/]+$/.test(new URL(r.url()).pathname) || r.request().method() !== 'GET') return false;
      const body = (await r.json().catch(() => null)) as { run?: { status: string } } | null;
      return body?.run?.status === 'done' || body?.run?.status === 'failed';
    },
    { timeout },
  );
  await main.getByRole('button', { name: button }).click();
  const response = await started;
  expect(response.status()).toBe(202);
  const { run } = (await response.json()) as { run: { id: string } };
  const last = await ended;
  // The page polls only the run it started, so the run that ended is this one.
  expect(new URL(last.url()).pathname.endsWith(`/network/runs/${run.id}`)).toBe(true);
  await expect(main.getByRole('button', { name: button })).toBeEnabled();
  return ((await last.json()) as { run: { status: string } }).run.status;
}
