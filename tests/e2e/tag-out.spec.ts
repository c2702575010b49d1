import type { Browser, Page } from '@playwright/test';
import { createBadge, createMachine, type CreatedMember } from '@chuckkey/db/factories';
import { expectNoWcagViolations } from './axe';
import { expect, signIn, test } from './fixtures';
import { openShopForEachTest } from './shop-hours';
import { badgeSecret, createStationAsAdmin, pairScreen, removeStationRows, typeBadge } from './station-fixtures';

/** A wall board paired in a browser context of its own, so its device cookie is not the station's. */
async function openBoard(browser: Browser, baseURL: string, admin: CreatedMember) {
  const context = await browser.newContext({ baseURL });
  const page = await context.newPage();
  const station = await createStationAsAdmin(page.request, admin, { kind: 'board', name: `Board ${Date.now() % 1_000_000}` });
  await page.goto('/kiosk/board');
  await page.getByLabel('Pairing code').fill(station.pairingCode);
  await expect(page.getByRole('contentinfo')).toContainText('Sign-off classes coming up');
  return { page, station, close: () => context.close() };
}

function plateOf(board: Page, machineName: string) {
  return board.getByRole('main').getByRole('listitem').filter({ hasText: machineName });
}

test.describe('tag-outs: problems reported at a station and in the web app, shown on the board, cleared in Upkeep', () => {
  // The station and the board read the shop's hours; the database may be the demo shop's.
  openShopForEachTest(test);

  test('a member reports a problem at the station, the board shows the machine tagged out, and an admin clears it', async ({ page, browser, baseURL, db, createUser }) => {
    const admin = await createUser({ role: 'admin', first_name: 'Theodora' });
    const member = await createUser({ role: 'member', first_name: 'Rosalind' });
    const machine = await createMachine(db, { name: `Surface grinder ${Date.now() % 100_000}`, category: 'surface_grinder' });
    const badge = await createBadge(db, { memberId: member.id, badgeSecret: badgeSecret() });
    const station = await createStationAsAdmin(page.request, admin, machine.id);
    const board = await openBoard(browser, baseURL ?? '', admin);
    const web = await browser.newContext({ baseURL });
    try {
      await pairScreen(page, station.pairingCode);
      await expect(plateOf(board.page, machine.name)).toContainText('Available');

      // At the idle station: "Report a problem", the member's badge, a common reason and a few words.
      await page.getByRole('button', { name: 'Report a problem' }).click();
      await typeBadge(page, badge.code);
      await page.getByRole('button', { name: 'Guard damaged' }).click();
      await expect(page.getByRole('button', { name: 'Guard damaged' })).toHaveAttribute('aria-pressed', 'true');
      await page.getByLabel('More detail (optional)').fill('Wheel guard cracked at the hinge');
      await expectNoWcagViolations(page);
      await page.getByRole('button', { name: 'Tag out this machine' }).click();

      // The station's plate turns tagged out with the reason at once, and the scan stays for instructors.
      const reason = 'Guard damaged: Wheel guard cracked at the hinge';
      const header = page.getByRole('banner');
      await expect(header).toContainText('Tagged out');
      await expect(header).toContainText(reason);
      await expect(page.getByText('Hold your badge to the camera or scan it')).toBeVisible();

      // The board hears of it live and shows the plate tagged out with the reason.
      await expect(plateOf(board.page, machine.name)).toContainText('Tagged out');
      await expect(plateOf(board.page, machine.name)).toContainText(reason);

      // The admins are e-mailed (caught by the outbox), with the way to Upkeep › Tag-outs.
      await expect
        .poll(async () => (await db('outbox_messages').first('text_body').where({ subject: `Tagged out: ${machine.name}` }).whereRaw('? = any(to_addresses)', [admin.email]))?.text_body ?? '')
        .toContain('/upkeep/tag-outs');

      // An admin clears it in Upkeep › Tag-outs with a note.
      const adminPage = await web.newPage();
      await signIn(adminPage, admin.email, admin.password);
      await adminPage.goto('/upkeep/tag-outs');
      await expect(adminPage.getByRole('heading', { level: 1, name: 'Tag-outs' })).toBeVisible();
      await expect(adminPage.getByRole('navigation', { name: 'Upkeep' }).getByRole('link', { name: 'Tag-outs' })).toHaveAttribute('aria-current', 'page');
      const row = adminPage.getByRole('region', { name: 'Open tag-outs' }).getByRole('row').filter({ hasText: machine.name });
      await expect(row).toContainText(reason);
      await expect(row).toContainText(`Rosalind ${member.last_name}`);
      await expectNoWcagViolations(adminPage);
      await row.getByRole('button', { name: `Clear the tag-out of the ${machine.name}` }).click();
      const dialog = adminPage.getByRole('dialog', { name: `Clear the tag-out of the ${machine.name}?` });
      await dialog.getByLabel('What was done').fill('Guard replaced and wheel ring-tested.');
      await dialog.getByRole('button', { name: 'Clear the tag-out', exact: true }).click();
      await expect(adminPage.getByText(`The ${machine.name} is back in service.`)).toBeVisible();
      await expect(adminPage.getByRole('region', { name: 'Cleared tag-outs' }).getByRole('row').filter({ hasText: machine.name })).toContainText('Guard replaced and wheel ring-tested.');

      // The board shows the machine free again.
      await expect(plateOf(board.page, machine.name)).toContainText('Available');
    } finally {
      await web.close();
      await board.close();
      await db('tag_outs').where({ machine_id: machine.id }).delete();
      await db('outbox_messages').where({ subject: `Tagged out: ${machine.name}` }).delete();
      await db('audit_log').where({ entity: 'station', entity_id: board.station.id }).delete();
      await db('stations').where({ id: board.station.id }).delete();
      await removeStationRows(db, { people: [admin.id, member.id], stationId: station.id, machine });
    }
  });

  test('a signed-in member reports a problem from the Shop floor, and Upkeep is not theirs to open', async ({ page, db, signInAs }) => {
    const machine = await createMachine(db, { name: `Column drill ${Date.now() % 100_000}`, category: 'drill_press' });
    try {
      await signInAs('member');
      const plate = page.getByRole('article', { name: machine.name });
      await plate.getByRole('button', { name: `Report a problem with the ${machine.name}` }).click();

      const dialog = page.getByRole('dialog', { name: `Report a problem with the ${machine.name}` });
      await dialog.getByRole('button', { name: 'Tag out this machine' }).click();
      // The reason is needed: the form says so under its field and sends nothing.
      await expect(dialog.getByText('Say what is wrong with the machine.')).toBeVisible();
      await dialog.getByLabel('What is wrong?').fill('Quill return spring broken');
      await expectNoWcagViolations(page);
      await dialog.getByRole('button', { name: 'Tag out this machine' }).click();

      await expect(page.getByText(`The ${machine.name} is tagged out. The admins have been told.`)).toBeVisible();
      await expect(plate).toContainText('Tagged out');
      await expect(plate).toContainText('Quill return spring broken');
      await expect(plate.getByRole('button', { name: /Report a problem/ })).toHaveCount(0);

      await page.goto('/upkeep/tag-outs');
      await expect(page.getByRole('heading', { level: 1, name: "You don't have access to Upkeep" })).toBeVisible();
    } finally {
      await db('tag_outs').where({ machine_id: machine.id }).delete();
      await db('outbox_messages').where({ subject: `Tagged out: ${machine.name}` }).delete();
      await db('audit_log').where({ entity: 'machine', entity_id: machine.id }).delete();
      await db('machines').where({ id: machine.id }).delete();
      await db('areas').where({ id: machine.area_id }).delete();
    }
  });
});
