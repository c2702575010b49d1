import { expectNoWcagViolations } from './axe';
import { expect, test } from './fixtures';

test('the sign-in page passes the automatic WCAG 2.2 AA checks', async ({ page }) => {
  await page.goto('/sign-in');
  await expect(page.getByRole('button', { name: 'Sign in' })).toBeVisible();

  await expectNoWcagViolations(page);
});
