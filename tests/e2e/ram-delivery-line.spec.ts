import { expect, test, type Page } from '@playwright/test';
import { signIn, watchConsole } from './fixtures';

const BRACKWATER = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2002';
const WEIR_RAM = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4001';
const DELIVERY_LINE = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a8002';
const FT = 0.3048;
const US_GAL = 0.003785411784;

/**
 * Puts the delivery line back as seeded (typed pump heads, a design flow, no winter choice), whatever an earlier run
 * left.
 */
async function resetDeliveryLine(page: Page) {
  const { line } = await (await page.request.get(`/api/lines/${DELIVERY_LINE}`)).json();
  const design = {
    ...line.design,
    start: { kind: 'pump', outletHeadM: 172.5 },
    flow: { kind: 'design', flowM3s: (0.75 * US_GAL) / 60 },
    settings: { defaultCoverM: 3 * FT, waterTemperatureC: 10 },
  };
  delete design.winter;
  const patch = await page.request.patch(`/api/lines/${DELIVERY_LINE}`, { data: { design } });
  expect(patch.ok()).toBe(true);
}

test('a designer starts the Brackwater delivery line at the Weir ram and sees the pump head and delivered flow, then drains it for winter', async ({
  page,
}) => {
  const errors = watchConsole(page);
  await signIn(page, 'designer@example.test');
  await resetDeliveryLine(page);
  const context = await (await page.request.get(`/api/lines/${DELIVERY_LINE}/site-context`)).json();
  const weir = context.ramOutlets.find((o: { ramSiteId: string }) => o.ramSiteId === WEIR_RAM);
  expect(weir).toBeTruthy();

  await page.goto(`/projects/${BRACKWATER}`);
  await page.getByRole('link', { name: 'Lines' }).click();
  await page.getByRole('link', { name: 'Ram delivery to Harrow Knoll tank' }).click();
  await expect(page.getByTestId('line-answers')).toBeVisible();
  await expect(page.getByTestId('ram-feed')).toHaveCount(0);

  await page.getByLabel('Fed from').selectOption('ram-site');
  await expect(page.getByLabel('Ram site')).toHaveValue(WEIR_RAM);
  const feed = page.getByTestId('ram-feed');
  await expect(feed).toContainText('Weir ram');
  // Head at the pump: the ram's working head in feet; delivered per day in US gallons (the project is US customary).
  await expect(feed).toContainText(`${(weir.workingHeadM / FT).toFixed(1)} ft`);
  const perDay = Math.round((weir.deliveredFlowM3s * 86_400) / US_GAL).toLocaleString('en-US');
  await expect(feed).toContainText(`${perDay} US gal/day`);
  await expect(feed).toContainText('Peak head at the pump, line shut');
  await expect(feed).toContainText('licensed practice');
  // The line now runs at what the ram delivers.
  await expect(page.getByTestId('line-answers')).toContainText(
    `${(weir.deliveredFlowM3s / (US_GAL / 60)).toFixed(1)} US gpm`,
  );
  await expect(page.getByTestId('line-answers')).toContainText('what Weir ram delivers');
  await expect(page.getByTestId('save-state')).toHaveAttribute('data-state', 'saved');
  const saved = (await (await page.request.get(`/api/lines/${DELIVERY_LINE}`)).json()).line;
  expect(saved.design.start).toEqual({ kind: 'ram-site', ramSiteId: WEIR_RAM });
  expect(saved.design.flow).toEqual({ kind: 'pump-delivery' });

  // 3 ft of cover against a 3.5 ft frost depth: warned, drained with one click, drain points listed.
  const winter = page.getByTestId('winter-panel');
  await expect(page.getByTestId('winter-alert')).toBeVisible();
  await expect(winter.getByTestId('winter-warning')).toContainText('Shallower than frost');
  await winter.getByRole('button', { name: 'Drain it for winter' }).click();
  await expect(winter.getByTestId('winter-warning')).toHaveCount(0);
  await expect(page.getByTestId('winter-alert')).toHaveCount(0);
  await expect(winter.getByTestId('drain-points')).toContainText('ch. 148 ft: low point');
  await page.getByTestId('ram-feed').screenshot({ path: 'test-results/ram-delivery-feed.png' });
  await winter.screenshot({ path: 'test-results/ram-delivery-winter.png' });
  await page.screenshot({ path: 'test-results/ram-delivery-line.png', fullPage: true });
  await expect(page.getByTestId('save-state')).toHaveAttribute('data-state', 'saved');
  expect(errors).toEqual([]);
});
