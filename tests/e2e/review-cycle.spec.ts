import fs from 'node:fs';
import { expect, test, type Browser, type Page } from '@playwright/test';
import { PDFParse } from 'pdf-parse';
import { signIn, watchConsole } from './fixtures';

const PROJECT = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001';
const REVIEWS = `/projects/${PROJECT}/reviews`;

async function as(
  browser: Browser,
  email: string,
): Promise<{ page: Page; errors: string[]; close: () => Promise<void> }> {
  const context = await browser.newContext();
  const page = await context.newPage();
  const errors = watchConsole(page);
  await signIn(page, email);
  return { page, errors, close: () => context.close() };
}

/** Makes a revision of the working copy and submits it; returns its page address. */
async function makeRevision(page: Page, note: string): Promise<string> {
  await page.goto(REVIEWS);
  await page.getByLabel('What changed (note for the reviewer)').filter({ visible: true }).fill(note);
  await page.getByRole('button', { name: 'Make a revision' }).click();
  await expect(
    page.getByRole('status').filter({ hasText: /Revision \d+ made and submitted for review/ }),
  ).toBeVisible();
  const row = page.getByTestId('revision-row').filter({ visible: true }).filter({ hasText: note });
  await row.getByRole('link').click();
  await expect(page.getByRole('heading', { name: /^Revision \d+/ })).toBeVisible();
  return new URL(page.url()).pathname;
}

test('a designer submits, a reviewer pins a comment and sends it back, the designer answers and resubmits, the reviewer approves; the client sees only that', async ({
  browser,
}) => {
  test.setTimeout(150_000);
  const today = new Date().toISOString().slice(0, 10);
  // Unique notes, so a second run on the same database finds its own revisions.
  const run = Date.now().toString(36);
  const firstNote = `First layout for review ${run}`;
  const secondNote = `Answered the review: PN 16 in the sag ${run}`;

  // The designer freezes the working copy and submits it.
  const designer = await as(browser, 'designer@example.test');
  const first = await makeRevision(designer.page, firstNote);
  await expect(designer.page.getByTestId('revision-status').filter({ visible: true })).toHaveAttribute(
    'data-status',
    'submitted',
  );
  await expect(designer.page.getByRole('button', { name: 'Approve' })).toHaveCount(0);

  // The reviewer pins a comment at a chainage on the long profile and requests changes.
  const reviewer = await as(browser, 'reviewer@example.test');
  await reviewer.page.goto(first);
  // The router can keep an earlier state of the page mounted but hidden: act on the copy people see.
  const capture = reviewer.page.getByTestId('profile-capture').filter({ visible: true });
  await expect(capture).toHaveCount(1);
  const box = (await capture.boundingBox())!;
  await capture.click({ position: { x: box.width * 0.45, y: box.height * 0.3 } });
  await expect(reviewer.page.getByTestId('picked-chainage').filter({ visible: true })).toContainText('Picked ch.');
  await reviewer.page
    .getByLabel('Comment', { exact: true })
    .filter({ visible: true })
    .fill('PN 8 pipe is over its rating in the sag: use PN 16 here.');
  await reviewer.page.getByLabel('Tobias Wren').filter({ visible: true }).check();
  await reviewer.page.getByRole('button', { name: 'Post comment' }).click();
  const thread = reviewer.page
    .getByTestId('comment-thread')
    .filter({ visible: true })
    .filter({ hasText: 'over its rating in the sag' });
  await expect(thread).toBeVisible();
  await expect(thread).toContainText('Mentions: Tobias Wren');
  await expect(
    reviewer.page.locator('[data-layer="comment-pins"] [data-comment-id]').filter({ visible: true }),
  ).toHaveCount(1);
  await reviewer.page.screenshot({ path: 'test-results/review-reviewer-pin.png', fullPage: true });
  await reviewer.page.getByRole('button', { name: 'Request changes' }).click();
  await expect(reviewer.page.getByTestId('revision-status').filter({ visible: true })).toHaveAttribute(
    'data-status',
    'changes-requested',
  );

  // The designer answers in the thread and resubmits a new revision.
  await designer.page.goto(first);
  await expect(designer.page.getByTestId('revision-status').filter({ visible: true })).toHaveAttribute(
    'data-status',
    'changes-requested',
  );
  const designerThread = designer.page
    .getByTestId('comment-thread')
    .filter({ visible: true })
    .filter({ hasText: 'over its rating in the sag' });
  await designerThread
    .getByLabel('Reply', { exact: true })
    .filter({ visible: true })
    .fill('Changed the sag to PN 16 in the next revision.');
  await designerThread.getByRole('button', { name: 'Reply' }).click();
  await expect(designerThread.getByTestId('comment-reply').filter({ visible: true })).toContainText(
    'Changed the sag to PN 16',
  );
  const second = await makeRevision(designer.page, secondNote);

  // The reviewer approves the resubmitted revision; name and date come from the sign-in.
  await reviewer.page.goto(second);
  await reviewer.page.getByRole('button', { name: 'Approve' }).click();
  await expect(reviewer.page.getByTestId('revision-status').filter({ visible: true })).toHaveAttribute(
    'data-status',
    'approved',
  );
  await expect(reviewer.page.getByTestId('title-block').filter({ visible: true })).toContainText('Dara Okafor');
  await expect(reviewer.page.getByTestId('title-block').filter({ visible: true })).toContainText(today);
  await expect(reviewer.page.getByTestId('not-for-construction').filter({ visible: true })).toHaveCount(0);

  // The designer compares the two revisions and finds the decisions in the activity feed.
  await designer.page.goto(REVIEWS);
  const firstNumber = first.split('/').pop()!;
  const secondNumber = second.split('/').pop()!;
  for (const id of [firstNumber, secondNumber])
    await designer.page
      .locator(`[data-testid="revision-row"]:has(a[href$="${id}"]) input[type="checkbox"]`)
      .filter({ visible: true })
      .check();
  await designer.page.getByRole('link', { name: 'Compare the two picked' }).click();
  await expect(designer.page.getByTestId('compare-table').filter({ visible: true })).toBeVisible();
  await expect(designer.page.locator('[data-layer="earlier-grade"]').first()).toBeAttached();
  // Cost at the team's price list and the network outlets' pressures, each revision as it was frozen.
  await expect(designer.page.getByTestId('cost-total').filter({ visible: true })).toContainText('Total');
  await expect(designer.page.getByTestId('cost-row').filter({ visible: true }).first()).toBeVisible();
  await expect(designer.page.getByTestId('outlet-pressure').filter({ visible: true }).first()).toContainText(' m');
  await designer.page.screenshot({ path: 'test-results/review-compare.png', fullPage: true });
  await designer.page.goto(`/projects/${PROJECT}/activity?kinds=revision.approved`);
  await expect(designer.page.getByTestId('activity-feed').filter({ visible: true })).toContainText(
    'Dara Okafor approved revision',
  );

  // The client sees only approved revisions, not drafts or the working copy, and the PDF names the reviewer.
  const viewer = await as(browser, 'viewer@example.test');
  await viewer.page.goto(REVIEWS);
  const rows = viewer.page.getByTestId('revision-row').filter({ visible: true });
  await expect(rows.filter({ hasText: secondNote })).toHaveCount(1);
  await expect(rows.filter({ hasText: firstNote })).toHaveCount(0);
  for (const status of await viewer.page
    .getByTestId('revision-status')
    .filter({ visible: true })
    .evaluateAll((els) => els.map((e) => e.getAttribute('data-status')))) {
    expect(['approved', 'issued']).toContain(status);
  }
  await expect(viewer.page.getByRole('link', { name: 'Lines', exact: true })).toHaveCount(0);
  expect((await viewer.page.request.get(`/api/revisions/${first.split('/').pop()}`)).status()).toBe(404);
  await viewer.page.goto(second);
  await viewer.page.screenshot({ path: 'test-results/review-viewer-approved.png', fullPage: true });
  const [download] = await Promise.all([
    viewer.page.waitForEvent('download'),
    viewer.page.getByRole('link', { name: 'PDF report' }).click(),
  ]);
  const parser = new PDFParse({ data: new Uint8Array(fs.readFileSync((await download.path())!)) });
  const text = (await parser.getText()).text.replace(/\s+/g, ' ');
  await parser.destroy();
  expect(text).toContain('Dara Okafor');
  expect(text).toContain(today);
  expect(text).toContain('Approved');
  expect(text).not.toContain('NOT FOR CONSTRUCTION');
  const lines = await viewer.page.request.get(`/api/projects/${PROJECT}/lines`);
  expect(lines.status()).toBe(403);

  expect([...designer.errors, ...reviewer.errors, ...viewer.errors]).toEqual([]);
  await Promise.all([designer.close(), reviewer.close(), viewer.close()]);
});
