import { expect, test, type Page } from '@playwright/test';
import { findPipe } from '../../hydraulics/index';
import { pipeForFamily } from '../../lib/lines/pipe-choices';
import { seriousFindings } from './axe';
import { signIn, watchConsole } from './fixtures';

// Edits are never lost and never shown as saved when they were not; deletes ask first.
const PROJECT = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001';
const ROUTE = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a3002';
const PN16_LINE = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4002';
const BRACKWATER = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2002';
const shots = 'test-results/edits-kept';

/** A throw-away copy of the PN 16 demo line (through the new endpoint), removed again by the caller. */
async function copyOfDemoLine(page: Page, name: string): Promise<{ id: string; revision: number }> {
  const res = await page.request.post(`/api/lines/${PN16_LINE}/duplicate`, { data: { name } });
  expect(res.status()).toBe(201);
  return (await res.json()).line;
}

async function removeLine(page: Page, id: string) {
  const res = await page.request.delete(`/api/lines/${id}`);
  expect([204, 404]).toContain(res.status());
}

test('lines are duplicated and deleted from the list and the line page; the dialog says what goes and gives focus back', async ({
  page,
}) => {
  const errors = watchConsole(page);
  await signIn(page, 'designer@example.test');
  await page.goto(`/projects/${PROJECT}/lines`);
  const rows = page.getByTestId('line-row').filter({ visible: true });
  await rows
    .filter({ hasText: 'Spring box to house, PN 16 option' })
    .first()
    .getByRole('button', { name: 'Duplicate Spring box to house, PN 16 option' })
    .click();
  await expect(
    page.getByRole('status').filter({ hasText: 'as “Spring box to house, PN 16 option (copy)”' }),
  ).toBeVisible();
  const copyRow = rows.filter({ hasText: 'PN 16 option (copy)' });
  await expect(copyRow).toHaveCount(1);

  // Escape cancels: nothing goes, focus is back on the button that opened the dialog.
  const del = copyRow.getByRole('button', { name: /^Delete / });
  await del.click();
  const dialog = page.getByRole('dialog', { name: /Delete the line “Spring box to house, PN 16 option \(copy\)”/ });
  await expect(dialog).toBeVisible();
  await expect(dialog.getByTestId('line-deletion-effects')).toContainText('network ends that only this line joined');
  await expect(dialog).toContainText('1 pipe stretch');
  await page.screenshot({ path: `${shots}/delete-line-dialog.png` });
  expect(await seriousFindings(page)).toEqual([]);
  await page.keyboard.press('Escape');
  await expect(dialog).toHaveCount(0);
  await expect(del).toBeFocused();
  await expect(copyRow).toHaveCount(1);

  // Confirmed: the row goes and focus stays in the table, not thrown to the top of the page.
  await del.click();
  await dialog.getByRole('button', { name: 'Delete line' }).click();
  await expect(copyRow).toHaveCount(0);
  await expect(
    page.getByRole('status').filter({ hasText: 'Deleted “Spring box to house, PN 16 option (copy)”.' }),
  ).toBeVisible();
  // Focus comes back once the dialog has closed and the list re-rendered: wait for it rather than read it once.
  await expect
    .poll(() =>
      page.evaluate(
        () =>
          document.activeElement !== document.body &&
          document.activeElement?.closest('table, [role="region"], section, div') !== null,
      ),
    )
    .toBe(true);

  // From the line page: duplicate opens the copy; delete returns to the list.
  await page.goto(`/projects/${PROJECT}/lines/${PN16_LINE}`);
  await page.getByRole('button', { name: 'Duplicate', exact: true }).filter({ visible: true }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Spring box to house, PN 16 option (copy)' })).toBeVisible();
  expect(page.url()).not.toContain(PN16_LINE);
  await page.getByRole('button', { name: 'Delete', exact: true }).filter({ visible: true }).click();
  await page.getByRole('dialog').getByRole('button', { name: 'Delete line' }).click();
  await expect(page).toHaveURL(new RegExp(`/projects/${PROJECT}/lines$`));
  await expect(rows.filter({ hasText: 'PN 16 option (copy)' })).toHaveCount(0);
  expect(errors).toEqual([]);
});

test('switching the material keeps the nearest bore; design flow saves nothing untyped; a refused value is never shown as saved', async ({
  page,
}) => {
  await signIn(page, 'designer@example.test');
  const copy = await copyOfDemoLine(page, 'Edits spec line');
  try {
    const found = await page.request.patch(`/api/lines/${copy.id}`, {
      data: {
        design: {
          ...(await (await page.request.get(`/api/lines/${copy.id}`)).json()).line.design,
          flow: { kind: 'find' },
        },
      },
    });
    expect(found.ok()).toBe(true);
    await page.goto(`/projects/${PROJECT}/lines/${copy.id}`);
    const state = page.getByTestId('save-state').filter({ visible: true });
    await expect(state).toHaveAttribute('data-state', 'saved');

    // PE100 SDR 11 50 mm to PVC: the nearest bore, not the family's 1/2 in.
    const family = page.getByLabel('Pipe material and standard').filter({ visible: true }).first();
    await family.selectOption('pvc-d2241');
    const expected = pipeForFamily('pvc-d2241', findPipe('pe100-iso4427-sdr11-50mm'));
    await expect(page.getByLabel('Size').filter({ visible: true }).first()).toHaveValue(expected);
    await expect(state).toHaveAttribute('data-state', 'saved');
    const afterSwitch = (await (await page.request.get(`/api/lines/${copy.id}`)).json()).line;
    expect(afterSwitch.design.stretches[0].pipe).toBe(expected);
    expect(findPipe(expected)!.nominalSize).toBe('1-1/2 in');

    // "Design flow" alone saves nothing and the header says a value is still to be typed.
    await page.getByRole('radio', { name: 'Design flow' }).check();
    const flowBox = page.getByLabel(/^Design flow \(/);
    await expect(flowBox).toHaveValue('');
    // An example in the project's units stands in the empty box; nothing is saved from it.
    await expect(flowBox).toHaveAttribute('placeholder', 'e.g. 1');
    await expect(state).toHaveAttribute('data-state', 'refused');
    await expect(state).toContainText('Not saved: Design flow, still to be typed — the line keeps its saved values');
    await page.screenshot({ path: `${shots}/design-flow-untyped.png` });
    await page.waitForTimeout(1200);
    expect((await (await page.request.get(`/api/lines/${copy.id}`)).json()).line.design.flow).toEqual({ kind: 'find' });

    // A refused value: the box says why, the header does not claim the line is saved.
    await flowBox.fill('-2');
    await flowBox.press('Enter');
    await expect(page.getByText('The flow cannot be negative')).toBeVisible();
    await expect(state).toHaveAttribute('data-state', 'refused');
    await expect(state).not.toContainText('All changes saved');
    await flowBox.fill('0.8');
    await flowBox.press('Enter');
    await expect(state).toHaveAttribute('data-state', 'saved');
    await expect(state).toHaveText('All changes saved');
    const saved = (await (await page.request.get(`/api/lines/${copy.id}`)).json()).line.design.flow;
    expect(saved.kind).toBe('design');
    expect(saved.flowM3s).toBeCloseTo(0.0008, 9);
  } finally {
    await removeLine(page, copy.id);
  }
});

test("a save conflict with one's own other tab says so and offers a reload", async ({ page, context }) => {
  await signIn(page, 'designer@example.test');
  const copy = await copyOfDemoLine(page, 'Two tabs line');
  try {
    const url = `/projects/${PROJECT}/lines/${copy.id}`;
    await page.goto(url);
    const other = await context.newPage();
    await other.goto(url);
    const flowIn = (p: Page) => p.getByLabel(/^Design flow \(/);
    await flowIn(page).fill('0.7');
    await flowIn(page).press('Enter');
    // This tab's save is in (revision 2) before the other tab, still on revision 1, saves.
    await expect
      .poll(async () => (await (await page.request.get(`/api/lines/${copy.id}`)).json()).line.revision)
      .toBe(2);
    await expect(page.getByTestId('save-state').filter({ visible: true })).toHaveAttribute('data-state', 'saved');

    await flowIn(other).fill('0.9');
    await flowIn(other).press('Enter');
    const state = other.getByTestId('save-state').filter({ visible: true });
    await expect(state).toHaveAttribute('data-state', 'conflict');
    await expect(state).toContainText('You saved revision 2 of this line in another tab or window');
    await expect(state).not.toContainText('someone else');
    // Said where the person is working too, not only in the header above.
    const bar = other.getByTestId('save-conflict');
    await expect(bar).toBeInViewport();
    await expect(bar).toContainText('You saved revision 2');
    await other.screenshot({ path: `${shots}/own-tab-conflict.png` });
    await other.getByRole('button', { name: 'Reload the saved line' }).click();
    await expect(flowIn(other)).toHaveValue(/^0[.,]7/);
    await expect(other.getByTestId('save-state').filter({ visible: true })).toHaveAttribute('data-state', 'saved');
  } finally {
    await removeLine(page, copy.id);
  }
});

test('unsaved route-table edits survive a visit to another section', async ({ page }) => {
  await signIn(page, 'designer@example.test');
  await page.goto(`/projects/${PROJECT}/routes/${ROUTE}`);
  // The streamed page holds a hidden copy of the table for a moment: act on the one on screen.
  const elevation = page.getByLabel('Elevation of point 2', { exact: true }).filter({ visible: true });
  const before = await elevation.inputValue();
  await elevation.fill('123.45');
  await elevation.press('Enter');
  await expect(page.getByText('Unsaved changes', { exact: true })).toBeVisible();

  await page.getByRole('navigation', { name: 'Project sections' }).getByRole('link', { name: 'Lines' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Lines' })).toBeVisible();
  await page.getByRole('navigation', { name: 'Project sections' }).getByRole('link', { name: 'Survey routes' }).click();
  await page.getByRole('link', { name: 'Spring line design profile' }).first().click();
  await expect(page.getByText(/^Unsaved changes \(kept from before you left this page\)$/)).toBeVisible();
  await expect(page.getByLabel('Elevation of point 2', { exact: true }).filter({ visible: true })).toHaveValue(
    /^123[.,]45$/,
  );

  // Removing a row from the keyboard keeps focus in place: on the delete button of the row that moved up.
  const fourth = await page.getByLabel('Elevation of point 4', { exact: true }).filter({ visible: true }).inputValue();
  await page.getByRole('button', { name: 'Delete point 3', exact: true }).filter({ visible: true }).focus();
  await page.keyboard.press('Enter');
  await expect(page.getByLabel('Elevation of point 3', { exact: true }).filter({ visible: true })).toHaveValue(fourth);
  await expect(
    page.getByRole('button', { name: 'Delete point 3', exact: true }).filter({ visible: true }),
  ).toBeFocused();

  // Discarded, they are gone for good (nothing was saved).
  await page.getByRole('button', { name: 'Discard' }).click();
  await expect(page.getByLabel('Elevation of point 2', { exact: true }).filter({ visible: true })).toHaveValue(before);
});

test('deleting a route names its lines and what happens to them; lift deletes ask first', async ({ page }) => {
  await signIn(page, 'designer@example.test');
  await page.goto(`/projects/${PROJECT}/routes/${ROUTE}`);
  const remove = page.getByRole('button', { name: 'Delete route' });
  await remove.click();
  const dialog = page.getByRole('dialog', { name: 'Delete the route “Spring line design profile”?' });
  const lines = dialog.getByTestId('route-deletion-lines');
  await expect(lines).toContainText('lines follow this route');
  await expect(lines.getByRole('listitem').filter({ hasText: 'Spring box to house, PN 16 option' })).toHaveCount(1);
  await expect(lines).toContainText('cannot be drawn, analysed, reported or duplicated');
  await page.screenshot({ path: `${shots}/delete-route-dialog.png` });
  await dialog.getByRole('button', { name: 'Cancel' }).click();
  await expect(remove).toBeFocused();
  expect((await page.request.get(`/api/routes/${ROUTE}`)).status()).toBe(200);

  await page.goto(`/projects/${BRACKWATER}/lift`);
  await page.getByRole('button', { name: 'Delete site' }).first().click();
  const ram = page.getByRole('dialog', { name: /Delete the ram site/ });
  await expect(ram).toContainText('commissioning log');
  await expect(ram).toContainText('Lines that start at this ram');
  await page.screenshot({ path: `${shots}/delete-ram-dialog.png` });
  await ram.getByRole('button', { name: 'Cancel' }).click();
  await expect(page.getByRole('heading', { name: 'Weir ram' })).toBeVisible();
});

test('a new project leads on to importing its route', async ({ page }) => {
  await signIn(page, 'designer@example.test');
  const name = `Edits spec project ${Date.now()}`;
  await page.getByLabel('Name').first().fill(name);
  await page
    .getByRole('button', { name: /Create|Start/ })
    .filter({ visible: true })
    .first()
    .click();
  const next = page.getByTestId('next-step');
  await expect(next).toContainText('Next: bring in the pipe route');
  await page.screenshot({ path: `${shots}/new-project-next-step.png` });
  await next.getByRole('link', { name: 'Import a route' }).click();
  await expect(page).toHaveURL(/\/routes\/import$/);
});
