import { expect, test } from '@playwright/test';
import { signIn, watchConsole } from './fixtures';

const SPRING_LINE = 'Kestrel Hollow spring line';

test('a viewer sees no edit controls, and a direct edit request is refused', async ({ page }) => {
  const errors = watchConsole(page);
  await signIn(page, 'viewer@example.test');
  await expect(page.getByRole('heading', { name: 'Start a project' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Create project' })).toHaveCount(0);

  await page.getByRole('link', { name: SPRING_LINE }).click();
  await expect(page.getByRole('heading', { name: SPRING_LINE })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Save details' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: /Archive project|Delete project/ })).toHaveCount(0);
  await expect(page.getByRole('textbox')).toHaveCount(0);

  const projectId = page.url().split('/').pop()!;
  const res = await page.request.patch(`/api/projects/${projectId}`, { data: { name: 'Taken over' } });
  expect(res.status()).toBe(403);
  expect((await res.json()).error.code).toBe('forbidden');

  const del = await page.request.delete(`/api/projects/${projectId}`);
  expect(del.status()).toBe(403);
  await page.reload();
  await expect(page.getByRole('heading', { name: SPRING_LINE })).toBeVisible();
  expect(errors).toEqual([]);
});

test('a designer edits project details and sees them saved', async ({ page }) => {
  await signIn(page, 'designer@example.test');
  await page.getByRole('link', { name: 'Brackwater Creek ram and hilltop tank' }).click();
  const notes = page.getByLabel('Site notes');
  await notes.fill('Weir pool checked after the October rain.');
  await page.getByRole('button', { name: 'Save details' }).click();
  await expect(page.getByRole('status')).toHaveText('Saved.');
  await page.reload();
  // A label finds hidden elements too, and the page streams in with a hidden copy for a moment: read the shown box.
  await expect(page.getByLabel('Site notes').filter({ visible: true })).toHaveValue(
    'Weir pool checked after the October rain.',
  );
});

test('the owner manages members and cannot demote the last owner', async ({ page }) => {
  await signIn(page, 'owner@example.test');
  await page.getByRole('link', { name: 'Team' }).click();
  await expect(page.getByRole('cell', { name: 'reviewer@example.test' })).toBeVisible();
  await page.getByLabel('Role of Maren Holloway').selectOption('designer');
  await expect(page.getByRole('alert').filter({ hasText: 'at least one owner' })).toBeVisible();
  await expect(page.getByLabel('Role of Maren Holloway')).toHaveValue('owner');
});

test('signing out ends the session token, even if someone kept a copy of it', async ({ page, playwright, baseURL }) => {
  await signIn(page, 'reviewer@example.test');
  const token = (await page.context().cookies()).find((c) => c.name === 'next-auth.session-token');
  expect(token).toBeDefined();
  const copy = await playwright.request.newContext({
    baseURL,
    extraHTTPHeaders: { cookie: `next-auth.session-token=${token!.value}` },
  });
  expect((await copy.get('/api/teams')).status()).toBe(200);

  await page.getByRole('button', { name: 'Account menu' }).click();
  await page.getByRole('button', { name: 'Sign out', exact: true }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  expect((await copy.get('/api/teams')).status()).toBe(401);
  await copy.dispose();
});
