import { mkdtempSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { expect, test, type Page } from '@playwright/test';
import { jpegWithPosition, plainJpeg } from '../support/photo-bytes';
import { seriousFindings } from './axe';
import { signIn, watchConsole } from './fixtures';
import { waitForMail } from './mail';

// The whole of it as a team lives it: an owner invites a surveyor by mail, the surveyor joins,
// imports the walk and uploads its photos, which land at their chainages; a designer submits a
// revision and the reviewer is told by mail, with a link that opens it.
test.describe.configure({ mode: 'serial' });

const run = Date.now().toString(36);
const surveyor = `walk-surveyor-${run}@example.test`;
const password = 'boots by the spring box';
const ROUTE = `Beck walk ${run}`;

// The walk: due north from 54.35° N along 2.95° W, a fix every 0.0009° of latitude (about 100 m).
const START_LAT = 54.35;
const LON = -2.95;
const STEP_DEG = 0.0009;

// By hand (docs/references/core.md §6.1a; WGS84 a and f from NGA TR8350.2): along a meridian a
// step Δφ is M·Δφ, along a parallel a step Δλ is N·cos φ·Δλ.
const A = 6_378_137;
const F = 1 / 298.257223563;
const E2 = F * (2 - F);
const rad = (deg: number) => (deg * Math.PI) / 180;
const meridianRadius = (latDeg: number) => (A * (1 - E2)) / (1 - E2 * Math.sin(rad(latDeg)) ** 2) ** 1.5;
const primeVertical = (latDeg: number) => A / Math.sqrt(1 - E2 * Math.sin(rad(latDeg)) ** 2);
const chainageAt = (latDeg: number) => meridianRadius((START_LAT + latDeg) / 2) * rad(latDeg - START_LAT);

const SPRING = { lat: START_LAT + 2.5 * STEP_DEG, lon: LON + 0.0003 }; // east of the line
const CROSSING = { lat: START_LAT + 7 * STEP_DEG, lon: LON }; // on it
const PICKED_M = 420;

function files(): { csv: string; photos: string[]; notPhoto: string } {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'runnel-walk-'));
  const csv = path.join(dir, 'beck-walk.csv');
  const rows = Array.from({ length: 11 }, (_, i) => `${(START_LAT + i * STEP_DEG).toFixed(4)},${LON},${300 - 3 * i}`);
  writeFileSync(csv, `lat,lon,ele\n${rows.join('\n')}\n`);
  const notPhoto = path.join(dir, 'notes.jpg');
  writeFileSync(notPhoto, 'walked 12 April, gate at the top field left open\n');
  return {
    csv,
    notPhoto,
    photos: [path.join(dir, 'spring-box.jpg'), path.join(dir, 'crossing.jpg'), path.join(dir, 'trough.jpg')],
  };
}

async function makePhotos(paths: string[]) {
  writeFileSync(paths[0], await jpegWithPosition(SPRING.lat, SPRING.lon, '2026:04:12 09:30:00', '#4f7d66'));
  writeFileSync(paths[1], await jpegWithPosition(CROSSING.lat, CROSSING.lon, '2026:04:12 09:52:00', '#6d8fb0'));
  writeFileSync(paths[2], await plainJpeg('#a98a5a'));
}

/** Chainage of each photo mark drawn inside `scope`, by photo id. */
async function markChainages(page: Page, selector: string): Promise<number[]> {
  return page
    .locator(selector)
    .evaluateAll((marks) => marks.map((m) => Number(m.getAttribute('data-chainage-m'))).sort((a, b) => a - b));
}

test('an owner invites a surveyor, who joins, imports the walk and uploads its photos; they land at their chainages on the profile and the plan', async ({
  page,
  browser,
}) => {
  test.setTimeout(150_000);
  const ownerErrors = watchConsole(page);
  await signIn(page, 'owner@example.test');
  await page.goto('/team');
  await page.getByLabel('E-mail address').fill(surveyor);
  await page.getByLabel('Role', { exact: true }).selectOption({ label: 'Surveyor' });
  await page.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByRole('status').filter({ hasText: `Invitation sent to ${surveyor}` })).toBeVisible();
  const invitation = await waitForMail(surveyor, /invites you to Kestrel Hollow Farm/);

  const context = await browser.newContext();
  const field = await context.newPage();
  const errors = watchConsole(field);
  await field.goto(invitation.link);
  await field.getByLabel('Your name').fill('Ailsa Marrick');
  await field.getByLabel('Choose a password').fill(password);
  await field.getByRole('button', { name: 'Create my account and join' }).click();
  await expect(field).toHaveURL(/\/team$/);
  await expect(field.getByRole('row').filter({ hasText: surveyor })).toContainText('Surveyor');

  // The walk's GPS file becomes a route.
  const { csv, photos, notPhoto } = files();
  await makePhotos(photos);
  await field.goto('/projects');
  await field.getByRole('link', { name: 'Kestrel Hollow spring line' }).click();
  await field
    .getByRole('navigation', { name: 'Project sections' })
    .getByRole('link', { name: 'Survey routes' })
    .click();
  await field.getByRole('link', { name: 'Import a survey file' }).click();
  await field.getByLabel('Survey file (CSV or GPX, up to 50 MB)').setInputFiles(csv);
  await field.getByLabel('Route name').fill(ROUTE);
  await field.getByRole('button', { name: 'Read the file with these settings' }).click();
  await field.getByRole('button', { name: 'Save route' }).click();
  await expect(field.getByRole('heading', { name: ROUTE })).toBeVisible({ timeout: 30_000 });

  // The photos of the walk, one with no position (its chainage typed), and a file that is no photo.
  await field.getByLabel('Photos (JPEG, PNG or HEIC)').setInputFiles([...photos, notPhoto]);
  await field.getByLabel('Chainage for photos without a position (m)').fill(String(PICKED_M));
  await field.getByRole('button', { name: 'Add photos' }).click();
  await expect(field.getByRole('status').filter({ hasText: '3 photos added.' })).toBeVisible({ timeout: 30_000 });
  // The refusal sits beside the file field, which points to it.
  const problems = field.getByTestId('photo-upload-problems');
  await expect(problems).toHaveText('“notes.jpg” is not a JPEG, PNG or HEIC image');
  await expect(field.getByLabel('Photos (JPEG, PNG or HEIC)')).toHaveAttribute('aria-describedby', 'photos-problems');
  await expect(field.getByTestId('photo-row')).toHaveCount(3);

  const springM = chainageAt(SPRING.lat);
  const crossingM = chainageAt(CROSSING.lat);
  const offsetM = primeVertical(SPRING.lat) * Math.cos(rad(SPRING.lat)) * rad(0.0003);
  expect(springM).toBeGreaterThan(249);
  expect(springM).toBeLessThan(252);

  // On the route's long profile: one mark per photo at its chainage.
  const profileMarks = '[data-testid="route-profile"] [data-layer="photos"] [data-photo-id]';
  await expect(field.locator(profileMarks)).toHaveCount(3);
  const onProfile = await markChainages(field, profileMarks);
  expect(onProfile[0]).toBeCloseTo(springM, 0);
  expect(onProfile[1]).toBe(PICKED_M);
  expect(onProfile[2]).toBeCloseTo(crossingM, 0);
  // On the plan: the same three.
  const planMarks = '[data-testid="plan-view"] [data-layer="plan-photos"] [data-photo-id]';
  await expect(field.locator(planMarks)).toHaveCount(3);
  expect(await markChainages(field, planMarks)).toEqual(onProfile);

  // Pointing at the first mark shows its thumbnail, time and distance off the line.
  await field.getByTestId('route-profile').getByRole('button', { name: 'Photo 1: spring-box.jpg' }).hover();
  const card = field.getByTestId('photo-card');
  await expect(card).toBeVisible();
  await expect(card).toContainText(`Photo 1 · ${springM.toFixed(1)} m`);
  await expect(card).toContainText('Taken 2026-04-12 09:30');
  await expect(card).toContainText(`${offsetM.toFixed(1)} m off the line`);
  await expect(card.getByRole('img')).toHaveJSProperty('complete', true);
  expect(await card.getByRole('img').evaluate((img: HTMLImageElement) => img.naturalWidth)).toBeGreaterThan(0);
  await field.screenshot({ path: 'test-results/site-photos-route.png', fullPage: true });
  // The marks, the card and the photo table pass the accessibility checks every page passes.
  expect(await seriousFindings(field)).toEqual([]);

  // The one without a position is listed at the chainage typed, picked by hand.
  const trough = field.getByTestId('photo-row').filter({ hasText: 'trough.jpg' });
  await expect(trough).toContainText('picked by hand');
  await expect(trough.getByLabel('Chainage of trough.jpg')).toHaveValue('420');
  // Captioned and chosen for the report, it stays so.
  await field.getByLabel('Caption of spring-box.jpg').fill('Spring box lid, moss on the north side');
  await field.getByLabel('Caption of spring-box.jpg').press('Enter');
  // The box shows the saved state once the server has it (a busy server may take a moment), so
  // click and wait rather than expect the state to change on the click itself.
  await field.getByLabel('Show spring-box.jpg in the report').click();
  await expect(field.getByLabel('Show spring-box.jpg in the report')).toBeChecked({ timeout: 15_000 });
  await field.reload();
  // While the page streams in, a hidden copy of the photo list can sit beside the shown one: read the shown one.
  const shown = field.locator('main').filter({ visible: true });
  await expect(shown.getByLabel('Show spring-box.jpg in the report').filter({ visible: true })).toBeChecked();
  await expect(shown.getByLabel('Caption of spring-box.jpg').filter({ visible: true })).toHaveValue(
    'Spring box lid, moss on the north side',
  );
  await field
    .getByTestId('route-profile')
    .getByRole('button', { name: 'Photo 1: Spring box lid, moss on the north side' })
    .hover();
  await expect(field.getByTestId('photo-card')).toContainText('Spring box lid, moss on the north side');
  await context.close();
  expect(errors.filter((e) => !e.includes('415 (Unsupported Media Type)'))).toEqual([]);

  // A line laid along the walk shows the same photos on its long profile and its plan.
  await page.goto('/projects/6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001/lines');
  await page.getByLabel('Line name').fill(`Beck line ${run}`);
  const routeChoice = await page
    .getByLabel('Follows the route')
    .locator('option', { hasText: ROUTE })
    .getAttribute('value');
  await page.getByLabel('Follows the route').selectOption(routeChoice!);
  await page.getByRole('button', { name: 'Start line' }).click();
  await expect(page).toHaveURL(/\/lines\/[0-9a-f-]{36}$/);
  const lineId = page.url().split('/').pop()!;
  const lineMarks = '[data-testid="profile-chart"] [data-layer="photos"] [data-photo-id]';
  await expect(page.locator(lineMarks).filter({ visible: true })).toHaveCount(3);
  const onLine = await page
    .locator(lineMarks)
    .filter({ visible: true })
    .evaluateAll((marks) => marks.map((m) => Number(m.getAttribute('data-chainage-m'))));
  expect(onLine).toEqual(onProfile);
  await expect(
    page.locator('[data-testid="plan-view"] [data-layer="plan-photos"] [data-photo-id]').filter({ visible: true }),
  ).toHaveCount(3);
  await page
    .getByTestId('profile-chart')
    .filter({ visible: true })
    .getByRole('button', { name: 'Photo 3: crossing.jpg' })
    .click();
  await expect(page.getByTestId('photo-card').filter({ visible: true })).toContainText(
    `Photo 3 · ${crossingM.toFixed(1)} m`,
  );
  await expect(page.getByTestId('photo-card').filter({ visible: true })).toContainText('0.0 m off the line');
  await page.screenshot({ path: 'test-results/site-photos-line.png', fullPage: true });
  expect(await seriousFindings(page)).toEqual([]);
  // The line was only for looking: removed, so the demo's revisions stay as they were.
  expect((await page.request.delete(`/api/lines/${lineId}`)).status()).toBe(204);
  expect(ownerErrors).toEqual([]);
});

test('a designer submits a revision for review; the reviewer is told by mail, and the link opens that revision', async ({
  browser,
}) => {
  test.setTimeout(120_000);
  const designerContext = await browser.newContext();
  const designer = await designerContext.newPage();
  const errors = watchConsole(designer);
  await signIn(designer, 'designer@example.test');
  await designer.goto('/projects/6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001/reviews');
  const note = `Photos of the beck walk in; ready for a look ${run}`;
  await designer.getByLabel('What changed (note for the reviewer)').filter({ visible: true }).fill(note);
  await designer.getByRole('button', { name: 'Make a revision' }).click();
  const made = designer.getByRole('status').filter({ hasText: /Revision \d+ made and submitted for review/ });
  await expect(made).toBeVisible();
  const number = Number(/Revision (\d+)/.exec((await made.textContent())!)![1]);
  await designerContext.close();

  const mail = await waitForMail(
    'reviewer@example.test',
    new RegExp(`Kestrel Hollow spring line: .* submitted revision ${number} for review`),
  );
  expect(mail.text).toContain(`submitted revision ${number} for review`);
  const open = mail.links[0];
  expect(open).toMatch(/^\/projects\/6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001\/reviews\/[0-9a-f-]{36}$/);

  const reviewerContext = await browser.newContext();
  const reviewer = await reviewerContext.newPage();
  const reviewerErrors = watchConsole(reviewer);
  await signIn(reviewer, 'reviewer@example.test');
  await reviewer.goto(open);
  await expect(reviewer.getByRole('heading', { name: new RegExp(`^Revision ${number}\\b`) })).toBeVisible();
  await expect(reviewer.getByText(note).filter({ visible: true }).first()).toBeVisible();
  await expect(reviewer.getByTestId('revision-status').filter({ visible: true })).toHaveAttribute(
    'data-status',
    'submitted',
  );
  await expect(reviewer.getByRole('button', { name: 'Approve' })).toBeVisible();
  await reviewer.screenshot({ path: 'test-results/review-mail-link.png', fullPage: true });
  await reviewerContext.close();
  expect(errors).toEqual([]);
  expect(reviewerErrors).toEqual([]);
});
