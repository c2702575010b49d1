import { createMachine } from '@chuckkey/db/factories';
import { expectNoWcagViolations } from './axe';
import { expect, signIn, signOut, test } from './fixtures';
import { comingSaturdayIsNextWeek, openMachineWeek } from './reserve-fixtures';
import { openShopForEachTest } from './shop-hours';

test.describe('reserving machine time from home', () => {
  // The reservation must fall inside opening hours; the database may be the demo shop's, with its own.
  openShopForEachTest(test);
  // Two sign-ins, two weeks of an all-day shop (96 slots a day) and an accessibility scan of them.
  test.setTimeout(120_000);

  test('a member reserves a machine on the coming Saturday and sees it in their list; a second member is refused an overlapping time with the reason', async ({
    page,
    db,
    shop,
    createUser,
  }) => {
    const first = await createUser({ role: 'member', first_name: 'Marisol' });
    const second = await createUser({ role: 'member', first_name: 'Teodor' });
    const machineName = `Bench MIG welder ${Date.now() % 100_000}`;
    const machine = await createMachine(db, { name: machineName, category: 'mig_welder', reservable: true });
    try {
      await signIn(page, first.email, first.password);
      await openMachineWeek(page, machineName, comingSaturdayIsNextWeek(shop.timeZone));

      await page.getByRole('button', { name: 'Saturday 9:00, free' }).click();
      const form = page.getByRole('list', { name: 'Rules for this machine' });
      await expect(form).toContainText('At most 2 h at a time.');
      await expect(form).toContainText('6 h left that week');
      await page.getByRole('combobox', { name: 'Length' }).selectOption({ label: '2 h' });
      await page.getByRole('button', { name: `Reserve the ${machineName}` }).click();
      await expect(page.getByRole('status').filter({ hasText: `The ${machineName} is yours on Saturday` })).toContainText('9:00–11:00');

      const upcoming = page.getByRole('list', { name: 'Upcoming' });
      await expect(upcoming).toContainText(machineName);
      await expect(upcoming).toContainText(/Saturday \d+ \w+, 9:00–11:00/);
      await expect(page.getByRole('button', { name: 'Saturday 9:00, taken' })).toBeVisible();

      await signOut(page);
      await signIn(page, second.email, second.password);
      await openMachineWeek(page, machineName, comingSaturdayIsNextWeek(shop.timeZone));

      // 8:00 for two hours runs into the first member's 9:00–11:00: the database's exclusion constraint refuses it.
      await page.getByRole('button', { name: 'Saturday 8:00, free' }).click();
      await page.getByRole('combobox', { name: 'Length' }).selectOption({ label: '2 h' });
      await page.getByRole('button', { name: `Reserve the ${machineName}` }).click();
      const refusal = page.getByRole('alert');
      await expect(refusal).toContainText('That time is already taken');
      await expect(refusal).toContainText(`The ${machineName} is already reserved for part of that time. Choose another slot.`);
      await expect(page.getByRole('list', { name: 'Upcoming' })).toHaveCount(0);
      await expectNoWcagViolations(page);
    } finally {
      await db('reservations').where({ machine_id: machine.id }).delete();
      await db('machines').where({ id: machine.id }).delete();
      await db('areas').where({ id: machine.area_id }).delete();
    }
  });

  test('a member who is done early releases the rest of a running reservation from My record, and the time is free again', async ({ page, db, createUser }) => {
    const member = await createUser({ role: 'member', first_name: 'Anselm' });
    const machineName = `Cold saw ${Date.now() % 100_000}`;
    const machine = await createMachine(db, { name: machineName, category: 'band_saw', reservable: true });
    try {
      // Checked in a quarter of an hour ago, an hour and three quarters still to run.
      const start = new Date(Date.now() - 15 * 60_000);
      const end = new Date(start.getTime() + 2 * 3_600_000);
      const [reservation] = await db('reservations')
        .insert({ machine_id: machine.id, member_id: member.id, starts_at: start, ends_at: end, blocked_until: end, status: 'checked_in', checked_in_at: start })
        .returning<{ id: string }[]>('id');

      await signIn(page, member.email, member.password);
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'My record' }).click();
      await page.getByRole('button', { name: new RegExp(`^I'm done, release the rest of the ${machineName}`) }).click();
      const dialog = page.getByRole('dialog', { name: 'Release the rest of this reservation?' });
      await expect(dialog).toContainText('goes back to everyone');
      await dialog.getByRole('button', { name: 'Release the rest' }).click();
      await expect(dialog).toHaveCount(0);

      await expect(page.getByText('Freed for others').first()).toBeVisible();
      const stored = await db('reservations').first('status', 'released_at').where({ id: reservation!.id });
      expect(stored.status).toBe('released');
      expect(stored.released_at).not.toBeNull();
      await expect(page.getByRole('button', { name: new RegExp(`^I'm done, release the rest of the ${machineName}`) })).toHaveCount(0);
    } finally {
      await db('audit_log').where({ entity_id: machine.id }).orWhere({ member_id: member.id }).delete();
      await db('reservations').where({ machine_id: machine.id }).delete();
      await db('machines').where({ id: machine.id }).delete();
      await db('areas').where({ id: machine.area_id }).delete();
    }
  });

  test('an admin finds a missed reservation under People, filtered by machine, and exports the same list as CSV', async ({ page, db, createUser }) => {
    const admin = await createUser({ role: 'admin' });
    const member = await createUser({ role: 'member', first_name: 'Wilhelmina', last_name: 'Oduya' });
    const machineName = `Plasma table ${Date.now() % 100_000}`;
    const machine = await createMachine(db, { name: machineName, category: 'band_saw', reservable: true });
    try {
      const start = new Date(Date.now() - 3 * 86_400_000);
      start.setUTCMinutes(0, 0, 0);
      const end = new Date(start.getTime() + 3_600_000);
      await db('reservations').insert({ machine_id: machine.id, member_id: member.id, starts_at: start, ends_at: end, blocked_until: end, status: 'no_show' });

      await signIn(page, admin.email, admin.password);
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'People' }).click();
      await page.getByRole('navigation', { name: 'People' }).getByRole('link', { name: 'Reservations' }).click();
      await expect(page.getByRole('heading', { level: 1, name: 'Reservations' })).toBeVisible();

      const filters = page.getByRole('search', { name: 'Filter the reservations' });
      await filters.getByRole('combobox', { name: 'Machine' }).selectOption({ label: machineName });
      await filters.getByRole('combobox', { name: 'Status' }).selectOption({ label: 'No-show' });
      const row = page.getByRole('table', { name: 'Reservations' }).getByRole('row').filter({ hasText: machineName });
      await expect(row).toHaveCount(1);
      await expect(row).toContainText('Wilhelmina Oduya');
      await expect(row).toContainText('No-show');

      const href = await filters.getByRole('link', { name: 'Export CSV' }).getAttribute('href');
      expect(href).toContain(`machineId=${machine.id}`);
      const csv = await page.request.get(href ?? '');
      expect(csv.status()).toBe(200);
      expect(await csv.text()).toContain(machineName);
      await expectNoWcagViolations(page);
    } finally {
      await db('reservations').where({ machine_id: machine.id }).delete();
      await db('machines').where({ id: machine.id }).delete();
      await db('areas').where({ id: machine.area_id }).delete();
    }
  });
});
