import { expectNoWcagViolations } from './axe';
import { expect, signIn, signOut, test } from './fixtures';

test.describe('the crib’s lists in the web app', () => {
  // Three sign-ins, a member search, two dialogs and an accessibility scan.
  test.setTimeout(120_000);

  test('an admin lends a bore gauge to a member, who sees it on My record; returned as needs attention it waits on the attention list until put back in circulation', async ({
    page,
    db,
    createUser,
  }) => {
    const suffix = Date.now() % 100_000;
    const admin = await createUser({ role: 'admin', first_name: 'Rosalind' });
    const member = await createUser({ role: 'member', first_name: 'Hollis', last_name: `Varga${suffix}` });
    const memberName = `Hollis Varga${suffix}`;
    const toolName = `Telescoping bore gauge ${suffix}`;
    const assetTag = `BG-${suffix}`;
    // A loan period of its own, so the due time does not hang on today's opening hours.
    const [tool] = await db('crib_items')
      .insert({ kind: 'tool', name: toolName, asset_tag: assetTag, bin_location: 'C3', condition: 'good', in_circulation: true, loan_period_hours: 4 })
      .returning<{ id: string }[]>('id');
    if (!tool) throw new Error('crib item insert returned no row');

    try {
      await signIn(page, admin.email, admin.password);
      await page.goto('/crib/checkouts');
      await expect(page.getByRole('heading', { name: 'Checkouts', level: 1 })).toBeVisible();
      await expect(page.getByRole('navigation', { name: 'Crib' }).getByRole('link', { name: 'Checkouts' })).toHaveAttribute('aria-current', 'page');

      const form = page.getByRole('form', { name: 'Check out from the crib' });
      await form.getByRole('searchbox', { name: 'Find the member' }).fill(`Varga${suffix}`);
      await form.getByRole('button', { name: `Choose ${memberName}` }).click();
      await expect(form.getByText('Checking out to')).toBeVisible();
      await form.getByRole('combobox', { name: 'Item' }).selectOption({ label: `${toolName} · ${assetTag} · bin C3` });
      await form.getByRole('button', { name: 'Check out' }).click();

      const lent = page.getByRole('status').filter({ hasText: 'Checked out' });
      await expect(lent).toContainText(`${toolName} is out to ${memberName}, due back`);

      // The tool's own loan period, 4 hours from now (product rule, product.md "Crib"); a few
      // seconds may pass between the checkout and the reading of the row.
      const row = page.getByRole('table', { name: 'Checked-out tools' }).getByRole('row').filter({ hasText: toolName });
      await expect(row).toContainText(memberName);
      await expect(row).toContainText(/Due in (4 h|3 h 59 min)/);
      await expectNoWcagViolations(page);
      await signOut(page);

      await signIn(page, member.email, member.password);
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'My record' }).click();
      const mine = page.getByRole('list', { name: 'What I have out' });
      await expect(mine.getByRole('listitem').filter({ hasText: toolName })).toContainText(/Due in (4 h|3 h 59 min)/);
      await signOut(page);

      await signIn(page, admin.email, admin.password);
      await page.goto('/crib/checkouts');
      await page.getByRole('button', { name: `Return ${toolName} from ${memberName}` }).click();
      const returnDialog = page.getByRole('dialog', { name: `Return ${toolName}` });
      await returnDialog.getByRole('radio', { name: /^Needs attention/ }).check();
      await expect(returnDialog).toContainText(`${toolName} goes out of circulation`);
      await returnDialog.getByRole('textbox', { name: 'Note (optional)' }).fill('Plunger sticks halfway.');
      await returnDialog.getByRole('button', { name: 'Record return' }).click();
      await expect(returnDialog).toBeHidden();
      await expect(page.getByRole('status').filter({ hasText: 'Return recorded' })).toContainText('out of circulation');
      await expect(page.getByRole('table', { name: 'Checked-out tools' }).getByRole('row').filter({ hasText: toolName })).toHaveCount(0);

      await page.getByRole('navigation', { name: 'Crib' }).getByRole('link', { name: 'Needs attention' }).click();
      await expect(page.getByRole('heading', { name: 'Needs attention', level: 1 })).toBeVisible();
      const waiting = page.getByRole('table', { name: 'Tools that need attention' }).getByRole('row').filter({ hasText: toolName });
      await expect(waiting).toContainText('Needs attention');
      await expect(waiting).toContainText('Plunger sticks halfway.');
      await expect(waiting).toContainText(memberName);

      await waiting.getByRole('button', { name: `Put ${toolName} (${assetTag}) back in circulation` }).click();
      const restoreDialog = page.getByRole('dialog', { name: `Put ${toolName} back in circulation?` });
      await restoreDialog.getByRole('textbox', { name: 'What was done (optional)' }).fill('Plunger cleaned and oiled.');
      await restoreDialog.getByRole('button', { name: 'Back in circulation' }).click();
      await expect(restoreDialog).toBeHidden();
      await expect(page.getByRole('status').filter({ hasText: 'Back in circulation' })).toContainText(`${toolName} is marked good`);
      await expect(page.getByRole('row').filter({ hasText: toolName })).toHaveCount(0);
      expect(await db('crib_items').first('condition', 'in_circulation').where({ id: tool.id })).toEqual({ condition: 'good', in_circulation: true });
    } finally {
      await db('crib_checkouts').where({ item_id: tool.id }).delete();
      await db('crib_items').where({ id: tool.id }).delete();
    }
  });

  test('a tool kept past its due time reads as overdue in words on the checkouts and on the overdue list, and both pages fit a phone', async ({ page, db, createUser }) => {
    const suffix = Date.now() % 100_000;
    const admin = await createUser({ role: 'admin' });
    const member = await createUser({ role: 'member', first_name: 'Petronella', last_name: `Quist${suffix}` });
    const toolName = `Thread pitch gauge ${suffix}`;
    const assetTag = `TG-${suffix}`;
    const [tool] = await db('crib_items')
      .insert({ kind: 'tool', name: toolName, asset_tag: assetTag, condition: 'good', in_circulation: true })
      .returning<{ id: string }[]>('id');
    if (!tool) throw new Error('crib item insert returned no row');
    // Lent five hours ago and due back two hours later: three hours overdue now.
    const now = Date.now();
    await db('crib_checkouts').insert({
      item_id: tool.id,
      item_kind: 'tool',
      member_id: member.id,
      quantity: 1,
      checked_out_at: new Date(now - 5 * 3_600_000),
      due_at: new Date(now - 3 * 3_600_000),
      recorded_by: admin.id,
    });

    try {
      await signIn(page, admin.email, admin.password);
      await page.goto('/crib/checkouts');
      const row = page.getByRole('table', { name: 'Checked-out tools' }).getByRole('row').filter({ hasText: toolName });
      // Whole minutes: 3 h, or 3 h 1 min once a minute has passed since the row was made.
      await expect(row).toContainText(/Overdue by 3 h( 1 min)?/);

      await page.getByRole('navigation', { name: 'Crib' }).getByRole('link', { name: 'Overdue' }).click();
      await expect(page.getByRole('heading', { name: 'Overdue', level: 1 })).toBeVisible();
      const overdue = page.getByRole('table', { name: 'Overdue tools' }).getByRole('row').filter({ hasText: toolName });
      await expect(overdue).toContainText(`Petronella Quist${suffix}`);
      await expect(overdue).toContainText(assetTag);
      await expect(overdue).toContainText(/Overdue by 3 h/);
      await expectNoWcagViolations(page);

      // Phone first: at 375 CSS px (a common small phone width; common practice, no published
      // source) the page does not scroll sideways; a wide table scrolls inside its own region.
      await page.setViewportSize({ width: 375, height: 812 });
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
      await page.goto('/crib/checkouts');
      await expect(page.getByRole('table', { name: 'Checked-out tools' })).toBeVisible();
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(375);
    } finally {
      await db('crib_checkouts').where({ item_id: tool.id }).delete();
      await db('crib_items').where({ id: tool.id }).delete();
    }
  });
});
