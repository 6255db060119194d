import { expect, test } from '@playwright/test';
import { signIn, watchConsole } from './fixtures';

const KESTREL = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001';
const SPRING_LINE = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4001';

test('a designer builds a branched system with a take-off, solves it, sizes it, and sees sizes on the schematic and flows on the line', async ({ page }) => {
  test.setTimeout(180_000);
  const errors = watchConsole(page);
  await signIn(page, 'designer@example.test');
  await page.goto(`/projects/${KESTREL}/network`);
  await expect(page.getByRole('heading', { name: 'Network', exact: true })).toBeVisible();
  await page.waitForLoadState('networkidle');
  const stamp = Date.now().toString().slice(-5);
  const tee = `Orchard tee ${stamp}`;
  const trough = `Orchard trough ${stamp}`;

  // A take-off on the spring line, placed by clicking its long profile halfway along.
  await page.getByLabel('Line').selectOption({ label: 'Spring box to house' });
  await page.getByLabel('Name of the take-off').fill(tee);
  const strip = page.getByTestId('take-off-strip');
  const box = (await strip.boundingBox())!;
  await strip.click({ position: { x: box.width * 0.5, y: box.height * 0.5 } });
  await expect(page.getByText(`Placed "${tee}"`)).toBeVisible();

  // A trough below it, joined to the tee by a pipe.
  const addPart = page.getByRole('form', { name: 'Add a part' });
  await addPart.getByLabel('Part').selectOption('outlet');
  await addPart.getByLabel('Name').fill(trough);
  await addPart.getByLabel('Elevation (m)').fill('340');
  await addPart.getByLabel('Outlet', { exact: true }).selectOption('trough');
  await addPart.getByLabel('Fixed peak draw (L/s)').fill('0.3');
  await addPart.getByRole('button', { name: 'Add part' }).click();
  await expect(addPart.getByText(`Added ${trough}`)).toBeVisible();

  const join = page.getByRole('form', { name: 'Join two parts' });
  await join.getByLabel('Name').fill(`Orchard branch ${stamp}`);
  await join.getByLabel('From').selectOption({ label: tee });
  await join.getByLabel('To').selectOption({ label: trough });
  await join.getByLabel('Length (m)').fill('180');
  await join.getByRole('button', { name: 'Join' }).click();
  await expect(join.getByText(`Joined with Orchard branch ${stamp}`)).toBeVisible();
  await expect(page.locator('[data-scene="network"] [data-node-label]').filter({ hasText: trough })).toBeVisible();

  // Solve: the schematic shows flows with their direction and the trough's pressure.
  await page.getByRole('button', { name: 'Solve at the peak hour' }).click();
  await expect(page.getByTestId('solve-summary')).toContainText('Converged', { timeout: 60_000 });
  // The result says which friction law it was solved with: the line analysis's own.
  await expect(page.getByTestId('solve-friction')).toContainText('Friction by Darcy-Weisbach with the Colebrook friction factor');
  const branchLabel = page.locator('[data-scene="network"] [data-link-label]').filter({ hasText: `Orchard branch ${stamp}` });
  await expect(branchLabel).toContainText('0.30 L/s →');
  await expect(page.locator('[data-scene="network"] [data-node-label]').filter({ hasText: trough })).toContainText('head');

  // Size for least cost from the team's price list: the chosen sizes are drawn on the schematic.
  await page.getByRole('button', { name: 'Size for least cost' }).click();
  await expect(page.getByTestId('size-summary')).toContainText('Material cost', { timeout: 120_000 });
  await expect(page.getByText('Showing the least-cost sizes')).toBeVisible();
  await expect(branchLabel).toContainText(/mm PE100 SDR 11/);
  await page.screenshot({ path: 'test-results/network-sized.png', fullPage: true });

  // The line's long profile now carries the network's flow: it drops after the take-off.
  await page.goto(`/projects/${KESTREL}/lines/${SPRING_LINE}`);
  // A route visited before can stay in the page, hidden: read the one on screen.
  const flows = page.locator('main').filter({ visible: true }).getByTestId('network-flows');
  await expect(flows).toContainText(`after ${tee}`, { timeout: 30_000 });
  await expect(flows.locator('li').first()).toContainText('1.30 L/s');
  await expect(flows.locator('li').filter({ hasText: `after ${tee}` })).toContainText('1.00 L/s');
  await page.screenshot({ path: 'test-results/network-line-flows.png', fullPage: true });
  expect(errors).toEqual([]);
});
