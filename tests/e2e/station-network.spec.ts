import type { Page } from '@playwright/test';
import {
  createBadge,
  createMachine,
  createSignOff,
  createTraining,
  type CreatedMember,
  type createMember,
} from '@chuckkey/db/factories';
import type { Knex } from 'knex';
import { expect, test } from './fixtures';
import { openShopForEachTest } from './shop-hours';
import { badgeSecret, createStationAsAdmin, pairScreen, removeStationRows, typeBadge, withCurrentWaiver } from './station-fixtures';

const safetyChecklist = [{ id: 'work-is-tight', label: 'The work is tight in the chuck and the chuck key is out' }];

/** A paired lathe station and a member cleared on it, removed again afterwards. */
type CreateUser = (overrides?: NonNullable<Parameters<typeof createMember>[1]>) => Promise<CreatedMember>;

async function arrange(page: Page, db: Knex, createUser: CreateUser, firstName: string) {
  const admin = await createUser({ role: 'admin' });
  const instructor = await createUser({ role: 'instructor' });
  const member = await createUser({ role: 'member', first_name: firstName });
  const machine = await createMachine(db, { name: `Bench lathe ${Date.now() % 100_000}`, category: 'lathe' });
  await db('machines').where({ id: machine.id }).update({ safety_checklist: JSON.stringify(safetyChecklist) });
  const training = await createTraining(db, { name: `Lathe basics ${Date.now() % 100_000}`, machine_ids: [machine.id] });
  const signOff = await createSignOff(db, { member_id: member.id, training_id: training.id, signed_by: instructor.id, level: 'independent' });
  const badge = await createBadge(db, { memberId: member.id, badgeSecret: badgeSecret() });
  const waiver = await withCurrentWaiver(db, member);
  const station = await createStationAsAdmin(page.request, admin, machine.id);
  await pairScreen(page, station.pairingCode);
  return {
    member,
    machine,
    training,
    signOff,
    badge,
    async remove() {
      await db('machine_sessions').where({ machine_id: machine.id }).delete();
      await db('waiver_records').where({ member_id: member.id }).delete();
      if (waiver) await db('waiver_versions').where({ version: waiver }).delete();
      await removeStationRows(db, { people: [admin.id, instructor.id, member.id], stationId: station.id, machine });
      await db('trainings').where({ id: training.id }).delete();
    },
  };
}

async function toSafetyCheck(page: Page, badge: string, firstName: string) {
  await typeBadge(page, badge);
  await expect(page.getByRole('heading', { name: `Hello, ${firstName}` })).toBeVisible();
  await page.getByRole('button', { name: 'Continue to safety check' }).click();
  for (const item of safetyChecklist) await page.getByRole('switch', { name: item.label }).click();
}

test.describe('a station when things change or the network fails', () => {
  // Clearance needs the shop open; the database may be the demo shop's, with its hours.
  openShopForEachTest(test);

  test('a start the server refuses after the scan shows the answer again, with the reason', async ({ page, db, createUser }) => {
    const shop = await arrange(page, db, createUser, 'Rosalind');
    try {
      await toSafetyCheck(page, shop.badge.code, 'Rosalind');
      // Between the scan and the start, an instructor revokes the sign-off.
      await db('sign_offs').where({ id: shop.signOff.id }).update({ revoked_at: db.fn.now(), revoke_reason: 'Needs a refresher' });

      await page.getByRole('button', { name: 'Start session' }).click();

      await expect(page.getByRole('alert')).toContainText('Something changed since your scan, so the session did not start.');
      await expect(page.getByText('Not cleared to start yet')).toBeVisible();
      const failing = page.getByRole('list', { name: 'The shop’s rules' }).getByRole('listitem').first();
      await expect(failing).toContainText('Not met');
      await expect(failing).toContainText(shop.training.name);
      await expect(page.getByRole('button', { name: 'Continue to safety check' })).toHaveCount(0);
      expect(await db('machine_sessions').where({ machine_id: shop.machine.id })).toHaveLength(0);
    } finally {
      await shop.remove();
    }
  });

  test('an End pressed while the server is unreachable is kept, sent when it is back, and applied once at the time pressed', async ({ page, db, createUser }) => {
    test.slow();
    const shop = await arrange(page, db, createUser, 'Tamsin');
    try {
      await toSafetyCheck(page, shop.badge.code, 'Tamsin');
      await page.getByRole('button', { name: 'Start session' }).click();
      await expect(page.getByText('Tamsin is on this machine')).toBeVisible();
      const session = await db('machine_sessions').first('*').where({ machine_id: shop.machine.id }).whereNull('ended_at');
      await db('machine_sessions').where({ id: session.id }).update({ started_at: db.raw("now() - interval '40 minutes'") });

      // The shop's network drops: nothing the station sends reaches the server.
      await page.route('**/api/**', (route) => route.abort('connectionrefused'));
      const pressed = Date.now();
      await page.getByRole('button', { name: 'End session' }).click();
      await page.getByRole('button', { name: 'Yes, end the session' }).click();
      await expect(page.getByRole('heading', { name: 'Ending is saved on this station and will be sent when the server is back.' })).toBeVisible();
      expect((await db('machine_sessions').first('ended_at').where({ id: session.id })).ended_at).toBeNull();

      // The network comes back, but the first answer is lost on the way: the server has applied
      // the end, the station does not know it and sends it again with the same key.
      await page.unroute('**/api/**');
      let ends = 0;
      await page.route('**/api/station/sessions/*/end', async (route) => {
        ends += 1;
        if (ends === 1) {
          await route.fetch();
          await route.abort('connectionreset');
        } else await route.continue();
      });
      await page.getByRole('button', { name: 'Done' }).click();

      await expect.poll(() => ends, { timeout: 30_000 }).toBeGreaterThanOrEqual(2);
      await expect(page.getByText('Ending is saved on this station')).toHaveCount(0, { timeout: 15_000 });
      await expect(page.getByText('Available')).toBeVisible();

      const ended = await db('machine_sessions').first('*').where({ id: session.id });
      // Ended at the time End was pressed (the station's clock), not when the server heard of it.
      expect(Math.abs(new Date(ended.ended_at).getTime() - pressed)).toBeLessThan(5_000);
      expect(ended.end_idempotency_key).toBeTruthy();
      // One session, ended once: the meter took its 40 minutes a single time.
      expect(await db('machine_sessions').where({ machine_id: shop.machine.id })).toHaveLength(1);
      const meter = await db('machines').first('meter_hours').where({ id: shop.machine.id });
      expect(Number(meter.meter_hours)).toBeCloseTo(Number(ended.hours), 2);
      expect(Number(ended.hours)).toBeGreaterThanOrEqual(0.66);
      expect(Number(ended.hours)).toBeLessThanOrEqual(0.68);
    } finally {
      await page.unrouteAll({ behavior: 'ignoreErrors' });
      await shop.remove();
    }
  });
});
