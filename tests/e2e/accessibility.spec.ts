import { expect, test, type Page } from '@playwright/test';
import { seriousFindings } from './axe';
import { signIn } from './fixtures';

const PROJECT = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001';
const DEMO_LINE = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4001';

async function firstLinkTo(page: Page, pattern: RegExp): Promise<string> {
  const hrefs = await page
    .locator('a[href]')
    .evaluateAll((links) => links.map((link) => link.getAttribute('href') ?? ''));
  const href = hrefs.find((candidate) => pattern.test(candidate));
  expect(href, `a link matching ${pattern}`).toBeTruthy();
  return href as string;
}

const SIGNED_OUT_PAGES = ['/sign-in', '/sign-up', '/reset-password'];

for (const path of SIGNED_OUT_PAGES) {
  test(`no serious accessibility findings on ${path}`, async ({ page }) => {
    await page.goto(path);
    await expect(page.locator('main')).toBeVisible();
    // Checked as a person meets the form: once its script runs and the submit button takes its working colour.
    await expect(page.locator('main button[type=submit]').first()).toBeEnabled();
    expect(await seriousFindings(page)).toEqual([]);
  });
}

test('no serious accessibility findings on any page an owner reaches, and a skip link leads to the content', async ({
  page,
}) => {
  test.setTimeout(240_000);
  await signIn(page, 'owner@example.test');

  await page.goto(`/projects/${PROJECT}/routes`);
  const routePage = await firstLinkTo(page, new RegExp(`/projects/${PROJECT}/routes/[0-9a-f-]{36}$`));
  await page.goto(`/projects/${PROJECT}/reviews`);
  const revisionLinks = await page
    .locator('a[href]')
    .evaluateAll((links) => links.map((link) => link.getAttribute('href') ?? ''));
  const revisionPage = revisionLinks.find((href) =>
    new RegExp(`/projects/${PROJECT}/reviews/[0-9a-f-]{36}$`).test(href),
  );

  const pages = [
    '/projects',
    `/projects/${PROJECT}`,
    `/projects/${PROJECT}/routes`,
    routePage,
    `/projects/${PROJECT}/routes/import`,
    `/projects/${PROJECT}/lines`,
    `/projects/${PROJECT}/lines/${DEMO_LINE}`,
    `/projects/${PROJECT}/lift`,
    `/projects/${PROJECT}/network`,
    `/projects/${PROJECT}/reviews`,
    ...(revisionPage ? [revisionPage] : []),
    `/projects/${PROJECT}/activity`,
    '/team',
    '/team/prices',
    // The village network: its day view and sizes (when run) are on the page too.
    '/projects/6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2003/network',
    '/account',
  ];
  const findings: Record<string, string[]> = {};
  for (const path of pages) {
    await page.goto(path);
    await expect(page.locator('main').filter({ visible: true }).first()).toBeVisible();
    // Let self-fetching widgets settle so the check sees the page as a person does.
    await page.waitForLoadState('networkidle');
    const found = await seriousFindings(page);
    if (found.length > 0) findings[path] = found;
  }
  expect(findings).toEqual({});

  // The first Tab stop skips the navigation and lands on the page's content.
  await page.goto(`/projects/${PROJECT}/lines/${DEMO_LINE}`);
  await page.keyboard.press('Tab');
  const skip = page.getByRole('link', { name: 'Skip to content' });
  await expect(skip).toBeFocused();
  await skip.press('Enter');
  await expect(page.locator('#content')).toBeFocused();
});
