import { expect, test, type Page } from '@playwright/test';
import { runNetworkAndWait, signIn, watchConsole } from './fixtures';

const KESTREL = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001';
const SPRING_LINE = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4001';
/** The parts this test adds, by name; a run that stopped half-way leaves some, and the next run clears them. */
const ADDED = /^Orchard (tee|trough) \d+$/;

/** Removes (through the API, as the signed-in designer) any parts a stopped earlier run left in the demo. */
async function removeLeftovers(page: Page) {
  const response = await page.request.get(`/api/projects/${KESTREL}/network`);
  expect(response.ok()).toBe(true);
  const { network } = (await response.json()) as { network: { records: { nodes: { id: string; name: string }[] } } };
  for (const node of network.records.nodes.filter((n) => ADDED.test(n.name))) {
    expect((await page.request.delete(`/api/projects/${KESTREL}/network/nodes/${node.id}`)).ok()).toBe(true);
  }
}

test('a designer builds a branched system with a take-off, solves it, sizes it, and sees sizes on the schematic and flows on the line', async ({
  page,
}) => {
  test.setTimeout(180_000);
  const errors = watchConsole(page);
  await signIn(page, 'designer@example.test');
  await removeLeftovers(page);
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
  // (The run's own end is awaited: an earlier run's result may still be on screen.)
  expect(await runNetworkAndWait(page, 'Solve at the peak hour', 60_000)).toBe('done');
  await expect(page.getByTestId('solve-summary')).toContainText('Converged');
  // The result says which friction law it was solved with: the line analysis's own.
  await expect(page.getByTestId('solve-friction')).toContainText(
    'Friction by Darcy-Weisbach with the Colebrook friction factor',
  );
  const branchLabel = page
    .locator('[data-scene="network"] [data-link-label]')
    .filter({ hasText: `Orchard branch ${stamp}` });
  await expect(branchLabel).toContainText('0.30 L/s →');
  await expect(page.locator('[data-scene="network"] [data-node-label]').filter({ hasText: trough })).toContainText(
    'head',
  );

  // Size for least cost from the team's price list: the chosen sizes are drawn on the schematic.
  expect(await runNetworkAndWait(page, 'Size for least cost', 120_000)).toBe('done');
  await expect(page.getByTestId('size-summary')).toContainText('Material cost');
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

  // Back on the network: removing a part asks first, names the join that goes with it, and a
  // cancel keeps everything. Removing the trough takes its branch; then the tee goes too, so the
  // demo is as it was and the test can run again.
  await page.goto(`/projects/${KESTREL}/network`);
  const network = page.locator('main').filter({ visible: true });
  await expect(network.getByRole('heading', { name: 'Network', exact: true })).toBeVisible();
  // A join asks too, and says its two ends stay; cancelled, it stays and focus is back on its button.
  const branchRow = network.locator(`tr[aria-label="Link Orchard branch ${stamp}"]`);
  const removeBranch = branchRow.getByRole('button', { name: `Remove Orchard branch ${stamp}` });
  await removeBranch.click();
  const joinDialog = page.getByRole('dialog', { name: `Remove “Orchard branch ${stamp}”?` });
  await expect(joinDialog).toContainText(`from ${tee} to ${trough} goes from the network; ${tee} and ${trough} stay`);
  await page.keyboard.press('Escape');
  await expect(joinDialog).toHaveCount(0);
  await expect(removeBranch).toBeFocused();
  await expect(branchRow).toBeVisible();

  const troughRow = network.locator(`tr[aria-label="Node ${trough}"]`);
  const removeTrough = troughRow.getByRole('button', { name: `Remove ${trough}` });
  await removeTrough.click();
  const dialog = page.getByRole('dialog', { name: `Remove “${trough}”?` });
  await expect(dialog).toContainText(`and with it the join “Orchard branch ${stamp}”`);
  await expect(dialog).toContainText('cannot be undone');
  await page.screenshot({ path: 'test-results/network-remove-asks.png' });
  await dialog.getByRole('button', { name: 'Cancel' }).click();
  await expect(dialog).toBeHidden();
  await expect(removeTrough).toBeFocused();
  await expect(troughRow).toBeVisible();
  await expect(network.locator(`tr[aria-label="Link Orchard branch ${stamp}"]`)).toBeVisible();

  await removeTrough.click();
  await dialog.getByRole('button', { name: 'Remove part' }).click();
  await expect(dialog).toBeHidden();
  await expect(troughRow).toHaveCount(0);
  await expect(network.locator(`tr[aria-label="Link Orchard branch ${stamp}"]`)).toHaveCount(0);
  // Focus stays in its place: the trough was the last row, so the same control of the row before (the tee's).
  const teeRow = network.locator(`tr[aria-label="Node ${tee}"]`);
  await expect(teeRow.getByRole('button', { name: `Remove ${tee}` })).toBeFocused();

  await teeRow.getByRole('button', { name: `Remove ${tee}` }).click();
  const teeDialog = page.getByRole('dialog', { name: `Remove “${tee}”?` });
  await expect(teeDialog).not.toContainText('and with it');
  await teeDialog.getByRole('button', { name: 'Remove part' }).click();
  await expect(teeRow).toHaveCount(0);
  expect(errors).toEqual([]);
});
