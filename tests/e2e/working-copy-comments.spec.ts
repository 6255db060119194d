import { expect, test, type Browser, type Locator, type Page } from '@playwright/test';
import { signIn, watchConsole } from './fixtures';

const PROJECT = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001';
const LINE_PAGE = `/projects/${PROJECT}/lines/6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4001`;
const ROUTE_PAGE = `/projects/${PROJECT}/routes/6f1c1e52-3a57-4c38-9b0e-0d5b1c7a3002`;
const NETWORK_PAGE = `/projects/${PROJECT}/network`;

async function as(
  browser: Browser,
  email: string,
): Promise<{ page: Page; errors: string[]; close: () => Promise<void> }> {
  const context = await browser.newContext({ viewport: { width: 1400, height: 1000 } });
  const page = await context.newPage();
  const errors = watchConsole(page);
  await signIn(page, email);
  return { page, errors, close: () => context.close() };
}

/** Posts a comment with the form of the visible comments panel; returns the new thread. */
async function postComment(page: Page, text: string, mention?: string): Promise<Locator> {
  const form = page.getByRole('form', { name: 'New comment' }).filter({ visible: true });
  await form.getByLabel('Comment', { exact: true }).fill(text);
  if (mention) await form.getByLabel(mention).check();
  await form.getByRole('button', { name: 'Post comment' }).click();
  const thread = page.getByTestId('comment-thread').filter({ visible: true }).filter({ hasText: text });
  await expect(thread).toBeVisible();
  return thread;
}

test("a reviewer pins a comment on the working copy's long profile; the designer sees the pin, jumps to it, answers and resolves it; the client cannot open the working copy", async ({
  browser,
}) => {
  test.setTimeout(150_000);
  const text = `Sag needs a washout here (${Date.now().toString(36)})`;

  const reviewer = await as(browser, 'reviewer@example.test');
  await reviewer.page.goto(LINE_PAGE);
  const capture = reviewer.page.getByTestId('profile-capture').filter({ visible: true });
  await expect(capture).toHaveCount(1);
  const box = (await capture.boundingBox())!;
  await capture.click({ position: { x: box.width * 0.46, y: box.height * 0.4 } });
  await expect(reviewer.page.getByTestId('picked-chainage').filter({ visible: true })).toContainText('Picked ch.');
  const pinTo = reviewer.page.getByLabel('Pin the comment to').filter({ visible: true });
  await expect(pinTo.locator('option:checked')).toContainText('(picked on the profile)');
  const thread = await postComment(reviewer.page, text, 'Tobias Wren');
  await expect(thread).toContainText('Spring box to house, ch.');
  await expect(thread).toContainText('Mentions: Tobias Wren');
  const commentId = (await thread.getAttribute('data-comment-id'))!;
  const pin = reviewer.page
    .locator(`[data-layer="comment-pins"] [data-comment-id="${commentId}"]`)
    .filter({ visible: true });
  await expect(pin).toHaveCount(1);
  await expect(pin).toHaveAttribute('data-resolved', 'no');
  const pinnedAt = Number(await pin.getAttribute('data-chainage-m'));
  expect(pinnedAt).toBeGreaterThan(200);
  expect(pinnedAt).toBeLessThan(1000);
  await reviewer.page
    .locator('section[aria-labelledby="profile-heading"]')
    .filter({ visible: true })
    .screenshot({ path: 'test-results/working-copy-reviewer-pin.png' });

  // The designer sees the same pin, jumps to it from the list, answers and resolves the thread.
  const designer = await as(browser, 'designer@example.test');
  await designer.page.goto(LINE_PAGE);
  const designerThread = designer.page
    .locator(`[data-testid="comment-thread"][data-comment-id="${commentId}"]`)
    .filter({ visible: true });
  await expect(designerThread).toContainText(text);
  const designerPin = designer.page
    .locator(`[data-layer="comment-pins"] [data-comment-id="${commentId}"]`)
    .filter({ visible: true });
  await expect(designerPin).toHaveAttribute('data-chainage-m', String(pinnedAt));
  // Zoom in somewhere else first, so the jump has to bring the pin back into view.
  await designer.page.getByRole('button', { name: 'Zoom in' }).filter({ visible: true }).click();
  await designer.page.getByRole('button', { name: 'Zoom in' }).filter({ visible: true }).click();
  await designerThread.getByRole('button', { name: /Spring box to house, ch\./ }).click();
  await expect(designerPin).toBeVisible();
  await expect(designerPin.locator('line')).toHaveAttribute('stroke', '#122e3a');
  await expect(designerThread).toHaveClass(/ring-1/);
  await designerThread.getByLabel('Reply', { exact: true }).fill('Added a washout at the low point.');
  await designerThread.getByRole('button', { name: 'Reply' }).click();
  await expect(designerThread.getByTestId('comment-reply')).toContainText('Added a washout at the low point.');
  await designerThread.getByRole('button', { name: 'Resolve' }).click();
  await expect(designerThread).toHaveAttribute('data-resolved', 'yes');
  await expect(designerThread).toContainText('Resolved by Tobias Wren');
  await expect(designerPin).toHaveAttribute('data-resolved', 'yes');
  await designer.page
    .locator('section[aria-labelledby="profile-heading"]')
    .filter({ visible: true })
    .screenshot({ path: 'test-results/working-copy-designer-profile.png' });
  await designerThread.screenshot({ path: 'test-results/working-copy-designer-resolved.png' });

  // The reviewer reopens it; the activity feed has the comment with its mention.
  await reviewer.page.reload();
  const again = reviewer.page
    .locator(`[data-testid="comment-thread"][data-comment-id="${commentId}"]`)
    .filter({ visible: true });
  await expect(again).toHaveAttribute('data-resolved', 'yes');
  await again.getByRole('button', { name: 'Reopen' }).click();
  await expect(again).toHaveAttribute('data-resolved', 'no');
  await reviewer.page.goto(`/projects/${PROJECT}/activity?kinds=comment.added`);
  await expect(reviewer.page.getByTestId('activity-feed').filter({ visible: true })).toContainText(text.slice(0, 30));

  // The client cannot open the working copy at all.
  const viewer = await as(browser, 'viewer@example.test');
  await viewer.page.goto(LINE_PAGE);
  await expect(viewer.page.getByRole('heading', { name: 'No such line' }).filter({ visible: true })).toBeVisible();
  await expect(viewer.page.getByTestId('profile-chart')).toHaveCount(0);
  await expect(viewer.page.getByTestId('comments-panel')).toHaveCount(0);
  expect((await viewer.page.request.get(`/api/projects/${PROJECT}/comments`)).status()).toBe(200);
  const seen = (await (await viewer.page.request.get(`/api/projects/${PROJECT}/comments`)).json()).comments as {
    id: string;
  }[];
  expect(seen.map((c) => c.id)).not.toContain(commentId);

  expect([...reviewer.errors, ...designer.errors, ...viewer.errors]).toEqual([]);
  await Promise.all([reviewer.close(), designer.close(), viewer.close()]);
});

test('a reviewer pins a comment on a part of the network schematic; a surveyor pins one on a route and may not comment on a line', async ({
  browser,
}) => {
  test.setTimeout(120_000);
  const run = Date.now().toString(36);
  const reviewer = await as(browser, 'reviewer@example.test');
  await reviewer.page.goto(NETWORK_PAGE);
  const node = reviewer.page
    .locator('[data-scene="network"] [data-node-id][data-kind="outlet"]')
    .filter({ visible: true })
    .first();
  // Two outlets can sit on one spot (both lines end at the house): click the one picked, whatever is drawn over it.
  await node.dispatchEvent('click');
  await expect(reviewer.page.getByTestId('picked-part').filter({ visible: true })).toContainText('Picked');
  const nodeId = (await node.getAttribute('data-node-id'))!;
  const thread = await postComment(reviewer.page, `Is the house outlet pressure enough? (${run})`);
  await expect(thread).toContainText('(network node)');
  const commentId = (await thread.getAttribute('data-comment-id'))!;
  const pin = reviewer.page
    .locator(`[data-scene="network"] [data-layer="comment-pins"] [data-comment-id="${commentId}"]`)
    .filter({ visible: true });
  await expect(pin).toHaveAttribute('data-part-id', nodeId);
  // The list jumps to the part: the node is picked (ringed) again after picking something else.
  await reviewer.page
    .locator('[data-scene="network"] [data-link-id]')
    .filter({ visible: true })
    .first()
    .dispatchEvent('click');
  await thread.getByRole('button', { name: /network node/ }).click();
  await expect(reviewer.page.getByTestId('picked-part').filter({ visible: true })).toContainText('Picked');
  await expect(node.locator('circle[stroke="#c98d12"]')).toHaveCount(1);
  await reviewer.page
    .locator('[data-scene="network"]')
    .filter({ visible: true })
    .screenshot({ path: 'test-results/working-copy-network-pin.png' });
  await reviewer.page.screenshot({ path: 'test-results/working-copy-network-page.png', fullPage: true });

  const surveyor = await as(browser, 'surveyor@example.test');
  await surveyor.page.goto(ROUTE_PAGE);
  const profile = surveyor.page.getByTestId('route-profile-capture').filter({ visible: true });
  const box = (await profile.boundingBox())!;
  await profile.click({ position: { x: box.width * 0.3, y: box.height * 0.5 } });
  await expect(surveyor.page.getByTestId('picked-chainage').filter({ visible: true })).toContainText('Picked ch.');
  const routeThread = await postComment(surveyor.page, `Peg 14 was moved by the tractor (${run})`);
  const routeCommentId = (await routeThread.getAttribute('data-comment-id'))!;
  await expect(
    surveyor.page.locator(`[data-testid="route-profile"] [data-comment-id="${routeCommentId}"]`),
  ).toHaveCount(1);
  // Without a pointer: a typed chainage picks the place as well.
  const typed = surveyor.page.getByLabel('Pin at chainage').filter({ visible: true });
  await typed.fill('120');
  await typed.press('Enter');
  await expect(surveyor.page.getByTestId('picked-chainage').filter({ visible: true })).toContainText('Picked ch. 120');
  await surveyor.page
    .getByTestId('route-profile')
    .filter({ visible: true })
    .screenshot({ path: 'test-results/working-copy-route-pin.png' });
  // On a line a surveyor reads the comments but has no form to add one.
  await surveyor.page.goto(LINE_PAGE);
  await expect(
    surveyor.page.getByRole('heading', { name: /Comments on this line/ }).filter({ visible: true }),
  ).toBeVisible();
  await expect(surveyor.page.getByRole('form', { name: 'New comment' })).toHaveCount(0);

  expect([...reviewer.errors, ...surveyor.errors]).toEqual([]);
  await Promise.all([reviewer.close(), surveyor.close()]);
});
