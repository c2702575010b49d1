import type { Role } from '@chuckkey/core';
import { expect, test } from './fixtures';

const linksByRole: Record<Role, string[]> = {
  member: ['Shop floor', 'Profile'],
  instructor: ['Shop floor', 'Profile'],
  admin: ['Shop floor', 'Profile', 'People', 'Outbox'],
};

const article = (role: Role) => (role === 'admin' || role === 'instructor' ? 'an' : 'a');

test.describe('main navigation', () => {
  for (const [role, links] of Object.entries(linksByRole) as [Role, string[]][]) {
    test(`${article(role)} ${role} sees exactly ${links.join(', ')} in the main navigation`, async ({ page, signInAs }) => {
      await signInAs(role);

      const navLinks = page.getByRole('navigation', { name: 'Main' }).getByRole('link');
      await expect(navLinks).toHaveCount(links.length);
      const names = (await navLinks.allInnerTexts()).map((text) => text.trim());
      expect(names.toSorted()).toEqual(links.toSorted());
    });
  }

  test('a member cannot open People', async ({ page, signInAs }) => {
    await signInAs('member');

    await page.goto('/people');

    await expect(page.getByText(/don['’]t have access/i).first()).toBeVisible();
    await expect(page.getByRole('table')).toHaveCount(0);
    const members = await page.request.get('/api/members');
    expect(members.status()).toBe(403);
  });

  test('signing out returns to the sign-in page and ends the session', async ({ page, signInAs }) => {
    await signInAs('member');

    await page.getByRole('button', { name: 'Sign out' }).click();

    await expect(page.getByRole('button', { name: 'Sign in' })).toBeVisible();
    await expect(page.getByRole('navigation', { name: 'Main' })).toHaveCount(0);
    const me = await page.request.get('/api/auth/me');
    expect(me.status()).toBe(401);
  });
});
