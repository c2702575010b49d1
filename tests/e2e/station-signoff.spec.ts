import { hashPassword } from '@chuckkey/db';
import { createBadge, createMachine, createTraining, type CreatedMember } from '@chuckkey/db/factories';
import type { Knex } from 'knex';
import { expectNoWcagViolations } from './axe';
import { expect, test } from './fixtures';
import { badgeSecret, createStationAsAdmin, pairScreen, removeStationRows, typeBadge } from './station-fixtures';

async function withPin(db: Knex, member: CreatedMember, pin: string) {
  // As PUT /api/profile/pin stores it: an argon2id hash.
  await db('members').where({ id: member.id }).update({ pin_hash: await hashPassword(pin) });
}

test('an instructor signs a member off at a paired station with badge, PIN and the checklist', async ({ page, db, createUser }) => {
  const admin = await createUser({ role: 'admin' });
  const instructor = await createUser({ role: 'instructor', first_name: 'Rosalind' });
  const member = await createUser({ role: 'member', first_name: 'Tobias' });
  const machine = await createMachine(db, { name: `Engine lathe ${Date.now() % 100_000}`, category: 'lathe' });
  const training = await createTraining(db, {
    name: `Metal lathe fundamentals ${Date.now() % 100_000}`,
    machine_ids: [machine.id],
    validity_months: 24,
    checklist: [
      { id: 'removes-the-chuck-key', label: 'Removes the chuck key before starting the spindle' },
      { id: 'sets-speed-for-diameter', label: 'Sets the spindle speed for the work’s diameter' },
      { id: 'keeps-hands-clear', label: 'Keeps hands and sleeves clear of the turning work' },
    ],
  });
  const instructorBadge = await createBadge(db, { memberId: instructor.id, badgeSecret: badgeSecret() });
  const memberBadge = await createBadge(db, { memberId: member.id, badgeSecret: badgeSecret() });
  await withPin(db, instructor, '5930');
  let stationId: string | undefined;

  try {
    const station = await createStationAsAdmin(page.request, admin, machine.id);
    stationId = station.id;

    await pairScreen(page, station.pairingCode);

    // Idle: the machine's nameplate and the badge outline.
    await expect(page.getByText(machine.name)).toBeVisible();
    await expect(page.getByText('Available')).toBeVisible();
    await expectNoWcagViolations(page);

    await typeBadge(page, instructorBadge.code);
    await expect(page.getByRole('heading', { name: 'Instructor menu' })).toBeVisible();
    await page.getByRole('button', { name: 'Sign off a member' }).click();

    await expect(page.getByRole('heading', { name: 'Rosalind, enter your PIN' })).toBeVisible();
    await expectNoWcagViolations(page);
    const digits = page.getByRole('group', { name: 'PIN digits' });
    for (const digit of '5930') await digits.getByRole('button', { name: digit, exact: true }).click();
    await digits.getByRole('button', { name: 'OK' }).click();

    await expect(page.getByRole('heading', { name: 'Scan the member’s badge' })).toBeVisible();
    await typeBadge(page, memberBadge.code);

    await expect(page.getByText('Signing off Tobias')).toBeVisible();
    await page.getByRole('button', { name: training.name }).click();

    const continueButton = page.getByRole('button', { name: 'Continue' });
    await expectNoWcagViolations(page);
    for (const item of training.checklist) {
      await expect(continueButton).toBeDisabled();
      await page.getByRole('checkbox', { name: item.label }).check();
    }
    await continueButton.click();

    await page.getByRole('radio', { name: /Independent/ }).check();
    await page.getByRole('button', { name: 'Continue' }).click();

    await expect(page.getByRole('heading', { name: 'Confirm the sign-off' })).toBeVisible();
    await page.getByRole('button', { name: 'Sign off', exact: true }).click();

    await expect(page.getByRole('heading', { name: 'Tobias is signed off' })).toBeVisible();
    await expect(page.getByText(/Valid until/)).toBeVisible();

    const row = await db('sign_offs').first('*').where({ member_id: member.id, training_id: training.id });
    expect(row).toMatchObject({ signed_via: 'station', signed_by: instructor.id, level: 'independent' });
    expect((row.checklist as { seen: boolean }[]).every((item) => item.seen)).toBe(true);

    await page.getByRole('button', { name: 'Done' }).click();
    await expect(page.getByText('Hold your badge to the camera or scan it')).toBeVisible();
  } finally {
    // The people go with the createUser fixture; what refers to them goes first.
    await removeStationRows(db, { people: [admin.id, instructor.id, member.id], stationId, machine });
    await db('trainings').where({ id: training.id }).delete();
  }
});
