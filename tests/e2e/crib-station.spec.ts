import type { Page } from '@playwright/test';
import type { CreatedMember } from '@chuckkey/db/factories';
import { expectNoWcagViolations } from './axe';
import { expect, test } from './fixtures';
import { cribStationWithBoreGauge, typeBadge } from './station-fixtures';

/**
 * A hand scanner types the tag and Enter a few milliseconds apart with no field focused; the
 * keys are sent from inside the page in one go, as the machine station's scanner test does.
 */
async function scanTag(page: Page, tag: string) {
  await page.evaluate((keys) => {
    for (const key of keys) document.body.dispatchEvent(new KeyboardEvent('keydown', { key, bubbles: true }));
  }, [...tag, 'Enter']);
}

/** Signs the admin in on the page's own request context, as the web app does (CSRF token first). */
async function signInOnRequest(page: Page, admin: CreatedMember) {
  const { token } = (await (await page.request.get('/api/auth/csrf')).json()) as { token: string };
  const login = await page.request.post('/api/auth/login', { headers: { 'x-csrf-token': token }, data: { email: admin.email, password: admin.password } });
  expect(login.status()).toBe(200);
}

test.describe('the crib station', () => {
  test('a member checks out a bore gauge and returns it damaged; it lands on the admins’ attention list', async ({ page, db, createUser }) => {
    const admin = await createUser({ role: 'admin' });
    const member = await createUser({ role: 'member', first_name: 'Rosalind' });
    const crib = await cribStationWithBoreGauge(page, db, { admin, member });
    try {
      await expect(page.getByText('Tool crib', { exact: true })).toBeVisible();
      await expect(page.getByRole('button', { name: 'Return items' })).toBeVisible();

      await typeBadge(page, crib.badge.code);
      await expect(page.getByRole('heading', { name: 'Hello, Rosalind' })).toBeVisible();
      await expect(page.getByRole('heading', { name: 'You have nothing out' })).toBeVisible();

      await scanTag(page, crib.tool.assetTag);
      const basket = page.getByRole('region', { name: 'Basket (1)' });
      const line = basket.getByRole('listitem').filter({ hasText: 'Telescoping bore gauge' });
      // The tool's loan period is 48 hours, so it is due back on a day named by its weekday.
      await expect(line).toContainText(/Due back \w+ \d{2}:\d{2}/);
      await expect(page.getByRole('status').filter({ hasText: 'Added Telescoping bore gauge' })).toBeVisible();
      await expectNoWcagViolations(page);

      await page.getByRole('button', { name: 'Confirm checkout' }).click();
      await expect(page.getByRole('heading', { name: 'Checked out, Rosalind' })).toBeVisible();
      await expect(page.getByText(/^Due back \w+ \d{2}:\d{2}$/).first()).toBeVisible();
      const out = await db('crib_checkouts').where({ item_id: crib.tool.id }).whereNull('returned_at').select('member_id', 'recorded_by');
      expect(out).toEqual([{ member_id: member.id, recorded_by: member.id }]);
      await page.getByRole('button', { name: 'Done' }).click();

      await page.getByRole('button', { name: 'Return items' }).click();
      await expect(page.getByRole('heading', { name: 'Return items' })).toBeVisible();
      await page.getByRole('button', { name: 'Type tag' }).click();
      await page.getByLabel('Asset tag').fill(crib.tool.assetTag.toLowerCase());
      await page.getByRole('button', { name: 'Use this tag' }).click();
      await expect(page.getByRole('heading', { name: 'Telescoping bore gauge' })).toBeVisible();
      await expect(page.getByText(/Out to Rosalind until/)).toBeVisible();

      await page.getByText('Damaged', { exact: true }).click();
      // A damaged tool needs a note before it can be returned.
      await expect(page.getByRole('button', { name: 'Return', exact: true })).toBeDisabled();
      await page.getByLabel('Note (required)').fill('The small gauge’s plunger sticks and one contact is bent.');
      await expectNoWcagViolations(page);
      await page.getByRole('button', { name: 'Return', exact: true }).click();
      await expect(page.getByRole('heading', { name: 'Telescoping bore gauge is back. Thank you.' })).toBeVisible();
      await expect(page.getByText('It stays off the shelf until an admin has looked at it.', { exact: false })).toBeVisible();
      await page.getByRole('button', { name: 'Done' }).click();
      await expect(page.getByText('Hold your badge to the camera or scan it')).toBeVisible();

      await signInOnRequest(page, admin);
      const attention = await page.request.get('/api/crib/attention');
      expect(attention.status()).toBe(200);
      expect(await attention.json()).toContainEqual(
        expect.objectContaining({ itemId: crib.tool.id, assetTag: crib.tool.assetTag, condition: 'damaged', note: 'The small gauge’s plunger sticks and one contact is bent.' }),
      );
    } finally {
      await crib.cleanUp();
    }
  });
});
