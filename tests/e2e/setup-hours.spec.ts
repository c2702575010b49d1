import { expectNoWcagViolations } from './axe';
import { expect, test } from './fixtures';
import { openAllWeek, restoreHours } from './shop-hours';

test.use({ locale: 'en-GB' });

const DAY = 86_400_000;

/** The weekday name `days` from now in the shop's calendar. */
function weekdayIn(timeZone: string, days: number): string {
  return new Intl.DateTimeFormat('en-GB', { weekday: 'long', timeZone }).format(Date.now() + days * DAY);
}

test.describe('shop hours under Setup', () => {
  test('an admin gives a day two openings, is told of an overlap under the field, adds a closure, and sees both listed', async ({
    page,
    db,
    shop,
    signInAs,
  }) => {
    // It may first wait for a station test in another worker to give the hours back.
    test.slow();
    const saved = await openAllWeek(db);
    try {
      await signInAs('admin');
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Setup' }).click();
      await page.getByRole('navigation', { name: 'Setup' }).getByRole('link', { name: 'Shop hours' }).click();
      await expect(page.getByRole('heading', { level: 1, name: 'Shop hours' })).toBeVisible();
      await expect(page.getByText(`in its time zone, ${shop.timeZone}`)).toBeVisible();
      await expect(page.getByText('Open now')).toBeVisible();

      // Two days ahead in the shop's calendar: a station test running beside this one still finds today and tomorrow open.
      const day = weekdayIn(shop.timeZone, 2);
      const group = page.getByRole('group', { name: day });
      await group.getByRole('textbox', { name: `Opens on ${day}, opening 1` }).fill('10:00');
      await group.getByRole('textbox', { name: `Closes on ${day}, opening 1` }).fill('14:00');
      await group.getByRole('button', { name: `Add another opening on ${day}` }).click();
      const secondOpens = group.getByRole('textbox', { name: `Opens on ${day}, opening 2` });
      await expect(secondOpens).toBeFocused();
      await secondOpens.fill('13:00');
      await group.getByRole('textbox', { name: `Closes on ${day}, opening 2` }).fill('21:00');
      await page.getByRole('button', { name: 'Save opening hours' }).click();

      await expect(secondOpens).toHaveAttribute('aria-invalid', 'true');
      await expect(secondOpens).toHaveAccessibleDescription(`Overlaps 10:00–14:00 on ${day}.`);

      await secondOpens.fill('17:00');
      await page.getByRole('button', { name: 'Save opening hours' }).click();
      await expect(page.getByRole('status').filter({ hasText: 'Opening hours saved.' })).toBeFocused();

      await page.reload();
      await expect(group.getByRole('textbox', { name: `Opens on ${day}, opening 1` })).toHaveValue('10:00');
      await expect(group.getByRole('textbox', { name: `Closes on ${day}, opening 1` })).toHaveValue('14:00');
      await expect(group.getByRole('textbox', { name: `Opens on ${day}, opening 2` })).toHaveValue('17:00');
      await expect(group.getByRole('textbox', { name: `Closes on ${day}, opening 2` })).toHaveValue('21:00');
      const stored = await db('shop_hours').select(db.raw(`to_char(opens_at, 'HH24:MI') as opens, to_char(closes_at, 'HH24:MI') as closes`)).where('opens_at', '>', '00:00').orderBy('opens_at');
      expect(stored).toEqual([
        { opens: '10:00', closes: '14:00' },
        { opens: '17:00', closes: '21:00' },
      ]);

      // A closure next year, far from today, so no station test beside this one meets it.
      const year = new Date().getFullYear() + 1;
      const form = page.getByRole('form', { name: 'Add a closure' });
      await form.getByLabel('First day', { exact: true }).fill(`${year}-12-24`);
      await form.getByLabel('Last day', { exact: true }).fill(`${year}-12-26`);
      await form.getByLabel('Reason', { exact: true }).fill('Winter deep clean');
      await form.getByRole('button', { name: 'Add closure' }).click();

      await expect(page.getByRole('status').filter({ hasText: 'Closure added: Winter deep clean.' })).toBeFocused();
      const listed = page.getByRole('list', { name: 'Closures' }).getByRole('listitem').filter({ hasText: 'Winter deep clean' });
      // en-GB dates; ICU may put thin spaces around the range's dash.
      await expect(listed).toContainText(new RegExp(`24\\sDec\\s–\\s\\w+,\\s26\\sDec\\s${year}`));
      // WCAG 2.2 level A and AA via axe-core (tags wcag2a, wcag2aa, wcag21aa, wcag22aa), with the hours and a closure on screen.
      await expectNoWcagViolations(page);

      await listed.getByRole('button', { name: 'Remove the closure Winter deep clean' }).click();
      const confirm = page.getByRole('dialog', { name: 'Remove the closure “Winter deep clean”?' });
      await confirm.getByRole('button', { name: 'Remove closure' }).click();
      await expect(page.getByRole('status').filter({ hasText: 'Closure removed: Winter deep clean.' })).toBeFocused();
      await expect(page.getByRole('list', { name: 'Closures' })).toHaveCount(0);
    } finally {
      await restoreHours(db, saved);
    }
  });

  test('an instructor cannot open Shop hours, and the API refuses them a change', async ({ page, signInAs }) => {
    await signInAs('instructor');

    await page.goto('/setup/hours');

    await expect(page.getByRole('heading', { name: /don['’]t have access to Setup/ })).toBeVisible();
    const { token } = (await (await page.request.get('/api/auth/csrf')).json()) as { token: string };
    // A body the server could never save: were the permission missing, nothing would change either.
    expect((await page.request.put('/api/shop/hours', { headers: { 'x-csrf-token': token }, data: { weekly: 'none' } })).status()).toBe(403);
  });
});
