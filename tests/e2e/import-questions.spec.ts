import { mkdtempSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { expect, test } from '@playwright/test';
import { signIn, watchConsole } from './fixtures';

const SPRING_LINE = 'Kestrel Hollow spring line';

/**
 * A short phone walk logged with day-month dates (01.05.2026 could be either) and a ridge with GPS scatter (invented).
 */
function ambiguousDatesCsv(): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'runnel-e2e-'));
  const file = path.join(dir, 'ridge-walk-dates.csv');
  const lines = ['lat,lon,ele,time'];
  for (let i = 0; i < 80; i += 1) {
    const ground = 900 - Math.abs(i - 40) * 1.5;
    const scatter = [0.9, -1.2, 0.4, -0.6, 1.3, -0.2][i % 6];
    const minute = String(i % 60).padStart(2, '0');
    const hour = String(7 + Math.floor(i / 60)).padStart(2, '0');
    lines.push(`${(46.1 + i * 0.0002).toFixed(6)},7.2,${(ground + scatter).toFixed(1)},01.05.2026 ${hour}:${minute}`);
  }
  writeFileSync(file, `${lines.join('\n')}\n`);
  return file;
}

test('import asks the date order and the time zone, and offers smoothing for a GPS walk', async ({ page }) => {
  const errors = watchConsole(page);
  await signIn(page, 'surveyor@example.test');
  await page.getByRole('link', { name: SPRING_LINE }).click();
  await page.getByRole('navigation', { name: 'Project sections' }).getByRole('link', { name: 'Survey routes' }).click();
  await page.getByRole('link', { name: 'Import a survey file' }).click();
  await page.getByLabel('Survey file (CSV or GPX, up to 50 MB)').setInputFiles(ambiguousDatesCsv());

  // The first rows hold 01.05.2026: the screen asks which order, and shows the zone times are read in.
  const times = page.getByTestId('time-questions').filter({ visible: true });
  await expect(times.getByTestId('ask-date-order')).toContainText('could be read two ways');
  await expect(page.locator('#time-zone')).toHaveValue('UTC');

  // Reading without answering stops with the question, naming the line.
  await page.getByRole('button', { name: 'Read the file with these settings' }).click();
  await expect(
    page.getByText(/line 2, column “time”: “01\.05\.2026 07:00” could be day first or month first/),
  ).toBeVisible();

  await times.getByLabel('Day first (31.12.2024)').check();
  await expect(times.getByTestId('ask-date-order')).toHaveCount(0);
  await page.locator('#time-zone').selectOption('Europe/Vienna');
  await page.getByLabel('Route name').fill('Ridge walk with local times');
  await page.screenshot({ path: test.info().outputPath('import-time-questions.png'), fullPage: true });
  await page.getByRole('button', { name: 'Read the file with these settings' }).click();

  const preview = page.getByRole('region', { name: 'Preview' });
  const offer = preview.getByTestId('offer-smoothing');
  await expect(offer.getByRole('checkbox')).not.toBeChecked();
  await offer.getByRole('checkbox').check();
  await page.screenshot({ path: test.info().outputPath('import-offer-smoothing.png'), fullPage: true });
  await preview.getByRole('button', { name: 'Save route' }).click();

  await expect(page.getByRole('heading', { name: 'Ridge walk with local times' })).toBeVisible();
  await expect(page).toHaveURL(/propose=smoothing/);
  const note = page.getByTestId('import-smoothing-note').filter({ visible: true });
  await expect(note).toContainText('moving median of 5 points');
  await expect(page.getByRole('heading', { name: /Requested \(\d+ changes\)/ })).toBeVisible();
  await page.screenshot({ path: test.info().outputPath('route-smoothing-proposed.png'), fullPage: true });
  expect(errors).toEqual([]);
});
