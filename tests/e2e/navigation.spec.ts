import type { Role } from '@chuckkey/core';
import { expect, signOut, test } from './fixtures';

const linksByRole: Record<Role, string[]> = {
  member: ['Shop floor', 'Reserve', 'My record', 'Profile'],
  instructor: ['Shop floor', 'Reserve', 'My record', 'Profile', 'Teach', 'Upkeep'],
  admin: ['Shop floor', 'Reserve', 'My record', 'Profile', 'Teach', 'People', 'Crib', 'Upkeep', 'Usage', 'Setup', 'Outbox'],
};

const article = (role: Role) => (role === 'admin' || role === 'instructor' ? 'an' : 'a');

test.describe('main navigation', () => {
  for (const [role, links] of Object.entries(linksByRole) as [Role, string[]][]) {
    test(`${article(role)} ${role} sees exactly ${links.join(', ')} in the main navigation`, async ({ page, signInAs }) => {
      await signInAs(role);

      const navLinks = page.getByRole('navigation', { name: 'Main' }).getByRole('link');
      await expect(navLinks).toHaveCount(links.length);
      // In the order of screens.md: everyone's pages first, then the instructors', then the admins'.
      const names = (await navLinks.allInnerTexts()).map((text) => text.trim());
      expect(names).toEqual(links);
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

  test('an instructor cannot open Setup, and the API refuses them a new machine', async ({ page, signInAs }) => {
    await signInAs('instructor');

    await page.goto('/setup/machines');

    await expect(page.getByRole('heading', { name: /don['’]t have access to Setup/ })).toBeVisible();
    await expect(page.getByRole('link', { name: 'Add a machine' })).toHaveCount(0);
    const { token } = (await (await page.request.get('/api/auth/csrf')).json()) as { token: string };
    const created = await page.request.post('/api/machines', {
      headers: { 'x-csrf-token': token },
      data: { name: 'Not allowed', category: 'lathe', areaId: '00000000-0000-4000-8000-000000000000' },
    });
    expect(created.status()).toBe(403);
  });

  test('an admin finds the sign-off report and the audit log under People', async ({ page, signInAs }) => {
    await signInAs('admin');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'People' }).click();
    const people = page.getByRole('navigation', { name: 'People' });
    await people.getByRole('link', { name: 'Sign-offs' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Sign-offs to renew' })).toBeVisible();
    await people.getByRole('link', { name: 'Audit log' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Audit log' })).toBeVisible();
  });

  test('signing out returns to the sign-in page and ends the session', async ({ page, signInAs }) => {
    await signInAs('member');

    await signOut(page);

    await expect(page.getByRole('button', { name: 'Sign in' })).toBeVisible();
    await expect(page.getByRole('navigation', { name: 'Main' })).toHaveCount(0);
    const me = await page.request.get('/api/auth/me');
    expect(me.status()).toBe(401);
  });
});
