import { expectNoWcagViolations } from './axe';
import { expect, test } from './fixtures';

test.describe('policies under Setup', () => {
  test('an admin turns on the overdue-tool block with a number of days, is told of a bad number under the field, and turns it off again', async ({
    page,
    db,
    signInAs,
  }) => {
    await db('shop').where({ id: 1 }).update({ overdue_checkout_block_days: null });
    try {
      await signInAs('admin');
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Setup' }).click();
      await page.getByRole('navigation', { name: 'Setup' }).getByRole('link', { name: 'Policies' }).click();
      await expect(page.getByRole('heading', { level: 1, name: 'Policies' })).toBeVisible();
      await expect(page.getByText('Off by default.')).toBeVisible();

      const block = page.getByRole('switch', { name: 'Block machine use when a crib tool is overdue' });
      await expect(block).not.toBeChecked();
      await expect(page.getByRole('textbox', { name: 'Days overdue before machines refuse' })).toHaveCount(0);
      // WCAG 2.2 level A and AA via axe-core (tags wcag2a, wcag2aa, wcag21aa, wcag22aa), with the switch on screen.
      await expectNoWcagViolations(page);

      // By keyboard alone: Space flips a switch (WAI-ARIA Authoring Practices, switch pattern).
      await block.focus();
      await page.keyboard.press('Space');
      await expect(block).toBeChecked();
      const days = page.getByRole('textbox', { name: 'Days overdue before machines refuse' });
      await days.fill('400');
      await page.getByRole('button', { name: 'Save policies' }).click();
      await expect(days).toBeFocused();
      await expect(days).toHaveAttribute('aria-invalid', 'true');
      await expect(days).toHaveAccessibleDescription(/Give a whole number of days from 0 to 365\./);

      await days.fill('2');
      await page.getByRole('button', { name: 'Save policies' }).click();
      await expect(page.getByRole('status').filter({ hasText: 'Policies saved.' })).toBeFocused();
      expect((await db('shop').first('overdue_checkout_block_days').where({ id: 1 }))?.overdue_checkout_block_days).toBe(2);

      await page.reload();
      await expect(block).toBeChecked();
      await expect(days).toHaveValue('2');

      await block.click();
      await page.getByRole('button', { name: 'Save policies' }).click();
      await expect(page.getByRole('status').filter({ hasText: 'Policies saved.' })).toBeFocused();
      expect((await db('shop').first('overdue_checkout_block_days').where({ id: 1 }))?.overdue_checkout_block_days).toBeNull();
    } finally {
      await db('shop').where({ id: 1 }).update({ overdue_checkout_block_days: null });
    }
  });
});
