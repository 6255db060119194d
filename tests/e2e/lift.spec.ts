import { expect, test, type Locator } from '@playwright/test';
import { signIn, watchConsole } from './fixtures';

const BRACKWATER = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2002';
const WEIR_RAM = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4001';

/** The number in a readout such as "3,764 L/day". */
async function figureIn(readout: Locator, unit: string): Promise<number> {
  const text = (await readout.innerText()).replace(/\s+/g, ' ');
  const match = new RegExp(`([\\d,.]+) ${unit}`).exec(text);
  if (!match) throw new Error(`no figure in ${unit} in "${text}"`);
  return Number(match[1].replace(/,/g, ''));
}

test('a designer enters a ram site, sees litres a day and the tank fill time, and logs a commissioning reading', async ({
  page,
}) => {
  const errors = watchConsole(page);
  await signIn(page, 'designer@example.test');
  const name = `Creek ram trial ${Date.now()}`;
  await page.getByLabel('Name').fill(name);
  await page.getByRole('button', { name: 'Create project' }).click();
  await expect(page.getByRole('heading', { name })).toBeVisible();
  await page.getByRole('link', { name: 'Lift & storage' }).click();
  await expect(page.getByRole('heading', { name: 'Lift & storage' })).toBeVisible();
  // The forms are React-controlled: wait for the page to hydrate before typing into them.
  await page.waitForLoadState('networkidle');

  await page.getByText('Add a tank').click();
  const tankForm = page.getByRole('form', { name: 'Add a tank' });
  await tankForm.getByLabel('Tank name').fill('Top tank');
  await tankForm.getByLabel('Volume (L)').fill('1250');
  await tankForm.getByRole('button', { name: 'Add tank' }).click();
  await expect(tankForm.getByRole('status')).toHaveText('Tank added.');

  const ramForm = page.getByRole('form', { name: 'Add a ram site' });
  await ramForm.getByLabel('Site name').fill('Creek ram');
  await ramForm.getByLabel('Delivers to tank').selectOption({ label: 'Top tank (1,250 L)' });
  await ramForm.getByLabel('Drive flow available (L/min)').fill('20');
  await ramForm.getByLabel('Fall, source water level to pump (m)').fill('2');
  await ramForm.getByLabel('Drive pipe length (m)').fill('14');
  await ramForm.getByLabel('Drive pipe bore (mm)').fill('35.05');
  await ramForm.getByLabel('Lift, pump to delivery outlet (m)').fill('10.7');
  await ramForm.getByLabel('Delivery pipe length (m)').fill('107');
  // The delivery pipe opens on the project's pipe series (ISO 4427 here); this ram has a pipe of its own.
  await expect(ramForm.getByLabel('Pipe', { exact: true })).toHaveValue('pe100-iso4427-sdr11');
  await ramForm.getByLabel('Pipe', { exact: true }).selectOption('custom');
  await ramForm.getByLabel('Delivery pipe bore (mm)').fill('20.93');
  await ramForm.getByLabel('Pressure rating (kPa)').fill('689');
  await expect(ramForm.getByTestId('ram-preview')).toContainText('L/day');
  await ramForm.getByRole('button', { name: 'Add ram site' }).click();

  const answer = page.getByTestId('ram-answer');
  await expect(answer).toContainText('Delivered a day');
  // A small creek ram lifting 10.7 m through 107 m of pipe: about 3,700 L a day, 1,250 L in about 8 h (common practice,
  // no source).
  const litresPerDay = await figureIn(answer, 'L/day');
  expect(litresPerDay).toBeGreaterThan(3000);
  expect(litresPerDay).toBeLessThan(4700);
  const fillHours = await figureIn(answer, 'h');
  expect(fillHours).toBeGreaterThan(6);
  expect(fillHours).toBeLessThan(10);
  await expect(answer).toContainText('Fills Top tank (1,250 L) from empty');
  await expect(page.getByText('Planning figures only.')).toBeVisible();

  const reading = page.getByRole('form', { name: 'Log a commissioning reading' });
  await reading.getByLabel('Date').fill('2026-09-12');
  await reading.getByLabel('Beats per minute').fill('60');
  await reading.getByLabel('Supply head (fall) (m)').fill('2');
  await reading.getByLabel('Delivery head (m)').fill('11');
  await reading.getByLabel('Delivered bucket (L)').fill('10');
  await reading.getByLabel('Delivered seconds to fill (s)').fill('240');
  await reading.getByLabel('Waste bucket (L)').fill('10');
  await reading.getByLabel('Waste seconds to fill (s)').fill('30');
  await reading.getByRole('button', { name: 'Log reading' }).click();
  // q·h / (Q·H) = (10/240 × 11) / ((10/30 + 10/240) × 2) = 61 %.
  await expect(page.getByTestId('measured-efficiency')).toHaveText('61 %');
  await expect(page.getByRole('cell', { name: /planned \d+ %/ })).toBeVisible();
  expect(errors).toEqual([]);
});

// The client (viewer) sees approved revisions only; a reviewer reads the working copy without edit controls.
test('a reviewer sees the lift figures without edit controls, and a direct write is refused', async ({ page }) => {
  const errors = watchConsole(page);
  await signIn(page, 'reviewer@example.test');
  await page.goto(`/projects/${BRACKWATER}/lift`);
  await expect(page.getByRole('heading', { name: 'Weir ram' })).toBeVisible();
  await expect(page.getByRole('article', { name: 'Weir ram' }).getByTestId('ram-answer')).toContainText('US gal/day');
  await expect(page.getByTestId('measured-efficiency').first()).toBeVisible();
  for (const control of ['Edit site', 'Delete site', 'Add ram site', 'Log reading', 'Add tank', 'Make tasks']) {
    await expect(page.getByRole('button', { name: control })).toHaveCount(0);
  }
  await expect(page.getByRole('textbox')).toHaveCount(0);
  await expect(page.getByRole('checkbox')).toHaveCount(0);

  const put = await page.request.put(`/api/projects/${BRACKWATER}/ram-sites/${WEIR_RAM}`, {
    data: {
      name: 'Taken over',
      driveFlowM3s: 0.001,
      fallM: 2,
      liftM: 10,
      drivePipe: { lengthM: 14, insideDiameterM: 0.035, material: 'steel' },
      deliveryPipe: { lengthM: 100, pipeId: 'pe-d2239-sidr9-1in' },
    },
  });
  expect(put.status()).toBe(403);
  expect((await put.json()).error.code).toBe('forbidden');
  const reading = await page.request.post(
    `/api/projects/${BRACKWATER}/sources/6f1c1e52-3a57-4c38-9b0e-0d5b1c7a3001/yield-readings`,
    {
      data: { measuredOn: '2026-09-01', flowM3s: 0.01 },
    },
  );
  expect(reading.status()).toBe(403);
  await page.reload();
  await expect(page.getByRole('heading', { name: 'Weir ram' })).toBeVisible();
  expect(errors).toEqual([]);
});

test('a lift below the fall is refused beside the field and the site stays as it was', async ({ page }) => {
  await signIn(page, 'designer@example.test');
  await page.goto(`/projects/${BRACKWATER}/lift`);
  await page.waitForLoadState('networkidle');
  await page.getByRole('button', { name: 'Edit site' }).click();
  const form = page.getByRole('form', { name: 'Edit Weir ram' });
  await expect(form.getByLabel('Lift, pump to delivery outlet (ft)')).toHaveValue('70');
  await form.getByLabel('Lift, pump to delivery outlet (ft)').fill('3');
  await expect(form.getByTestId('ram-preview')).toContainText(
    'Cannot plan yet: Lift, pump to delivery outlet must be above the fall',
  );
  await form.getByRole('button', { name: 'Save ram site' }).click();
  await expect(
    form.getByRole('alert').filter({ hasText: 'Lift, pump to delivery outlet must be above the fall' }),
  ).toBeVisible();
  await page.reload();
  // Heads print with one decimal on every screen (lib/units quantity table).
  await expect(page.getByRole('region', { name: 'Ram pump' }).getByText('Fall 6.0 ft, lift 70.0 ft')).toBeVisible();
});
