import { expectNoWcagViolations } from './axe';
import { expect, test } from './fixtures';

test.describe('station', () => {
  test('the kiosk address opens the station', async ({ page }) => {
    await page.goto('/kiosk/');

    await expect(page).toHaveURL(/\/kiosk\/station$/);
  });

  test('an unpaired station shows the shop name, says it waits for pairing and puts the shop’s rules first', async ({
    page,
    shop,
  }) => {
    await page.goto('/kiosk/station');

    await expect(page.getByRole('heading', { level: 1, name: shop.name })).toBeVisible();
    await expect(page.getByText(/once an admin pairs it/)).toBeVisible();
    await expect(page.getByText(/shop’s own rules/)).toBeVisible();
    await expect(page.getByRole('button')).toHaveCount(0);
  });

  test('the station passes the automatic WCAG 2.2 AA checks', async ({ page, shop }) => {
    await page.goto('/kiosk/station');
    await expect(page.getByRole('heading', { level: 1, name: shop.name })).toBeVisible();

    await expectNoWcagViolations(page);
  });
});
