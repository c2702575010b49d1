import type { Page } from '@playwright/test';
import { createBadge, createMachine, createSignOff, createTraining } from '@chuckkey/db/factories';
import { expect, signIn, signOut, test } from './fixtures';
import { comingSaturdayIsNextWeek } from './reserve-fixtures';
import { openShopForEachTest } from './shop-hours';
import { badgeSecret, createStationAsAdmin, pairScreen, removeStationRows, withCurrentWaiver } from './station-fixtures';

const MINUTE = 60_000;

/** A hand scanner types the code and Enter a few milliseconds apart with no field focused; sent from inside the page in one go. */
async function scan(page: Page, code: string) {
  await page.evaluate((keys) => {
    for (const key of keys) document.body.dispatchEvent(new KeyboardEvent('keydown', { key, bubbles: true }));
  }, [...code, 'Enter']);
}

test.describe('a reservation from booking to check-in', () => {
  // The reservation and the check-in both need the shop open.
  openShopForEachTest(test);
  test.setTimeout(120_000);

  test('a member reserves the welder for Saturday, the confirmation with its calendar entry is in the Outbox, and the member checks in by scanning at the station', async ({
    page,
    db,
    shop,
    createUser,
  }) => {
    const admin = await createUser({ role: 'admin' });
    const instructor = await createUser({ role: 'instructor' });
    const member = await createUser({ role: 'member', first_name: 'Ottoline' });
    const machineName = `Journey MIG welder ${Date.now() % 100_000}`;
    const machine = await createMachine(db, { name: machineName, category: 'mig_welder', reservable: true });
    const training = await createTraining(db, { name: `Journey MIG safety ${Date.now() % 100_000}`, machine_ids: [machine.id] });
    await createSignOff(db, { member_id: member.id, training_id: training.id, signed_by: instructor.id, level: 'independent' });
    const badge = await createBadge(db, { memberId: member.id, badgeSecret: badgeSecret() });
    const waiver = await withCurrentWaiver(db, member);
    let stationId: string | undefined;
    try {
      await signIn(page, member.email, member.password);
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Reserve' }).click();
      await page.getByRole('link', { name: new RegExp(machineName) }).click();
      if (comingSaturdayIsNextWeek(shop.timeZone)) await page.getByRole('button', { name: 'Next week' }).click();
      await page.getByRole('button', { name: 'Saturday 9:00, free' }).click();
      await page.getByRole('combobox', { name: 'Length' }).selectOption({ label: '2 h' });
      await page.getByRole('button', { name: `Reserve the ${machineName}` }).click();
      await expect(page.getByRole('status').filter({ hasText: `The ${machineName} is yours on Saturday` })).toContainText('9:00–11:00');
      const upcoming = page.getByRole('list', { name: 'Upcoming' });
      await expect(upcoming).toContainText(machineName);
      await expect(upcoming).toContainText(/Saturday \d+ \w+, 9:00–11:00/);
      await signOut(page);

      await signIn(page, admin.email, admin.password);
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Outbox' }).click();
      await page.getByRole('link', { name: new RegExp(`Reserved: ${machineName}`) }).click();
      await expect(page.getByRole('heading', { name: new RegExp(`Reserved: ${machineName}`) })).toBeVisible();
      // RFC 5545 section 3.1: a calendar entry travels as text/calendar, saved as an .ics file.
      const download = page.getByRole('link', { name: 'Download reservation.ics' });
      await expect(download).toBeVisible();
      await expect(page.getByText(/^text\/calendar, \d+ bytes$/)).toBeVisible();
      const file = await page.request.get((await download.getAttribute('href')) ?? '');
      expect(file.status()).toBe(200);
      expect(await file.text()).toContain('BEGIN:VCALENDAR');
      await signOut(page);

      // The check-in window opens 10 minutes before the start (the machine's default), so the
      // reservation is moved to five minutes from now.
      const startsAt = new Date(Date.now() + 5 * MINUTE);
      const endsAt = new Date(startsAt.getTime() + 120 * MINUTE);
      const moved = await db('reservations')
        .where({ machine_id: machine.id, member_id: member.id, status: 'active' })
        .update({ starts_at: startsAt, ends_at: endsAt, blocked_until: endsAt });
      expect(moved).toBe(1);

      const station = await createStationAsAdmin(page.request, admin, machine.id);
      stationId = station.id;
      await pairScreen(page, station.pairingCode);
      await expect(page.getByText(/Next reservation: Ottoline/)).toBeVisible();
      await scan(page, badge.code);
      await expect(page.getByRole('heading', { name: 'Hello, Ottoline' })).toBeVisible();
      await page.getByRole('button', { name: 'Check in for your reservation' }).click();
      await expect(page.getByText('You are checked in for your reservation.')).toBeVisible();
      const row = await db('reservations').first('status').where({ machine_id: machine.id, member_id: member.id });
      expect(row.status).toBe('checked_in');
    } finally {
      await db('machine_sessions').where({ machine_id: machine.id }).delete();
      await db('reservations').where({ machine_id: machine.id }).delete();
      await db('waiver_records').where({ member_id: member.id }).delete();
      if (waiver) await db('waiver_versions').where({ version: waiver }).delete();
      await removeStationRows(db, { people: [admin.id, instructor.id, member.id], stationId, machine });
      await db('trainings').where({ id: training.id }).delete();
    }
  });
});
