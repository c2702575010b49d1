import { hashPassword } from '@chuckkey/db';
import { createBadge, createMachine, createSignOff, createTraining, type CreatedMember, type MachineRow } from '@chuckkey/db/factories';
import type { Page } from '@playwright/test';
import type { Knex } from 'knex';
import { expectNoWcagViolations } from './axe';
import { expect, test } from './fixtures';
import { openShopForEachTest } from './shop-hours';
import { badgeSecret, createStationAsAdmin, pairScreen, removeStationRows, typeBadge, withCurrentWaiver } from './station-fixtures';

const safetyChecklist = [
  { id: 'guards-in-place', label: 'The chuck guard is closed and the way guards are in place' },
  { id: 'work-is-tight', label: 'The work is tight in the chuck and the chuck key is out' },
];

/**
 * A member with a badge and the waiver in force, at the machine's station once `pair` has paired
 * the page. `cleanUp` removes what was made for the test: its sessions, the waiver record (and a
 * waiver published for it), sign-offs, the station, the machine and the trainings.
 */
async function memberAtStation(
  page: Page,
  db: Knex,
  people: { admin: CreatedMember; member: CreatedMember; others?: CreatedMember[] },
  machine: MachineRow,
  trainings: { id: string }[],
) {
  const badge = await createBadge(db, { memberId: people.member.id, badgeSecret: badgeSecret() });
  const waiver = await withCurrentWaiver(db, people.member);
  let stationId: string | undefined;
  return {
    badge,
    async pair() {
      const station = await createStationAsAdmin(page.request, people.admin, machine.id);
      stationId = station.id;
      await pairScreen(page, station.pairingCode);
    },
    async cleanUp() {
      await db('machine_sessions').where({ machine_id: machine.id }).delete();
      await db('waiver_records').where({ member_id: people.member.id }).delete();
      if (waiver) await db('waiver_versions').where({ version: waiver }).delete();
      const everyone = [people.admin, people.member, ...(people.others ?? [])].map((person) => person.id);
      await removeStationRows(db, { people: everyone, stationId, machine });
      await db('trainings').whereIn('id', trainings.map((training) => training.id)).delete();
    },
  };
}

test.describe('a machine station checks clearance and runs a session', () => {
  // Clearance needs the shop open; the database may be the demo shop's, with its hours.
  openShopForEachTest(test);

  test('a member without the sign-off sees the missing training on the rule ladder', async ({ page, db, createUser }) => {
    const admin = await createUser({ role: 'admin' });
    const member = await createUser({ role: 'member', first_name: 'Ottoline' });
    const machine = await createMachine(db, { name: `Toolroom lathe ${Date.now() % 100_000}`, category: 'lathe' });
    const training = await createTraining(db, { name: `Lathe basics ${Date.now() % 100_000}`, machine_ids: [machine.id] });
    const at = await memberAtStation(page, db, { admin, member }, machine, [training]);
    try {
      await at.pair();

      await typeBadge(page, at.badge.code);

      await expect(page.getByRole('heading', { name: 'Hello, Ottoline' })).toBeVisible();
      await expect(page.getByText('Not cleared to start yet')).toBeVisible();
      const ladder = page.getByRole('list', { name: 'The shop’s rules' });
      // All eight rules of the design, the failing one first.
      await expect(ladder.getByRole('listitem')).toHaveCount(8);
      await expect(ladder.getByRole('listitem').first()).toContainText('Not met');
      await expect(ladder.getByRole('listitem').first()).toContainText(training.name);
      await expect(page.getByRole('button', { name: 'Continue to safety check' })).toHaveCount(0);
      await expectNoWcagViolations(page);

      await page.getByRole('button', { name: 'Done' }).click();
      await expect(page.getByText('Hold your badge to the camera or scan it')).toBeVisible();
    } finally {
      await at.cleanUp();
    }
  });

  test('a cleared member confirms the safety check, starts and ends a session, and the meter moves', async ({ page, db, createUser }) => {
    const admin = await createUser({ role: 'admin' });
    const instructor = await createUser({ role: 'instructor' });
    const member = await createUser({ role: 'member', first_name: 'Peregrine' });
    const machine = await createMachine(db, { name: `Gap-bed lathe ${Date.now() % 100_000}`, category: 'lathe', meter_hours: 120 });
    await db('machines').where({ id: machine.id }).update({ safety_checklist: JSON.stringify(safetyChecklist) });
    const trainings = [
      await createTraining(db, { name: `Lathe basics ${Date.now() % 100_000}`, machine_ids: [machine.id] }),
      await createTraining(db, { name: `Chuck changes ${Date.now() % 100_000}`, machine_ids: [machine.id] }),
    ];
    for (const training of trainings) {
      await createSignOff(db, { member_id: member.id, training_id: training.id, signed_by: instructor.id, level: 'independent' });
    }
    const at = await memberAtStation(page, db, { admin, member, others: [instructor] }, machine, trainings);
    try {
      await at.pair();

      await typeBadge(page, at.badge.code);
      await expect(page.getByRole('heading', { name: 'Hello, Peregrine' })).toBeVisible();
      await expect(page.getByText('Cleared to start')).toBeVisible();
      await page.getByRole('button', { name: 'Continue to safety check' }).click();

      await expect(page.getByRole('heading', { name: 'Safety check' })).toBeVisible();
      await expect(page.getByText(/chuck key out of the chuck/)).toBeVisible();
      await expect(page.getByText(/shop’s rules and local codes come first/)).toBeVisible();
      const start = page.getByRole('button', { name: 'Start session' });
      for (const item of safetyChecklist) {
        await expect(start).toBeDisabled();
        await page.getByRole('switch', { name: item.label }).click();
        await expect(page.getByRole('switch', { name: item.label })).toHaveAttribute('aria-checked', 'true');
      }
      await expectNoWcagViolations(page);
      await start.click();

      await expect(page.getByText('Peregrine is on this machine')).toBeVisible();
      await expect(page.getByText('In use')).toBeVisible();
      const session = await db('machine_sessions').first('*').where({ machine_id: machine.id }).whereNull('ended_at');
      expect(session).toBeTruthy();

      // A reload finds the running session again.
      await page.reload();
      await expect(page.getByText('Peregrine is on this machine')).toBeVisible();

      // The member's own badge while the session runs offers to end it.
      await typeBadge(page, at.badge.code);
      await expect(page.getByText('Your session is running')).toBeVisible();
      await expect(page.getByRole('button', { name: 'End session' })).toBeVisible();
      await page.getByRole('button', { name: 'Not now' }).click();
      await expect(page.getByText('Peregrine is on this machine')).toBeVisible();

      // Ninety minutes at the machine, without waiting for them.
      await db('machine_sessions').where({ id: session.id }).update({ started_at: db.raw("now() - interval '90 minutes'") });

      await page.getByRole('button', { name: 'End session' }).click();
      await page.getByRole('button', { name: 'Yes, end the session' }).click();
      await expect(page.getByRole('heading', { name: /Session ended after 1:30:/ })).toBeVisible();

      const ended = await db('machine_sessions').first('*').where({ id: session.id });
      expect(ended.ended_at).not.toBeNull();
      const after = await db('machines').first('meter_hours').where({ id: machine.id });
      // 120 h before, plus the session's hour and a half.
      expect(Number(after.meter_hours)).toBeGreaterThanOrEqual(121.5);
      expect(Number(after.meter_hours)).toBeLessThan(121.6);

      await page.getByRole('button', { name: 'Done' }).click();
      await expect(page.getByText('Hold your badge to the camera or scan it')).toBeVisible();
      await expect(page.getByText('Available')).toBeVisible();
    } finally {
      await at.cleanUp();
    }
  });

  test('an instructor goes on duty and off again with badge and PIN', async ({ page, db, createUser }) => {
    const admin = await createUser({ role: 'admin' });
    const instructor = await createUser({ role: 'instructor', first_name: 'Isolde' });
    // As PUT /api/profile/pin stores it: an argon2id hash.
    await db('members').where({ id: instructor.id }).update({ pin_hash: await hashPassword('4817') });
    const badge = await createBadge(db, { memberId: instructor.id, badgeSecret: badgeSecret() });
    const machine = await createMachine(db, { category: 'mig_welder' });
    let stationId: string | undefined;
    const enterPin = async () => {
      const digits = page.getByRole('group', { name: 'PIN digits' });
      for (const digit of '4817') await digits.getByRole('button', { name: digit, exact: true }).click();
      await digits.getByRole('button', { name: 'OK' }).click();
    };
    try {
      const station = await createStationAsAdmin(page.request, admin, machine.id);
      stationId = station.id;
      await pairScreen(page, station.pairingCode);

      await typeBadge(page, badge.code);
      await page.getByRole('button', { name: 'Go on duty / Go off duty' }).click();
      await expect(page.getByRole('heading', { name: 'Isolde, enter your PIN' })).toBeVisible();
      await enterPin();
      await expect(page.getByRole('heading', { name: 'Isolde, you are on duty' })).toBeVisible();
      await page.getByRole('button', { name: 'Done' }).click();

      await typeBadge(page, badge.code);
      await page.getByRole('button', { name: 'Go on duty / Go off duty' }).click();
      await enterPin();
      await expect(page.getByRole('heading', { name: 'Isolde, you are off duty' })).toBeVisible();
    } finally {
      await db('duty_shifts').where({ member_id: instructor.id }).delete();
      await removeStationRows(db, { people: [admin.id, instructor.id], stationId, machine });
    }
  });
});
