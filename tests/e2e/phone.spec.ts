import { expect, test, type Page } from '@playwright/test';
import { signIn } from './fixtures';

// Runs in the "phone" project (390 px wide, touch): the pages used on site must fit the screen.
const PROJECT = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001';
const DEMO_LINE = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4001';

/** Elements whose right edge passes the viewport while the page itself should not scroll sideways. */
async function overflow(page: Page): Promise<{ pageWidth: number; viewport: number; widest: string[] }> {
  return page.evaluate(() => {
    const viewport = window.innerWidth;
    const widest: string[] = [];
    for (const element of Array.from(document.querySelectorAll('body *'))) {
      const box = element.getBoundingClientRect();
      if (box.width === 0 || box.right <= viewport + 1) continue;
      // Content inside a frame that scrolls on its own is fine: only what widens the page counts.
      let inside = element.parentElement;
      let clipped = false;
      while (inside && inside !== document.body) {
        const style = getComputedStyle(inside);
        if (/(auto|scroll|hidden)/.test(style.overflowX)) {
          clipped = true;
          break;
        }
        inside = inside.parentElement;
      }
      if (!clipped)
        widest.push(
          `${element.tagName.toLowerCase()}${element.id ? `#${element.id}` : ''}.${String(element.className).slice(0, 60)} → ${Math.round(box.right)} px`,
        );
    }
    return { pageWidth: document.documentElement.scrollWidth, viewport, widest: widest.slice(0, 5) };
  });
}

test('the route, line, lift and network pages fit a 390 px phone: nothing widens the page', async ({ page }) => {
  test.setTimeout(180_000);
  await signIn(page, 'designer@example.test');
  await page.goto(`/projects/${PROJECT}/routes`);
  const hrefs = await page
    .locator('a[href]')
    .evaluateAll((links) => links.map((link) => link.getAttribute('href') ?? ''));
  const routePage = hrefs.find((href) => new RegExp(`/projects/${PROJECT}/routes/[0-9a-f-]{36}$`).test(href));
  expect(routePage).toBeTruthy();

  // Each page with what must have drawn before its width is measured.
  const pages: [string, string][] = [
    [`/projects/${PROJECT}`, 'main'],
    [routePage as string, 'svg'],
    [`/projects/${PROJECT}/lines/${DEMO_LINE}`, '[data-testid="profile-chart"] svg'],
    [`/projects/${PROJECT}/lift`, 'main form, main table'],
    [`/projects/${PROJECT}/network`, 'main svg'],
  ];
  const problems: Record<string, unknown> = {};
  for (const [path, drawn] of pages) {
    await page.goto(path);
    await expect(page.locator(drawn).filter({ visible: true }).first()).toBeVisible();
    await page.waitForLoadState('networkidle');
    const found = await overflow(page);
    if (found.pageWidth > found.viewport || found.widest.length > 0) problems[path] = found;
  }
  expect(problems).toEqual({});

  // The long profile fits the width and keeps its drawing inside its own frame.
  await page.goto(`/projects/${PROJECT}/lines/${DEMO_LINE}`);
  const chart = page.getByTestId('profile-chart').filter({ visible: true }).first();
  await expect(chart).toBeVisible();
  const box = await chart.boundingBox();
  expect(box && box.x >= 0 && box.x + box.width <= 391).toBe(true);
});
