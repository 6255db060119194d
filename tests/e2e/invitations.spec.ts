import { expect, test, type Page } from '@playwright/test';
import { signIn, watchConsole } from './fixtures';
import { countMail, expireInvitation, waitForMail } from './mail';

const INVITE_SUBJECT = /invites you to Kestrel Hollow Farm/;

async function invite(page: Page, email: string, role: string) {
  await page.goto('/team');
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Role', { exact: true }).selectOption({ label: role });
  await page.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByRole('status').filter({ hasText: `Invitation sent to ${email}` })).toBeVisible();
}

test.describe.configure({ mode: 'serial' });

const stamp = Date.now();
const surveyor = `field-surveyor-${stamp}@example.test`;
const password = 'walked the line at first light';

test('an owner invites a surveyor, who joins from the mailed link with that role; the owner is told', async ({
  page,
  browser,
}) => {
  const errors = watchConsole(page);
  await signIn(page, 'owner@example.test');
  await invite(page, surveyor, 'Surveyor');
  await expect(page.getByRole('row').filter({ hasText: surveyor })).toContainText('Surveyor');

  const mail = await waitForMail(surveyor, INVITE_SUBJECT);
  expect(mail.text).toContain('as Surveyor');
  const guest = await browser.newContext();
  const invitee = await guest.newPage();
  const inviteeErrors = watchConsole(invitee);
  await invitee.goto(mail.link);
  await expect(invitee.getByRole('heading', { name: 'Join Kestrel Hollow Farm' })).toBeVisible();
  await expect(invitee.getByLabel('E-mail')).toHaveValue(surveyor);
  await invitee.getByLabel('Your name').fill('Corra Fenwick');
  await invitee.getByLabel('Choose a password').fill(password);
  await invitee.screenshot({ path: 'test-results/invitation-accept.png', fullPage: true });
  await invitee.getByRole('button', { name: 'Create my account and join' }).click();
  await expect(invitee).toHaveURL(/\/team$/);
  await expect(invitee.getByRole('heading', { name: 'Kestrel Hollow Farm' })).toBeVisible();
  await expect(invitee.getByRole('row').filter({ hasText: surveyor })).toContainText('Corra Fenwick(you)');
  await expect(invitee.getByRole('row').filter({ hasText: surveyor })).toContainText('Surveyor');
  // A surveyor does not manage the team: no invitation form.
  await expect(invitee.getByRole('button', { name: 'Send invitation' })).toHaveCount(0);

  // The link works once.
  await invitee.goto(mail.link);
  await expect(invitee.getByRole('alert').filter({ hasText: 'This invitation has already been used.' })).toBeVisible();
  await guest.close();

  await waitForMail('owner@example.test', /Corra Fenwick accepted your invitation/);
  await page.reload();
  await expect(page.getByRole('row').filter({ hasText: surveyor })).toContainText('Surveyor');
  await expect(page.getByText(surveyor)).toHaveCount(1);
  expect(errors).toEqual([]);
  expect(inviteeErrors).toEqual([]);
});

test('a withdrawn invitation and an expired one are refused', async ({ page }) => {
  const errors = watchConsole(page);
  const withdrawn = `withdrawn-${stamp}@example.test`;
  const late = `late-${stamp}@example.test`;
  await signIn(page, 'owner@example.test');
  await invite(page, withdrawn, 'Designer');
  await invite(page, late, 'Viewer (client)');
  await page.getByRole('button', { name: `Withdraw the invitation of ${withdrawn}` }).click();
  await expect(page.getByRole('row').filter({ hasText: withdrawn })).toHaveCount(0);

  const withdrawnMail = await waitForMail(withdrawn, INVITE_SUBJECT);
  const lateMail = await waitForMail(late, INVITE_SUBJECT);
  await expireInvitation(late);

  await page.goto(withdrawnMail.link);
  await expect(
    page.getByRole('alert').filter({ hasText: 'This invitation was withdrawn by the team owner.' }),
  ).toBeVisible();
  await page.goto(lateMail.link);
  await expect(
    page.getByRole('alert').filter({ hasText: 'This invitation has expired. Ask the team owner to invite you again.' }),
  ).toBeVisible();
  await page.goto('/invitations/accept?token=not-a-real-token-at-all-0000');
  await expect(
    page
      .getByRole('alert')
      .filter({ hasText: 'This invitation link is not valid. Check that the whole link was copied.' }),
  ).toBeVisible();
  expect(errors).toEqual([]);
});

test('password reset by mail: the new password works, the old one and other sessions do not', async ({
  page,
  browser,
}) => {
  const errors = watchConsole(page);
  // Another device stays signed in with the old password until the reset.
  const other = await browser.newContext();
  const otherPage = await other.newPage();
  await signIn(otherPage, surveyor, password);

  await page.goto('/sign-in');
  await page.getByRole('link', { name: 'Forgot your password?' }).click();
  // The link moves to another page with its own E-mail field: wait for it, not the sign-in one.
  await expect(page.getByRole('heading', { name: 'Reset your password' })).toBeVisible();
  await page.getByLabel('E-mail').fill(surveyor);
  await page.getByRole('button', { name: 'Send me a reset link' }).click();
  await expect(page.getByRole('status')).toContainText('Check your mail');
  const mail = await waitForMail(surveyor, /Reset your Runnel password/);

  await page.goto(mail.link);
  await page.getByLabel('New password').fill('a fresh passphrase after the thaw');
  await page.getByRole('button', { name: 'Set the new password' }).click();
  await expect(page).toHaveURL(/\/sign-in\?reset=/);
  await expect(page.getByRole('status')).toHaveText('Your password is changed: sign in with the new one.');

  // The reset link works once.
  await page.goto(mail.link);
  await page.getByLabel('New password').fill('trying the link a second time');
  await page.getByRole('button', { name: 'Set the new password' }).click();
  await expect(page.getByRole('alert').filter({ hasText: 'cannot be used' }).first()).toBeVisible();

  await signIn(page, surveyor, 'a fresh passphrase after the thaw');
  await otherPage.goto('/projects');
  await expect(otherPage).toHaveURL(/\/sign-in/);
  await other.close();
  // The refused second use answers 400; nothing else may fail.
  expect(errors.filter((e) => !e.includes('400 (Bad Request)'))).toEqual([]);
});

test('reset answers the same for an address with no account, and no mail goes out', async ({ page }) => {
  const nobody = `nobody-${stamp}@example.test`;
  await page.goto('/reset-password');
  await page.getByLabel('E-mail').fill(nobody);
  await page.getByRole('button', { name: 'Send me a reset link' }).click();
  await expect(page.getByRole('status')).toContainText(`If ${nobody} can receive mail from us`);
  await page.waitForTimeout(1500);
  expect(await countMail(nobody, /./)).toBe(0);
});
