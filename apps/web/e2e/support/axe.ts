import AxeBuilder from '@axe-core/playwright';
import type { Page } from '@playwright/test';

/**
 * Waits for the colour transitions under way to end: a button that has just become live fades from its
 * disabled look, and axe reading it halfway measures a colour the screen only shows for a moment.
 * Endless animations (a spinner) are left alone; they would never end.
 */
async function transitionsEnded(page: Page) {
  await page.evaluate(() =>
    Promise.all(
      document
        .getAnimations()
        .filter((animation) => animation.effect?.getComputedTiming().endTime !== Infinity)
        .map((animation) => animation.finished.catch(() => undefined)),
    ),
  );
}

/**
 * axe's findings on the page once its transitions have ended, as "rule: the elements" lines, so a failure
 * says what to fix; `rules` narrows the check to those rules.
 */
export async function axeViolations(page: Page, rules?: string[]) {
  await transitionsEnded(page);
  const builder = new AxeBuilder({ page });
  const results = await (rules ? builder.withRules(rules) : builder).analyze();
  return results.violations.map(
    (violation) =>
      `${violation.id}: ${violation.nodes.map((node) => `${node.html.slice(0, 120)} (${node.failureSummary})`).join(', ')}`,
  );
}
