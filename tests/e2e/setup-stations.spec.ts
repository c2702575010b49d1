import type { APIRequestContext } from '@playwright/test';
import { PAIRING_ALPHABET, PAIRING_CODE_LENGTH, PAIRING_MINUTES } from '@chuckkey/core';
import { createMachine, type MachineRow } from '@chuckkey/db/factories';
import { expectNoWcagViolations } from './axe';
import { expect, test as base } from './fixtures';

interface Made {
  /** A machine in an area of its own; its stations, their audit entries, the machine and the area go after the test. */
  machine: () => Promise<MachineRow>;
}

// Torn down before createUser, whose people the stations name as their creator.
const test = base.extend<{ made: Made }>({
  made: async ({ db, createUser: _createUser }, use) => {
    const machines: MachineRow[] = [];
    await use({
      machine: async () => {
        const machine = await createMachine(db, { name: `Engine lathe S${Date.now() % 1_000_000}`, category: 'lathe' });
        machines.push(machine);
        return machine;
      },
    });
    const machineIds = machines.map((machine) => machine.id);
    const stationIds = (await db('stations').whereIn('machine_id', machineIds).pluck('id')) as string[];
    await db('audit_log').where({ entity: 'station' }).whereIn('entity_id', stationIds).delete();
    await db('stations').whereIn('id', stationIds).delete();
    await db('machines').whereIn('id', machineIds).delete();
    await db('areas')
      .whereIn(
        'id',
        machines.map((machine) => machine.area_id),
      )
      .delete();
  },
});

test.use({ locale: 'en-US' });

const pairingCodePattern = new RegExp(`^[${PAIRING_ALPHABET}]{${PAIRING_CODE_LENGTH}}$`);

/** A kiosk device as the server sees it: its own cookies, the station request header on writes. */
async function kioskDevice(request: APIRequestContext) {
  return { pair: (pairingCode: string) => request.post('/api/station/pair', { headers: { 'x-chuckkey-station': '1' }, data: { pairingCode } }) };
}

test.describe('stations under Setup', () => {
  test('an admin adds a machine station, reads its 8-character pairing code, and revoking it shuts the paired device out', async ({
    page,
    playwright,
    baseURL,
    db,
    signInAs,
    made,
  }) => {
    const machine = await made.machine();
    await signInAs('admin');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Setup' }).click();
    await page.getByRole('navigation', { name: 'Setup' }).getByRole('link', { name: 'Stations' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Stations' })).toBeVisible();

    await page.getByRole('button', { name: 'Add a station' }).click();
    const adding = page.getByRole('dialog', { name: 'Add a station' });
    await expect(adding.getByRole('radio', { name: /^Machine station/ })).toBeChecked();
    await adding.getByRole('combobox', { name: 'Machine' }).selectOption({ label: machine.name });
    await adding.getByRole('button', { name: 'Add station' }).click();

    const codeDialog = page.getByRole('dialog', { name: `Pairing code for ${machine.name}` });
    const code = codeDialog.getByRole('group', { name: 'Pairing code' }).getByText(pairingCodePattern);
    await expect(code).toBeVisible();
    const pairingCode = (await code.textContent()) ?? '';
    expect(pairingCode).toHaveLength(8);
    await expect(codeDialog).toContainText('/kiosk/station');
    await expect(codeDialog).toContainText(`within ${PAIRING_MINUTES} minutes. It works once.`);
    // WCAG 2.2 level A and AA via axe-core (tags wcag2a, wcag2aa, wcag21aa, wcag22aa), with the code on screen.
    await expectNoWcagViolations(page);

    const [row] = await db('stations').where({ machine_id: machine.id });
    expect(row).toMatchObject({ kind: 'machine', name: machine.name, paired_at: null, revoked_at: null });

    const deviceRequest = await playwright.request.newContext({ baseURL });
    try {
      const device = await kioskDevice(deviceRequest);
      expect((await device.pair(pairingCode)).status()).toBe(200);
      expect((await deviceRequest.get('/api/station')).status()).toBe(200);
      // It works once.
      expect((await device.pair(pairingCode)).status()).not.toBe(200);

      await codeDialog.getByRole('button', { name: 'Done' }).click();
      await expect(codeDialog).toBeHidden();
      await page.reload();
      const card = page.getByRole('list', { name: 'Stations' }).getByRole('article', { name: machine.name });
      await expect(card.getByText('Paired', { exact: true })).toBeVisible();
      await expect(card).toContainText('Machine station');
      await expect(card.getByText(/^(now|\d+ seconds? ago)/)).toBeVisible();

      await card.getByRole('button', { name: `Revoke ${machine.name}` }).click();
      const confirm = page.getByRole('dialog', { name: `Revoke ${machine.name}?` });
      await expect(confirm).toContainText('The device stops working at once');
      await confirm.getByRole('button', { name: 'Revoke station' }).click();

      const notice = page.getByRole('status').filter({ hasText: `${machine.name} is revoked` });
      await expect(notice).toBeFocused();
      await expect(card.getByText('Revoked', { exact: true })).toBeVisible();
      await expect(card.getByRole('button', { name: `Revoke ${machine.name}` })).toHaveCount(0);
      // WCAG 2.2 level A and AA via axe-core, on the list with a paired-then-revoked station.
      await expectNoWcagViolations(page);

      expect((await deviceRequest.get('/api/station')).status()).toBe(401);
      const revoked = await db('stations').first('revoked_at', 'device_token_hash').where({ id: row.id });
      expect(revoked.revoked_at).not.toBeNull();
      expect(revoked.device_token_hash).toBeNull();
    } finally {
      await deviceRequest.dispose();
    }
  });

  test('a wall board gets its code for the board screen, and its station waits for pairing', async ({ page, db, signInAs }) => {
    const name = `Board by the welding bay ${Date.now() % 1_000_000}`;
    await signInAs('admin');
    await page.goto('/setup/stations');

    await page.getByRole('button', { name: 'Add a station' }).click();
    const adding = page.getByRole('dialog', { name: 'Add a station' });
    await adding.getByRole('radio', { name: /^Wall board/ }).check();
    await expect(adding.getByRole('combobox', { name: 'Machine' })).toHaveCount(0);
    await adding.getByLabel('Name (optional)').fill(name);
    await adding.getByRole('button', { name: 'Add station' }).click();

    try {
      const codeDialog = page.getByRole('dialog', { name: `Pairing code for ${name}` });
      await expect(codeDialog.getByRole('group', { name: 'Pairing code' }).getByText(pairingCodePattern)).toBeVisible();
      await expect(codeDialog).toContainText('/kiosk/board');
      await codeDialog.getByRole('button', { name: 'Done' }).click();

      const card = page.getByRole('list', { name: 'Stations' }).getByRole('article', { name });
      await expect(card.getByText('Waiting for pairing', { exact: true })).toBeVisible();
      await expect(card).toContainText('Wall board');
      await expect(card).toContainText('Never');
    } finally {
      const ids = (await db('stations').where({ kind: 'board', name }).pluck('id')) as string[];
      await db('audit_log').where({ entity: 'station' }).whereIn('entity_id', ids).delete();
      await db('stations').whereIn('id', ids).delete();
    }
  });

  test('a machine station needs a machine, said under the field', async ({ page, signInAs, made }) => {
    await made.machine();
    await signInAs('admin');
    await page.goto('/setup/stations');

    await page.getByRole('button', { name: 'Add a station' }).click();
    const adding = page.getByRole('dialog', { name: 'Add a station' });
    await adding.getByRole('button', { name: 'Add station' }).click();

    const machineField = adding.getByRole('combobox', { name: 'Machine' });
    await expect(machineField).toHaveAttribute('aria-invalid', 'true');
    await expect(machineField).toHaveAccessibleDescription(/A machine station needs a machine\./);
  });

  test('an instructor cannot open Stations, and the API refuses them the list', async ({ page, signInAs }) => {
    await signInAs('instructor');

    await page.goto('/setup/stations');

    await expect(page.getByRole('heading', { name: /don['’]t have access to Setup/ })).toBeVisible();
    await expect(page.getByRole('button', { name: 'Add a station' })).toHaveCount(0);
    expect((await page.request.get('/api/stations')).status()).toBe(403);
  });
});
