import { dayRailBounds } from '@chuckkey/core';
import { createBadge, createMachine, createSignOff, createTraining } from '@chuckkey/db/factories';
import { expectNoWcagViolations } from './axe';
import { expect, test } from './fixtures';
import { openShopForEachTest } from './shop-hours';
import { badgeSecret, createStationAsAdmin, pairScreen, removeStationRows, typeBadge, withCurrentWaiver } from './station-fixtures';

const MINUTE = 60_000;

test.describe('a machine station and its reservations', () => {
  // Clearance needs the shop open; the database may be the demo shop's, with its hours.
  openShopForEachTest(test);

  test('the holder checks in at the station, and the reservation keeps another member off the machine', async ({ page, db, createUser }) => {
    const admin = await createUser({ role: 'admin' });
    const instructor = await createUser({ role: 'instructor' });
    const holder = await createUser({ role: 'member', first_name: 'Rosalind' });
    const other = await createUser({ role: 'member', first_name: 'Thaddeus' });
    const machine = await createMachine(db, { name: `MIG welder ${Date.now() % 100_000}`, category: 'mig_welder' });
    const training = await createTraining(db, { name: `MIG welding safety ${Date.now() % 100_000}`, machine_ids: [machine.id] });
    for (const member of [holder, other]) {
      await createSignOff(db, { member_id: member.id, training_id: training.id, signed_by: instructor.id, level: 'independent' });
    }
    const holderBadge = await createBadge(db, { memberId: holder.id, badgeSecret: badgeSecret() });
    const otherBadge = await createBadge(db, { memberId: other.id, badgeSecret: badgeSecret() });
    const waiver = await withCurrentWaiver(db, holder);
    await withCurrentWaiver(db, other);
    // A reservation starting in five minutes, inside the machine's check-in window (10 minutes by default).
    const startsAt = new Date(Date.now() + 5 * MINUTE);
    const endsAt = new Date(startsAt.getTime() + 60 * MINUTE);
    const [reservation] = await db('reservations')
      .insert({ machine_id: machine.id, member_id: holder.id, starts_at: startsAt, ends_at: endsAt, blocked_until: endsAt })
      .returning<{ id: string }[]>('id');
    let stationId: string | undefined;
    try {
      const station = await createStationAsAdmin(page.request, admin, machine.id);
      stationId = station.id;
      await pairScreen(page, station.pairingCode);
      await expect(page.getByText(/Next reservation: Rosalind/)).toBeVisible();

      await typeBadge(page, holderBadge.code);
      await expect(page.getByRole('heading', { name: 'Hello, Rosalind' })).toBeVisible();
      await expect(page.getByText('Cleared to start')).toBeVisible();
      await page.getByRole('button', { name: 'Check in for your reservation' }).click();
      await expect(page.getByText('You are checked in for your reservation.')).toBeVisible();
      await expectNoWcagViolations(page);
      await expect(page.getByRole('button', { name: 'Check in for your reservation' })).toHaveCount(0);
      const row = await db('reservations').first('status', 'checked_in_at').where({ id: reservation!.id });
      expect(row.status).toBe('checked_in');
      expect(row.checked_in_at).not.toBeNull();

      await page.getByRole('button', { name: 'Not now' }).click();
      await expect(page.getByText('Hold your badge to the camera or scan it')).toBeVisible();

      // product.md, clearance rule 6: no one else's reservation starts within the protection window.
      await typeBadge(page, otherBadge.code);
      await expect(page.getByRole('heading', { name: 'Hello, Thaddeus' })).toBeVisible();
      await expect(page.getByText('Not cleared to start yet')).toBeVisible();
      await expect(page.getByText(`Someone else has reserved ${machine.name} from`)).toBeVisible();
      await expect(page.getByRole('button', { name: 'Continue to safety check' })).toHaveCount(0);
      await expect(page.getByRole('button', { name: 'Check in for your reservation' })).toHaveCount(0);

      // Had Thaddeus been on the machine already, the running screen warns him (screens.md: 10
      // minutes before the next reservation); the session itself runs on.
      await page.getByRole('button', { name: 'Done' }).click();
      await db('machine_sessions').insert({ machine_id: machine.id, member_id: other.id, station_id: stationId, checklist: '[]' });
      await page.reload();
      await expect(page.getByText('Thaddeus is on this machine')).toBeVisible();
      await expect(page.getByRole('alert').filter({ hasText: 'Rosalind has reserved this machine from' })).toBeVisible();
      // screens.md, running screen: the time bar of the day shows when the next reservation starts.
      await expect(page.getByRole('figure', { name: 'Today on this machine' })).toContainText('Next reservation: Rosalind');
      await expectNoWcagViolations(page);
    } finally {
      await db('machine_sessions').where({ machine_id: machine.id }).delete();
      await db('reservations').where({ machine_id: machine.id }).delete();
      await db('waiver_records').whereIn('member_id', [holder.id, other.id]).delete();
      if (waiver) await db('waiver_versions').where({ version: waiver }).delete();
      await removeStationRows(db, { people: [admin.id, instructor.id, holder.id, other.id], stationId, machine });
      await db('trainings').where({ id: training.id }).delete();
    }
  });

  test('the idle station shows the next reservation on the day’s time bar, with its time in words', async ({ page, db, createUser }) => {
    const admin = await createUser({ role: 'admin' });
    const holder = await createUser({ role: 'member', first_name: 'Rosalind' });
    const machine = await createMachine(db, { name: `MIG welder ${Date.now() % 100_000}`, category: 'mig_welder' });
    const { timeZone } = (await db('shop').first('time_zone as timeZone')) as { timeZone: string };
    // A checked-in reservation that began a minute ago and reaches at least an hour into today's
    // 06:00–24:00 rail (screens.md "Time bars"), whatever the hour the test runs at.
    const now = Date.now();
    const rail = dayRailBounds(new Date(now), timeZone);
    const startsAt = new Date(Math.floor((now - MINUTE) / MINUTE) * MINUTE);
    const endsAt = new Date(Math.max(startsAt.getTime() + 60 * MINUTE, rail.start.getTime() + 60 * MINUTE));
    await db('reservations').insert({ machine_id: machine.id, member_id: holder.id, starts_at: startsAt, ends_at: endsAt, blocked_until: endsAt, status: 'checked_in', checked_in_at: startsAt });
    // Wall-clock times in the shop's zone, from the IANA tz database via Intl.
    const clock = new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });
    const times = `${clock.format(startsAt)}–${clock.format(endsAt)}`;
    let stationId: string | undefined;
    try {
      const station = await createStationAsAdmin(page.request, admin, machine.id);
      stationId = station.id;
      await pairScreen(page, station.pairingCode);

      const bar = page.getByRole('banner').getByRole('figure', { name: 'Today on this machine' });
      await expect(bar).toBeVisible();
      await expect(bar.getByText(`Next reservation: Rosalind, ${times}`)).toBeVisible();
      await expect(bar.getByTestId('time-bar-span')).toHaveCount(1);
      await expect(bar.getByTestId('time-bar-span')).toBeVisible();
      // The bar's text equivalent for screen readers.
      await expect(bar.getByRole('listitem')).toHaveText([`Reserved ${times}, Rosalind`]);
      await expectNoWcagViolations(page);
    } finally {
      await db('reservations').where({ machine_id: machine.id }).delete();
      await removeStationRows(db, { people: [admin.id, holder.id], stationId, machine });
    }
  });
});
