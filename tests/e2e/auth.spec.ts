import { expect, test, signIn } from './fixtures';

const RESET_LINK = /\/reset-password\?token=[A-Za-z0-9_-]+/;

test.describe('signing in', () => {
  test('a wrong password shows one error that does not say which part was wrong, and keeps the e-mail', async ({
    page,
    createUser,
    unknownEmail,
  }) => {
    const member = await createUser();
    await page.goto('/sign-in');

    await page.getByLabel('E-mail').fill(member.email);
    await page.getByLabel('Password', { exact: true }).fill('not-the-right-password');
    await page.getByRole('button', { name: 'Sign in' }).click();

    const alert = page.getByRole('alert');
    await expect(alert).toHaveCount(1);
    const wrongPasswordMessage = (await alert.innerText()).trim();
    expect(wrongPasswordMessage).not.toBe('');
    await expect(page.getByLabel('E-mail')).toHaveValue(member.email);
    await expect(page.getByRole('navigation', { name: 'Main' })).toHaveCount(0);

    // OWASP Authentication Cheat Sheet: the same answer for an unknown account and a wrong password.
    await page.getByLabel('E-mail').fill(unknownEmail);
    await page.getByLabel('Password', { exact: true }).fill('not-the-right-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(alert).toHaveCount(1);
    await expect(alert).toHaveText(wrongPasswordMessage);
  });

  test('a member who forgot the password sets a new one from the e-mailed link and signs in with it', async ({
    page,
    db,
    createUser,
  }) => {
    const member = await createUser();
    const newPassword = 'a-fresh-lathe-password-42';

    await page.goto('/sign-in');
    await page.getByRole('link', { name: /forgot/i }).click();
    await page.getByLabel('E-mail').fill(member.email);
    await page.getByRole('button', { name: 'Send the link' }).click();
    await expect(page.getByRole('status').filter({ hasText: /sent a link/i })).toBeVisible();

    let link = '';
    await expect
      .poll(
        async () => {
          const mail = await db('outbox_messages')
            .whereRaw('? = any(to_addresses)', [member.email])
            .orderBy('received_at', 'desc')
            .first<{ text_body: string } | undefined>('text_body');
          link = mail?.text_body.match(RESET_LINK)?.[0] ?? '';
          return link;
        },
        { message: 'a password reset mail reaches the outbox', timeout: 10_000 },
      )
      .toMatch(RESET_LINK);

    await page.goto(link);
    await page.getByLabel('New password', { exact: true }).fill(newPassword);
    await page.getByLabel('Confirm new password').fill(newPassword);
    await page.getByRole('button', { name: 'Set new password' }).click();
    await expect(page.getByText('Your new password is set')).toBeVisible();

    await signIn(page, member.email, newPassword);
  });
});
