import type { APIRequestContext } from '@playwright/test';
import { STATION_REQUEST_HEADER, stationScanResultSchema, type StationScanResult } from '@chuckkey/core';
import { createBadge, createMachine } from '@chuckkey/db/factories';
import { expectNoWcagViolations } from './axe';
import { expect, signIn, test } from './fixtures';
import { openShopForEachTest } from './shop-hours';
import { badgeSecret, createStationAsAdmin, removeStationRows, withCurrentWaiver } from './station-fixtures';

const stationHeaders = { [STATION_REQUEST_HEADER]: '1' };

/** The station's own request: the device cookie from pairing, then the badge, as the kiosk sends it. */
async function scan(device: APIRequestContext, badge: string): Promise<StationScanResult> {
  const res = await device.post('/api/station/scan', { headers: stationHeaders, data: { badge } });
  expect(res.status()).toBe(200);
  return stationScanResultSchema.parse(await res.json());
}

test.describe('maintenance: an overdue blocking task stops clearance until it is marked done', () => {
  // The station reads the shop's hours; the database may be the demo shop's.
  openShopForEachTest(test);

  test('an admin adds a blocking task, the meter runs past it, the station refuses by rule 4, and marking it done clears the member', async ({ page, browser, baseURL, db, createUser }) => {
    const admin = await createUser({ role: 'admin', first_name: 'Wilhelmina' });
    const member = await createUser({ role: 'member', first_name: 'Octavio' });
    const machine = await createMachine(db, { name: `Lathe ${Date.now() % 100_000}`, category: 'lathe', meter_hours: 412.5 });
    const badge = await createBadge(db, { memberId: member.id, badgeSecret: badgeSecret() });
    const publishedWaiver = await withCurrentWaiver(db, member);
    const station = await createStationAsAdmin(page.request, admin, machine.id);
    const deviceContext = await browser.newContext({ baseURL });
    try {
      const device = deviceContext.request;
      expect((await device.post('/api/station/pair', { headers: stationHeaders, data: { pairingCode: station.pairingCode } })).status()).toBe(200);
      expect((await scan(device, badge.code)).cleared).toBe(true);

      // The admin adds the task on the machine's maintenance page in Upkeep.
      await signIn(page, admin.email, admin.password);
      await page.goto(`/upkeep/machines/${machine.id}`);
      await expect(page.getByRole('heading', { level: 1, name: `Maintenance · ${machine.name}` })).toBeVisible();
      await expect(page.getByRole('navigation', { name: 'Upkeep' }).getByRole('link', { name: 'Maintenance' })).toBeVisible();
      await expect(page.getByText("Lock out the machine before maintenance work; follow the shop's procedures.")).toBeVisible();
      await page.getByRole('button', { name: 'Add task' }).click();
      const form = page.getByRole('dialog', { name: `Add a task to ${machine.name}` });
      await form.getByLabel('Task', { exact: true }).fill('Oil the ways');
      await form.getByLabel('Every … meter hours').fill('8');
      await form.getByLabel('Stops use when overdue').check();
      await form.getByRole('button', { name: 'Add task' }).click();
      await expect(page.getByText('Saved Oil the ways.')).toBeVisible();
      const row = page.getByRole('table', { name: `Maintenance tasks of ${machine.name}` }).getByRole('row').filter({ hasText: 'Oil the ways' });
      await expect(row).toContainText('Every 8 meter hours');
      await expect(row).toContainText('At 420.5 h');
      await expect(row).toContainText('OK');
      await expectNoWcagViolations(page);

      // Nine hours of use later the meter is past the due reading (420.5 h): rule 4 refuses.
      await db('machines').where({ id: machine.id }).update({ meter_hours: 421.5 });
      const refused = await scan(device, badge.code);
      expect(refused.cleared).toBe(false);
      expect(refused.reasons).toEqual([expect.objectContaining({ rule: 4, code: 'maintenance_overdue', message: `Maintenance is overdue on ${machine.name}: Oil the ways.` })]);

      // The list shows it overdue; the admin marks it done from the machine's page.
      await page.goto('/upkeep');
      const listed = page.getByRole('table', { name: 'Maintenance tasks' }).getByRole('row').filter({ hasText: machine.name });
      await expect(listed).toContainText('Overdue');
      await expect(listed).toContainText('Stops use when overdue');
      await expectNoWcagViolations(page);
      await listed.getByRole('link', { name: machine.name }).click();
      await row.getByRole('button', { name: 'Mark done: Oil the ways' }).click();
      const done = page.getByRole('dialog', { name: 'Mark done: Oil the ways' });
      await done.getByLabel('Note (optional)').fill('Ways and cross-slide oiled; wipers cleaned.');
      await done.getByRole('button', { name: 'Mark done' }).click();
      await expect(page.getByText('Marked done: Oil the ways.')).toBeVisible();
      await expect(row).toContainText('At 429.5 h');
      const history = page.getByRole('table', { name: `Maintenance history of ${machine.name}` });
      await expect(history).toContainText('Ways and cross-slide oiled; wipers cleaned.');
      await expect(history).toContainText('421.5 h');

      expect((await scan(device, badge.code)).cleared).toBe(true);
    } finally {
      await deviceContext.close();
      await removeStationRows(db, { people: [admin.id, member.id], stationId: station.id, machine });
      await db('waiver_records').where({ member_id: member.id }).delete();
      if (publishedWaiver !== null) await db('waiver_versions').where({ version: publishedWaiver }).delete();
    }
  });
});
