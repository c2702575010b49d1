import { createBadge, createMachine } from '@chuckkey/db/factories';
import { expect, test } from './fixtures';
import { badgeSecret, createStationAsAdmin, pairScreen, removeStationRows, scanWithHandScanner } from './station-fixtures';

test.describe('a station with a hand scanner', () => {
  test('a scanner typing an instructor’s badge code and Enter opens the instructor menu', async ({ page, db, createUser }) => {
    const admin = await createUser({ role: 'admin' });
    const instructor = await createUser({ role: 'instructor', first_name: 'Cordelia' });
    const badge = await createBadge(db, { memberId: instructor.id, badgeSecret: badgeSecret() });
    const machine = await createMachine(db, { category: 'band_saw' });
    let stationId: string | undefined;
    try {
      const station = await createStationAsAdmin(page.request, admin, machine.id);
      stationId = station.id;
      await pairScreen(page, station.pairingCode);

      await scanWithHandScanner(page, badge.code);

      await expect(page.getByRole('heading', { name: 'Instructor menu' })).toBeVisible();
      await expect(page.getByText('Hello, Cordelia.')).toBeVisible();
    } finally {
      await removeStationRows(db, { people: [admin.id, instructor.id], stationId, machine });
    }
  });

  test('a badge that is not known says so and returns to idle with Done', async ({ page, db, createUser }) => {
    const admin = await createUser({ role: 'admin' });
    const machine = await createMachine(db, { category: 'drill_press' });
    let stationId: string | undefined;
    try {
      const station = await createStationAsAdmin(page.request, admin, machine.id);
      stationId = station.id;
      await pairScreen(page, station.pairingCode);

      await scanWithHandScanner(page, 'NoSuchBadgeCodeAnywhere0');

      await expect(page.getByRole('heading', { name: 'This badge is not known here' })).toBeVisible();
      await page.getByRole('button', { name: 'Done' }).click();
      await expect(page.getByText('Hold your badge to the camera or scan it')).toBeVisible();
    } finally {
      await removeStationRows(db, { people: [admin.id], stationId, machine });
    }
  });
});
