import fs from 'node:fs';
import { PDFParse } from 'pdf-parse';
import { expect, test, type Page } from '@playwright/test';
import { signIn, watchConsole } from './fixtures';

const PROJECT = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001';
const DEMO_LINE = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4001';
const LINE_URL = `/projects/${PROJECT}/lines/${DEMO_LINE}`;

/** Puts the demo line back as seeded (no devices), whatever an earlier run left. */
async function resetDemoLine(page: Page) {
  const res = await page.request.get(`/api/lines/${DEMO_LINE}`);
  expect(res.ok()).toBe(true);
  const { line } = await res.json();
  const patch = await page.request.patch(`/api/lines/${DEMO_LINE}`, {
    data: { design: { ...line.design, devices: [] } },
  });
  expect(patch.ok()).toBe(true);
}

test('a designer sees the over-pressure, applies the suggested break-pressure tank, and downloads the report', async ({
  page,
}) => {
  const errors = watchConsole(page);
  await signIn(page, 'designer@example.test');
  await resetDemoLine(page);
  await page.goto(`/projects/${PROJECT}`);
  await page.getByRole('link', { name: 'Lines' }).click();
  await page.getByRole('link', { name: 'Spring box to house', exact: true }).click();
  await expect(page).toHaveURL(new RegExp(LINE_URL));

  const overPressure = page.getByTestId('warnings').locator('li[data-code="static-over-rating"]');
  await expect(overPressure).toHaveCount(1);
  await expect(overPressure).toContainText('Over-pressure with the line shut');
  await expect(page.getByTestId('line-answers')).toContainText('Worst static pressure');

  // Clicking the warning outlines its range on the profile.
  await overPressure.getByRole('button', { name: /Over-pressure/ }).click();
  await expect(page.getByTestId('profile-chart').locator('[data-layer="highlight"]')).toHaveCount(1);

  await overPressure.getByTestId('apply-fix').click();
  await expect(page.getByTestId('warnings').locator('li[data-code="static-over-rating"]')).toHaveCount(0);
  await expect(
    page.getByTestId('profile-chart').locator('[data-layer="devices"] [data-kind="break-pressure-tank"]'),
  ).toHaveCount(1);
  await expect(page.getByTestId('save-state')).toHaveAttribute('data-state', 'saved');

  // The saved line now carries the tank.
  const saved = await (await page.request.get(`/api/lines/${DEMO_LINE}`)).json();
  expect(saved.line.design.devices.map((d: { kind: string }) => d.kind)).toEqual(['break-pressure-tank']);

  const [download] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('link', { name: 'PDF report' }).click(),
  ]);
  // The working copy is not a revision: its report says so in its name (and is marked not for construction).
  expect(download.suggestedFilename()).toBe('spring-box-to-house-working-copy.pdf');
  const file = await download.path();
  expect(fs.readFileSync(file!).subarray(0, 5).toString()).toBe('%PDF-');

  // One click back: the tank goes and the warning returns.
  await page.getByRole('button', { name: /^Undo: add a break-pressure tank/ }).click();
  await expect(page.getByTestId('warnings').locator('li[data-code="static-over-rating"]')).toHaveCount(1);
  await expect(page.getByTestId('save-state')).toHaveAttribute('data-state', 'saved');
  expect(errors).toEqual([]);
});

test('hovering the profile reads the values there and marks the same place on the plan', async ({ page }) => {
  await signIn(page, 'designer@example.test');
  await page.goto(LINE_URL);
  await page.waitForLoadState('networkidle');
  const capture = page.getByTestId('profile-capture');
  // One chart once the page has settled (a second copy was seen for a moment while data arrived).
  await expect(capture).toHaveCount(1);
  await capture.scrollIntoViewIfNeeded();
  const box = (await capture.boundingBox())!;
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  const readout = page.getByTestId('profile-readout');
  await expect(readout).toContainText('Chainage');
  await expect(readout).toContainText(/Static pressure.*m \(.*kPa\)/);
  await expect(page.getByTestId('plan-marker')).toHaveCount(1);
});

// The client (viewer) sees approved revisions only; a reviewer reads the working copy without edit controls.
test('a reviewer can view and export the working copy but not change it', async ({ page }) => {
  const errors = watchConsole(page);
  await signIn(page, 'reviewer@example.test');
  await page.goto(LINE_URL);
  // The router can keep an earlier state of the page mounted but hidden: check the copy people see.
  await expect(page.getByTestId('warnings').filter({ visible: true })).toHaveCount(1);
  await expect(page.getByTestId('apply-fix')).toHaveCount(0);
  await expect(page.getByRole('button', { name: /^Undo/ })).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Place by clicking' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Save details' })).toHaveCount(0);
  await expect(page.getByLabel('Water level (m)')).toBeDisabled();

  // The exaggeration the screen prints is the one both exports draw and print: first as found (auto), then set to ×10.
  const screenWords = () =>
    page.getByTestId('profile-chart').filter({ visible: true }).locator('[data-role="exaggeration"]').textContent();
  const exportedWords = async () => {
    const [svg] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Profile as SVG' }).click(),
    ]);
    const svgText = fs.readFileSync((await svg.path())!, 'utf8');
    expect(svgText).toContain('<svg xmlns="http://www.w3.org/2000/svg"');
    expect(svgText).toContain('data-layer="grade"');
    return /data-role="exaggeration"[^>]*>([^<]*)</.exec(svgText)?.[1];
  };
  const pdfText = async () => {
    const [pdf] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'PDF report' }).click(),
    ]);
    const bytes = fs.readFileSync((await pdf.path())!);
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    const parser = new PDFParse({ data: new Uint8Array(bytes) });
    const text = (await parser.getText()).text.replace(/\s+/g, ' ');
    await parser.destroy();
    return text;
  };
  const auto = await screenWords();
  expect(auto).toMatch(/^Vertical exaggeration ×[\d.]+$/);
  expect(await exportedWords()).toBe(auto);
  expect(await pdfText()).toContain(auto!);
  await page.getByLabel('Vertical exaggeration').filter({ visible: true }).selectOption('10');
  await expect(
    page.getByTestId('profile-chart').filter({ visible: true }).locator('[data-role="exaggeration"]'),
  ).toHaveText('Vertical exaggeration ×10');
  expect(await exportedWords()).toBe('Vertical exaggeration ×10');
  expect(await page.getByRole('link', { name: 'PDF report' }).getAttribute('href')).toBe(
    `/api/lines/${DEMO_LINE}/report?exaggeration=10`,
  );
  expect(await pdfText()).toContain('Vertical exaggeration ×10');
  await page
    .getByTestId('profile-chart')
    .filter({ visible: true })
    .screenshot({ path: 'test-results/line-exaggeration-x10.png' });

  const res = await page.request.patch(`/api/lines/${DEMO_LINE}`, { data: { notes: 'Taken over' } });
  expect(res.status()).toBe(403);
  expect(errors).toEqual([]);
});
