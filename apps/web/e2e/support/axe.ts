import AxeBuilder from '@axe-core/playwright';
import type { Page } from '@playwright/test';

/** axe's findings on the page as it stands, as "rule: the elements" lines, so a failure says what to fix. */
export async function axeViolations(page: Page) {
  const results = await new AxeBuilder({ page }).analyze();
  return results.violations.map(
    (violation) =>
      `${violation.id}: ${violation.nodes.map((node) => `${node.html.slice(0, 120)} (${node.failureSummary})`).join(', ')}`,
  );
}
