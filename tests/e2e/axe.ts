import AxeBuilder from '@axe-core/playwright';
import type { Page } from '@playwright/test';

/**
 * Waits for every colour change under way to end. A submit button turns from its pale "waiting for the page's
 * script" shade to its working shade with a short fade; checked mid-fade, its white text sits on a colour no
 * person ever reads it on. Endless animations (loading skeletons) are left running.
 */
async function settleTransitions(page: Page): Promise<void> {
  await page.evaluate(async () => {
    const finite = document
      .getAnimations()
      .filter((animation) => Number.isFinite(Number(animation.effect?.getComputedTiming().endTime ?? 0)));
    await Promise.all(finite.map((animation) => animation.finished.catch(() => undefined)));
  });
}

/** Serious and critical findings of axe-core (WCAG 2.1 A and AA rules) on the page as it stands. */
export async function seriousFindings(page: Page): Promise<string[]> {
  await settleTransitions(page);
  const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  return results.violations
    .filter((violation) => violation.impact === 'serious' || violation.impact === 'critical')
    .map(
      (violation) =>
        `${violation.id}: ${violation.help} — ${violation.nodes
          .slice(0, 3)
          .map((node) => node.target.join(' '))
          .join(' | ')}`,
    );
}
