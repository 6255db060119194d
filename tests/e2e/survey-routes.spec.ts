import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { expect, test, type Page } from '@playwright/test';
import { signIn, watchConsole } from './fixtures';

const SPRING_LINE = 'Kestrel Hollow spring line';
const FIXTURES = path.resolve(__dirname, '../fixtures/survey');
const ROWS = 20_000;
const SPIKE_ROW = 5_000;

/** A long phone export whose height column the guess cannot name, with one spike (+20 m). */
function longTrackCsv(): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'runnel-e2e-'));
  const file = path.join(dir, 'long-walk.csv');
  const lines = ['time,Lat,Lon,GPS height (ft),note'];
  for (let i = 0; i < ROWS; i += 1) {
    const ft = (1300 - i * 0.05 + (i === SPIKE_ROW ? 65.6 : 0)).toFixed(2);
    const t = new Date(Date.UTC(2026, 3, 18, 6) + i * 2000).toISOString();
    lines.push(`${t},${(54.3 + i * 0.000045).toFixed(7)},-2.9,${ft},${i === 0 ? 'spring box' : ''}`);
  }
  writeFileSync(file, `${lines.join('\n')}\n`);
  return file;
}

async function openImport(page: Page) {
  await page.getByRole('link', { name: SPRING_LINE }).click();
  await page.getByRole('navigation', { name: 'Project sections' }).getByRole('link', { name: 'Survey routes' }).click();
  await page.getByRole('link', { name: 'Import a survey file' }).click();
  await expect(page.getByRole('heading', { name: 'Import a survey' })).toBeVisible();
}

/** Records every value the progress bar shows, to prove it moved through the read. */
async function recordProgress(page: Page) {
  await page.evaluate(() => {
    const seen: number[] = [];
    (window as unknown as { progressSeen: number[] }).progressSeen = seen;
    new MutationObserver(() => {
      const bar = document.querySelector('[role="progressbar"]');
      if (bar) seen.push(Number(bar.getAttribute('aria-valuenow')));
    }).observe(document.body, { subtree: true, childList: true, attributes: true, attributeFilter: ['aria-valuenow'] });
  });
}

test('a surveyor imports a GPX track and sees its profile and features', async ({ page }) => {
  const errors = watchConsole(page);
  await signIn(page, 'surveyor@example.test');
  await openImport(page);
  await page.getByLabel('Survey file (CSV or GPX, up to 50 MB)').setInputFiles(path.join(FIXTURES, 'walked-route.gpx'));
  await expect(page.getByText('is a GPX file')).toBeVisible();
  await page.getByLabel('Route name').fill('Alder Spring walk (GPX)');
  await page.getByRole('button', { name: 'Read the file with these settings' }).click();
  await expect(page.getByRole('progressbar', { name: 'Reading rows' })).toHaveAttribute('aria-valuenow', '100');
  const preview = page.getByRole('region', { name: 'Preview' });
  await expect(preview.getByRole('alert').filter({ hasText: 'Heights from a consumer GPS' })).toBeVisible();
  await expect(preview.getByText('track segments were joined')).toBeVisible();
  await preview.getByRole('button', { name: 'Save route' }).click();
  await expect(page.getByRole('heading', { name: 'Alder Spring walk (GPX)' })).toBeVisible();
  await expect(
    page.getByRole('img', { name: 'Ground profile of Alder Spring walk (GPX)' }).locator('path[data-series="cleaned"]'),
  ).toHaveCount(1);
  await expect(page.getByText('Along the route: Alder Spring box at')).toBeVisible();
  const download = page.getByRole('link', { name: /Download original \(walked-route\.gpx/ });
  const res = await page.request.get((await download.getAttribute('href'))!);
  expect(await res.text()).toBe(readFileSync(path.join(FIXTURES, 'walked-route.gpx'), 'utf8'));
  expect(errors).toEqual([]);
});

test('a surveyor maps the columns of a long CSV, watches the progress, fixes a spike and sees the profile', async ({
  page,
}) => {
  test.setTimeout(120_000);
  const errors = watchConsole(page);
  await signIn(page, 'surveyor@example.test');
  await openImport(page);
  await page.getByLabel('Survey file (CSV or GPX, up to 50 MB)').setInputFiles(longTrackCsv());

  // The guess finds latitude, longitude and time but cannot name “GPS height (ft)”.
  await expect(page.getByLabel('Latitude *')).toHaveValue('1');
  await expect(page.getByLabel('Time', { exact: true })).toHaveValue('0');
  await expect(page.getByLabel('Elevation or altitude *')).toHaveValue('');
  await expect(
    page.getByRole('table', { name: 'First rows of the file' }).getByRole('cell', { name: 'spring box' }),
  ).toBeVisible();
  await page.getByLabel('Elevation or altitude *').selectOption({ label: '4 · GPS height (ft)' });
  await page.getByLabel('Name or note').selectOption({ label: '5 · note' });
  await page.getByRole('radio', { name: 'feet' }).check();
  await page.getByLabel('Route name').fill('Long walk to the far trough');

  await recordProgress(page);
  await page.getByRole('button', { name: 'Read the file with these settings' }).click();
  const bar = page.getByRole('progressbar', { name: 'Reading rows' });
  await expect(bar).toHaveAttribute('aria-valuenow', '100', { timeout: 30_000 });
  await expect(page.getByText(`Read ${ROWS.toLocaleString('en-GB')} rows`)).toBeVisible();
  const seen = await page.evaluate(() => (window as unknown as { progressSeen: number[] }).progressSeen);
  expect(seen.some((v) => v > 0 && v < 100)).toBe(true);
  await expect(page.getByText('The clean-up checks found 1 point to look at')).toBeVisible();
  // The route page reads what it draws: its view and pages of rows, never the whole route.
  const reads: string[] = [];
  page.on('request', (request) => {
    const url = new URL(request.url());
    if (request.method() === 'GET' && url.pathname.startsWith('/api/routes/'))
      reads.push(`${url.pathname}${url.search}`);
  });
  await page.getByRole('button', { name: 'Save route' }).click();

  await expect(page.getByRole('heading', { name: 'Long walk to the far trough' })).toBeVisible({ timeout: 30_000 });
  const point = SPIKE_ROW + 1;
  const proposal = page.locator(`[data-proposal="${point}"]`);
  await expect(proposal).toContainText('Spike');
  await expect(page.locator('circle[data-marker="proposal"]')).toHaveCount(1);
  await proposal.getByRole('button', { name: new RegExp(`^Point ${point} at`) }).click();
  const row = page.locator(`tr[data-point="${point}"]`);
  await expect(row.getByLabel(`Elevation of point ${point}`)).toHaveValue('340.03');
  expect(reads.some((r) => /\/points\?offset=\d+&limit=50$/.test(r))).toBe(SPIKE_ROW >= 50);
  expect(reads.filter((r) => /^\/api\/routes\/[0-9a-f-]{36}$/.test(r))).toEqual([]);
  await page.screenshot({ path: 'test-results/route-page-long-walk.png', fullPage: true });
  await proposal.getByRole('button', { name: `Accept the change to point ${point}` }).click();
  await expect(page.getByText('found nothing to look at')).toBeVisible();
  await expect(page.locator('circle[data-marker="proposal"]')).toHaveCount(0);
  // Raw and cleaned side by side: 1050 ft on the grade is 320.04 m; the surveyed 1115.6 ft (340.03 m) stays.
  await expect(row.getByLabel(`Elevation of point ${point}`)).toHaveValue('320.04');
  await expect(row.getByRole('cell', { name: '340.03' })).toBeVisible();
  const profile = page.getByRole('img', { name: 'Ground profile of Long walk to the far trough' });
  await expect(profile.locator('path[data-series="raw"]')).toHaveCount(1);
  await expect(profile.locator('path[data-series="cleaned"]')).toHaveCount(1);
  expect(errors).toEqual([]);
});

test('a reviewer sees routes but cannot import or change them, and direct requests are refused', async ({ page }) => {
  const errors = watchConsole(page);
  await signIn(page, 'reviewer@example.test');
  await page.getByRole('link', { name: SPRING_LINE }).click();
  await page.getByRole('navigation', { name: 'Project sections' }).getByRole('link', { name: 'Survey routes' }).click();
  await expect(page.getByRole('heading', { name: 'Survey routes' })).toBeVisible();
  await expect(page.getByRole('link', { name: 'Import a survey file' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Start an empty route' })).toHaveCount(0);

  await page.getByRole('link', { name: 'Upper spring to house' }).click();
  await expect(page.getByRole('heading', { name: 'Upper spring to house' })).toBeVisible();
  await expect(page.getByRole('img', { name: 'Ground profile of Upper spring to house' })).toBeVisible();
  await expect(page.getByRole('alert').filter({ hasText: 'Heights from a consumer GPS' })).toBeVisible();
  await expect(page.locator('[data-proposal="38"]')).toContainText('Spike');
  await expect(
    page.getByRole('button', { name: /Accept|Reject|Reverse|Split|Trim|Join|Delete|Save points|Add point/ }),
  ).toHaveCount(0);
  await expect(page.getByRole('table', { name: 'Route points' }).getByRole('textbox')).toHaveCount(0);

  const projectId = page.url().split('/projects/')[1].split('/')[0];
  const routeId = page.url().split('/').pop()!;
  await page.goto(`/projects/${projectId}/routes/import`);
  await expect(page.getByLabel('Survey file (CSV or GPX, up to 50 MB)')).toHaveCount(0);
  await expect(page.getByRole('status')).toContainText('importing surveys is for surveyors, designers and owners');

  const upload = await page.request.post(`/api/projects/${projectId}/routes/import`, {
    multipart: {
      file: {
        name: 'walk.gpx',
        mimeType: 'application/gpx+xml',
        buffer: readFileSync(path.join(FIXTURES, 'walked-route.gpx')),
      },
      options: JSON.stringify({ format: 'gpx', name: 'Reviewer walk' }),
    },
  });
  expect(upload.status()).toBe(403);
  expect((await upload.json()).error.code).toBe('forbidden');
  const decide = await page.request.post(`/api/routes/${routeId}/cleanup`, {
    data: { reject: [{ kind: 'grade-spike', index: 37, field: 'elevationM', from: 1, to: 2 }] },
  });
  expect(decide.status()).toBe(403);
  await page.goto(`/projects/${projectId}/routes`);
  await expect(page.getByRole('link', { name: 'Reviewer walk' })).toHaveCount(0);
  expect(errors).toEqual([]);
});
