import AxeBuilder from '@axe-core/playwright';
import { expect, type Page } from '@playwright/test';

// WCAG 2.2 level A and AA, as axe-core tags the success criteria it can check automatically.
const wcag22aa = ['wcag2a', 'wcag2aa', 'wcag21aa', 'wcag22aa'];

export async function expectNoWcagViolations(page: Page): Promise<void> {
  const results = await new AxeBuilder({ page }).withTags(wcag22aa).analyze();
  expect(results.violations).toEqual([]);
}
