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

test.describe('board', () => {
  for (const viewport of [
    { width: 1920, height: 1080 },
    { width: 1280, height: 720 },
  ]) {
    test(`at ${viewport.width}×${viewport.height} the board fits the screen without scrolling`, async ({ page, shop }) => {
      await page.setViewportSize(viewport);
      await page.goto('/kiosk/board');
      await expect(page.getByRole('heading', { level: 1, name: shop.name })).toBeVisible();
      await expect(page.getByText(/once an admin pairs this board/)).toBeVisible();

      const size = await page.evaluate(() => ({
        scrollHeight: document.documentElement.scrollHeight,
        scrollWidth: document.documentElement.scrollWidth,
        innerHeight: window.innerHeight,
        innerWidth: window.innerWidth,
      }));
      expect(size.scrollHeight).toBeLessThanOrEqual(size.innerHeight);
      expect(size.scrollWidth).toBeLessThanOrEqual(size.innerWidth);
    });
  }

  test.describe('on a screen set to another time zone', () => {
    // UTC+14, a zone no shop in the tests uses, so a clock that followed the screen would show.
    const screenZone = 'Pacific/Kiritimati';
    test.use({ timezoneId: screenZone });

    test('the board’s clock shows the time in the shop’s time zone', async ({ page, shop }) => {
      const instant = new Date('2027-03-05T15:42:00Z');
      const clock = (timeZone: string) =>
        new Intl.DateTimeFormat('en', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone }).format(instant);
      expect(clock(shop.timeZone), 'the shop and the screen are in different zones').not.toBe(clock(screenZone));
      await page.clock.setFixedTime(instant);

      await page.goto('/kiosk/board');

      await expect(page.getByRole('banner').getByText(clock(shop.timeZone), { exact: true })).toBeVisible();
    });
  });

  test('the board passes the automatic WCAG 2.2 AA checks', async ({ page, shop }) => {
    await page.goto('/kiosk/board');
    await expect(page.getByRole('heading', { level: 1, name: shop.name })).toBeVisible();

    await expectNoWcagViolations(page);
  });
});
