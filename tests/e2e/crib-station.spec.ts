import { expectNoWcagViolations } from './axe';
import { expect, signIn, test } from './fixtures';
import { cribStationWithBoreGauge, scanWithHandScanner, typeBadge } from './station-fixtures';

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

      await scanWithHandScanner(page, crib.tool.assetTag);
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

      // The admin signs in to the web app in the same browser: the gauge waits on the attention list
      // with the condition and note the member gave at the station.
      await signIn(page, admin.email, admin.password);
      await page.goto('/crib/attention');
      await expect(page.getByRole('heading', { name: 'Needs attention', level: 1 })).toBeVisible();
      const waiting = page.getByRole('table', { name: 'Tools that need attention' }).getByRole('row').filter({ hasText: crib.tool.assetTag });
      await expect(waiting).toContainText('Telescoping bore gauge');
      await expect(waiting).toContainText('Damaged');
      await expect(waiting).toContainText('The small gauge’s plunger sticks and one contact is bent.');
      await expect(waiting.getByRole('link', { name: /^Rosalind / })).toBeVisible();
    } finally {
      await crib.cleanUp();
    }
  });
});
