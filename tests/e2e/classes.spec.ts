import { createMachine } from '@chuckkey/db/factories';
import { expectNoWcagViolations } from './axe';
import { expect, signIn, signOut, test } from './fixtures';
import { openMachineWeek } from './reserve-fixtures';
import { openShopForEachTest } from './shop-hours';

const DAY_MS = 86_400_000;

/** The shop's calendar date and weekday name of an instant, read through Intl (IANA tz database). */
function shopDay(instant: Date, timeZone: string): { date: string; weekday: string } {
  const date = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(instant);
  const weekday = new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'long' }).format(instant);
  return { date, weekday };
}

test.describe('classes that hold a machine', () => {
  // Classes and reservations both have to fall inside opening hours.
  openShopForEachTest(test);
  // Three sign-ins, a form, a member search, two weeks of an all-day shop and an accessibility scan.
  test.setTimeout(150_000);

  test('an instructor holds a machine for a weekly class of 3 weeks and books a member, who sees it in their reservations; another member is refused an overlapping slot', async ({
    page,
    db,
    shop,
    createUser,
  }) => {
    const suffix = Date.now() % 100_000;
    const instructor = await createUser({ role: 'instructor', first_name: 'Ingrid' });
    const booked = await createUser({ role: 'member', first_name: 'Philippa', last_name: `Lindqvist${suffix}` });
    const other = await createUser({ role: 'member', first_name: 'Casimir' });
    const machineName = `Class lathe ${suffix}`;
    const title = `Lathe basics class ${suffix}`;
    const machine = await createMachine(db, { name: machineName, category: 'lathe', reservable: true });
    // Tomorrow on the shop's calendar: always in the future, inside the 14-day booking horizon, and
    // in next Monday-to-Sunday week when today is Sunday (ISO 8601 weeks start on Monday).
    const tomorrow = shopDay(new Date(Date.now() + DAY_MS), shop.timeZone);
    const tomorrowIsNextWeek = tomorrow.weekday === 'Monday';
    try {
      await signIn(page, instructor.email, instructor.password);
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Teach' }).click();
      await page.getByRole('link', { name: 'Classes' }).click();
      await expect(page.getByRole('heading', { name: 'Classes', level: 1 })).toBeVisible();

      const form = page.getByRole('form', { name: 'Hold a machine for a class' });
      await form.getByRole('combobox', { name: 'Machine' }).selectOption({ label: machineName });
      await form.getByRole('textbox', { name: 'Title' }).fill(title);
      await form.getByLabel('Date of the first class').fill(tomorrow.date);
      await form.getByLabel('Start time').fill('09:00');
      await form.getByRole('combobox', { name: 'Length' }).selectOption({ label: '2 h' });
      await form.getByRole('spinbutton', { name: 'Repeat weekly for (weeks)' }).fill('3');
      // Weekly on the shop's wall clock: the same weekday at 9:00–11:00, three times (RFC 5545 §3.3.10, FREQ=WEEKLY;COUNT=3).
      const preview = form.getByRole('list', { name: 'It will hold' });
      await expect(preview.getByRole('listitem')).toHaveCount(3);
      await expect(preview.getByRole('listitem').first()).toContainText(`${tomorrow.weekday} `);
      await expect(preview.getByRole('listitem').first()).toContainText('9:00–11:00');
      await expectNoWcagViolations(page);
      // Phone first: at 375 CSS px (a common small phone width; common practice, no published
      // source) the form and its preview fit without sideways scrolling.
      const desktop = page.viewportSize();
      await page.setViewportSize({ width: 375, height: 812 });
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
      if (desktop) await page.setViewportSize(desktop);

      await form.getByRole('button', { name: 'Hold the machine' }).click();
      const held = page.getByRole('status').filter({ hasText: 'Machine held' });
      await expect(held).toContainText(`${machineName} is held for ${title}, 3 weeks.`);
      await expect(page.getByRole('list', { name: 'Upcoming classes' })).toContainText(title);
      await held.getByRole('link', { name: 'Open the class to book members' }).click();

      await expect(page.getByRole('heading', { name: title, level: 1 })).toBeVisible();
      await expect(page.getByRole('list', { name: 'Meetings' }).getByRole('listitem')).toHaveCount(3);
      await page.getByRole('searchbox', { name: 'Find a member to book' }).fill(`Lindqvist${suffix}`);
      await page.getByRole('button', { name: `Book Philippa Lindqvist${suffix} into the class` }).click();
      await expect(page.getByRole('status').filter({ hasText: 'is booked into the class' })).toBeVisible();
      await expect(page.getByRole('list', { name: 'Booked members' })).toContainText(`Philippa Lindqvist${suffix}`);
      await expectNoWcagViolations(page);
      await signOut(page);

      await signIn(page, booked.email, booked.password);
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Reserve' }).click();
      const upcoming = page.getByRole('list', { name: 'Upcoming' });
      await expect(upcoming.getByRole('listitem')).toHaveCount(3);
      const first = upcoming.getByRole('listitem').first();
      await expect(first).toContainText('Class');
      await expect(first).toContainText(title);
      await expect(first).toContainText('9:00–11:00');
      // The class is its instructor's to cancel, not the member's.
      await expect(upcoming.getByRole('button', { name: /^Cancel/ })).toHaveCount(0);
      // screens.md: My record lists the member's reservations too.
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'My record' }).click();
      await expect(page.getByRole('list', { name: 'Upcoming' }).getByRole('listitem')).toHaveCount(3);
      await expect(page.getByRole('list', { name: 'Upcoming' }).getByRole('listitem').first()).toContainText(title);
      await signOut(page);

      await signIn(page, other.email, other.password);
      await openMachineWeek(page, machineName, tomorrowIsNextWeek);
      // The class's title is shown when the availability answer names it; the hold is marked either way.
      await expect(page.getByRole('button', { name: new RegExp(`^${tomorrow.weekday} 9:00, held for (the class ${title}|a class)$`) })).toBeVisible();
      // 8:00 for two hours runs into the class's 9:00–11:00: the database's exclusion constraint refuses it.
      await page.getByRole('button', { name: `${tomorrow.weekday} 8:00, free` }).click();
      await page.getByRole('combobox', { name: 'Length' }).selectOption({ label: '2 h' });
      await page.getByRole('button', { name: `Reserve the ${machineName}` }).click();
      const refusal = page.getByRole('alert');
      await expect(refusal).toContainText('That time is already taken');
      await expect(refusal.locator('[data-refusal-code="overlap"]')).toBeVisible();
    } finally {
      await db('reservations').where({ machine_id: machine.id }).delete();
      await db('classes').where({ machine_id: machine.id }).delete();
      await db('machines').where({ id: machine.id }).delete();
      await db('areas').where({ id: machine.area_id }).delete();
    }
  });
});
