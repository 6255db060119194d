import { expect, test } from '@playwright/test';
import { signIn, watchConsole } from './fixtures';
import { waitForMail } from './mail';

test('a newcomer signs up, confirms the address from the mail, signs in, creates a project and finds it in the table', async ({
  page,
}) => {
  const errors = watchConsole(page);
  const email = `newcomer-${Date.now()}@example.test`;
  const password = 'a long passphrase for the spring';

  await page.goto('/projects');
  await expect(page).toHaveURL(/\/sign-in/);

  await page.getByRole('link', { name: 'Create an account' }).click();
  await page.getByLabel('Your name').fill('Wren Alder');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Create account' }).click();
  await expect(page.getByRole('status')).toContainText('Check your mail');

  // The account exists only once the address is confirmed from the mailed link.
  const mail = await waitForMail(email, /Confirm your e-mail address/);
  await page.goto(mail.link);
  await page.getByRole('button', { name: 'Confirm my address' }).click();
  await expect(page).toHaveURL(/\/sign-in\?confirmed=/);
  await expect(page.getByRole('status')).toHaveText('Your address is confirmed and your account is ready: sign in.');

  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('not the passphrase');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('alert').filter({ hasText: 'do not match' })).toHaveText(
    'That e-mail and password do not match an account.',
  );

  await signIn(page, email, password);
  await expect(page.getByText("Water systems of Wren Alder's team.")).toBeVisible();
  await page.getByLabel('Name').fill('Lower meadow trough line');
  await page.getByLabel('Description').fill('Spring box to the meadow trough');
  await page.getByRole('button', { name: 'Create project' }).click();
  await expect(page.getByRole('heading', { name: 'Lower meadow trough line' })).toBeVisible();

  await page.getByRole('link', { name: 'Projects' }).click();
  // While the page streams in, a hidden copy of the table can sit beside the shown one: act on what is on screen.
  const table = page.getByRole('table').filter({ visible: true });
  const search = page.getByLabel('Search projects').filter({ visible: true });
  await expect(table.getByRole('link', { name: 'Lower meadow trough line' })).toBeVisible();
  await search.fill('nothing like it');
  await expect(table.getByText(/No project matches/)).toBeVisible();
  // The search lives in the address: a reload (or a shared link) shows the same rows.
  await expect(page).toHaveURL(/[?&]q=nothing\+like\+it/);
  await page.reload();
  await expect(search).toHaveValue('nothing like it');
  await expect(table.getByText(/No project matches/)).toBeVisible();
  await search.fill('');
  await page.getByRole('button', { name: 'Project', exact: true }).click();
  await expect(page).toHaveURL(/[?&]sort=name(&|$)/);
  await expect(page.getByRole('columnheader', { name: /Project/ })).toHaveAttribute('aria-sort', 'ascending');
  // The one deliberate wrong password above is answered 401 by the sign-in endpoint; nothing else may fail.
  expect(errors.filter((e) => !e.includes('401 (Unauthorized)'))).toEqual([]);
  expect(errors.filter((e) => e.includes('401 (Unauthorized)'))).toHaveLength(1);
});

test('an empty project name is refused beside the field', async ({ page }) => {
  await signIn(page, 'designer@example.test');
  await page.getByRole('button', { name: 'Create project' }).click();
  const name = page.getByLabel('Name');
  await expect(name).toHaveAttribute('aria-invalid', 'true');
  await expect(page.locator('#name-error')).toHaveText('Project name is required');
});
