import AxeBuilder from '@axe-core/playwright';
import type { Page } from '@playwright/test';

/**
 * Brings the colour transitions under way to their end: a button that has just become live fades from its
 * disabled look, and axe reading it halfway measures a colour the screen only shows for a moment. They are
 * finished rather than awaited, since a page the browser is not drawing (another page in front) does not
 * advance them. Endless animations (a spinner) are left alone.
 */
async function endTransitions(page: Page) {
  await page.evaluate(() => {
    for (const animation of document.getAnimations())
      if (animation.effect?.getComputedTiming().endTime !== Infinity) animation.finish();
  });
}

/**
 * axe's findings on the page with its transitions at their end, as "rule: the elements" lines, so a failure
 * says what to fix; `rules` narrows the check to those rules.
 */
export async function axeViolations(page: Page, rules?: string[]) {
  await endTransitions(page);
  const builder = new AxeBuilder({ page });
  const results = await (rules ? builder.withRules(rules) : builder).analyze();
  return results.violations.map(
    (violation) =>
      `${violation.id}: ${violation.nodes.map((node) => `${node.html.slice(0, 120)} (${node.failureSummary})`).join(', ')}`,
  );
}
