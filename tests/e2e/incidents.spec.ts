import { createMachine } from '@chuckkey/db/factories';
import { expectNoWcagViolations } from './axe';
import { expect, signIn, signOut, test } from './fixtures';

// The smallest valid PNG: 1 × 1 pixel (PNG specification, signature §5.2 and chunks IHDR, IDAT, IEND).
const ONE_PIXEL_PNG = 'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==';

test.describe('incident reports', () => {
  test('a member reports a near miss with a photo; an admin opens it in Upkeep, sees the photo, adds a note and closes it', async ({ page, db, createUser, shop }) => {
    expect(shop.timeZone).toBeTruthy();
    const member = await createUser({ role: 'member', first_name: 'Rosalind' });
    const admin = await createUser({ role: 'admin', first_name: 'Casimir' });
    const machine = await createMachine(db, { name: `Lathe ${Date.now() % 100_000}`, category: 'lathe' });
    try {
      // The member finds the form from the shop floor.
      await signIn(page, member.email, member.password);
      await page.getByRole('link', { name: 'Report an incident' }).click();
      await expect(page.getByRole('heading', { level: 1, name: 'Report an incident' })).toBeVisible();
      await expect(page.getByText('In an emergency call emergency services first.')).toBeVisible();
      await expect(page.getByText('This report does not replace first aid or any report you must make under local law.')).toBeVisible();
      await expect(page.getByText('Up to 5 photos, JPEG or PNG, each at most 10 MB.')).toBeVisible();

      await page.getByLabel('Where exactly (optional)').fill('At the lathe, tailstock end');
      await page.getByLabel('Machine (optional)').selectOption({ label: machine.name });
      await page.getByRole('radio', { name: 'Near miss' }).check();
      await page.getByLabel('What happened?').fill('The chuck key was left in the chuck. I saw it before switching on and took it out.');
      await page.getByLabel('Add photos').setInputFiles({ name: 'chuck-key.png', mimeType: 'image/png', buffer: Buffer.from(ONE_PIXEL_PNG, 'base64') });
      await expect(page.getByRole('img', { name: 'Photo 1: chuck-key.png' })).toBeVisible();
      await expectNoWcagViolations(page);
      await page.getByRole('button', { name: 'Send report' }).click();
      await expect(page.getByRole('status').filter({ hasText: 'Your report is sent' })).toBeFocused();
      await signOut(page);

      // The admin finds it under Upkeep › Incidents.
      await signIn(page, admin.email, admin.password);
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Upkeep' }).click();
      await page.getByRole('navigation', { name: 'Upkeep' }).getByRole('link', { name: 'Incidents' }).click();
      await expect(page.getByRole('heading', { level: 1, name: 'Incidents' })).toBeVisible();
      const row = page.getByRole('table', { name: 'Incident reports' }).getByRole('row').filter({ hasText: machine.name });
      await expect(row).toContainText('Near miss');
      await expect(row).toContainText('Open');
      await expect(row).toContainText(`Rosalind ${member.last_name}`);
      await row.getByRole('link').click();

      await expect(page.getByRole('heading', { level: 1, name: /^Near miss, / })).toBeVisible();
      await expect(page.getByText('The chuck key was left in the chuck.')).toBeVisible();
      const photo = page.getByRole('img', { name: 'Photo 1 of the incident (opens full size)' });
      await expect(photo).toBeVisible();
      // Loaded from the server, not a broken image: the browser decoded its one pixel.
      await expect.poll(() => photo.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(1);

      await page.getByLabel('Add a follow-up note').fill('Talked to the class about the chuck key; a spring-loaded key is on order.');
      await page.getByRole('button', { name: 'Add note' }).click();
      await expect(page.getByRole('listitem').filter({ hasText: 'a spring-loaded key is on order' })).toContainText(`Casimir ${admin.last_name}`);

      await page.getByLabel('Status', { exact: true }).selectOption('closed');
      await page.getByRole('button', { name: 'Save status' }).click();
      await expect(page.getByText('Status saved.')).toBeVisible();
      await expectNoWcagViolations(page);
      await expect(page.getByRole('definition').filter({ hasText: 'Closed' })).toBeVisible();

      const stored = await db('incidents').where({ machine_id: machine.id }).select('id', 'status', 'kind', 'reported_by');
      expect(stored).toEqual([{ id: expect.any(String), status: 'closed', kind: 'near_miss', reported_by: member.id }]);
      expect(await db('incident_photos').where({ incident_id: stored[0]!.id }).select('content_type')).toEqual([{ content_type: 'image/png' }]);
    } finally {
      await db('incidents').where({ machine_id: machine.id }).delete();
      await db('machines').where({ id: machine.id }).delete();
    }
  });
});
