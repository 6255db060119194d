import { expect, test } from '@playwright/test';
import { signIn, watchConsole } from './fixtures';

const PROJECT = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a2001';
const DEMO_LINE = '6f1c1e52-3a57-4c38-9b0e-0d5b1c7a4001';
const LINE_URL = `/projects/${PROJECT}/lines/${DEMO_LINE}`;

test('the flow card never shows a flow the line cannot carry, and names the friction formula', async ({ page }) => {
  const errors = watchConsole(page);
  await signIn(page, 'designer@example.test');
  const { line } = await (await page.request.get(`/api/lines/${DEMO_LINE}`)).json();
  const original = line.design;
  try {
    // Ask for a fifth more than this gravity line carries (about 2 L/s).
    const patch = await page.request.patch(`/api/lines/${DEMO_LINE}`, { data: { design: { ...original, devices: [], flow: { kind: 'design', flowM3s: 0.0024 } } } });
    expect(patch.ok()).toBe(true);
    await page.goto(LINE_URL);
    const answers = page.getByTestId('line-answers').filter({ visible: true });
    await expect(answers).toContainText('Flow delivered');
    await expect(answers).toContainText(/at most [\d.,]+ L\/s/);
    await expect(answers).toContainText('is more than this line carries by gravity');
    await expect(answers.getByTestId('friction-basis')).toContainText('Darcy-Weisbach with the Colebrook friction factor');
    // One cause, one danger: the outlet item carries the pipe change that works.
    const short = page.getByTestId('warnings').filter({ visible: true }).locator('li[data-code="residual-below-target"]');
    await expect(short).toHaveCount(1);
    await expect(short.getByTestId('apply-fix')).toContainText(/^Use .+ on stretch \d/);
    await page.screenshot({ path: test.info().outputPath('line-over-capacity.png'), fullPage: true });
  } finally {
    const back = await page.request.patch(`/api/lines/${DEMO_LINE}`, { data: { design: original } });
    expect(back.ok()).toBe(true);
  }
  expect(errors).toEqual([]);
});
