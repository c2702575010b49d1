import { test as base, expect, type Page } from '@playwright/test';
import type { Role } from '@chuckkey/core';
import { knexConfig } from '@chuckkey/db';
import { createMember, deleteMembers, ensureShop, uniqueEmail, type CreatedMember } from '@chuckkey/db/factories';
import knexFactory, { type Knex } from 'knex';

export { expect };

export interface ShopFacts {
  name: string;
  town: string;
  timeZone: string;
}

type MemberOverrides = NonNullable<Parameters<typeof createMember>[1]>;

interface TestFixtures {
  /** Inserts a member (password TEST_PASSWORD unless given) and deletes it after the test. */
  createUser: (overrides?: MemberOverrides) => Promise<CreatedMember>;
  /** Creates a person with this role and signs them in through the sign-in page. */
  signInAs: (role: Role) => Promise<CreatedMember>;
  /** An address with no account; the sign-in attempts made with it are deleted after the test. */
  unknownEmail: string;
}

interface WorkerFixtures {
  db: Knex;
  shop: ShopFacts;
}

// The test runner migrates an empty database without the demo shop; a database that already
// has its shop keeps it.
const testShop = { name: 'Testbench Metal Shop', town: 'Testville', time_zone: 'America/Chicago' };

export async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeVisible();
}

/**
 * Signs out through the web app and waits until the server has ended the session, so that a
 * sign-in or request that follows cannot race the sign-out (and lose its own session to it).
 */
export async function signOut(page: Page): Promise<void> {
  const ended = page.waitForResponse((response) => new URL(response.url()).pathname === '/api/auth/logout' && response.request().method() === 'POST');
  await page.getByRole('button', { name: 'Sign out' }).click();
  expect((await ended).ok()).toBe(true);
}

export const test = base.extend<TestFixtures, WorkerFixtures>({
  db: [
    async ({}, use) => {
      const url = process.env.DATABASE_URL;
      if (!url) throw new Error('DATABASE_URL is not set: the browser tests arrange and clean up rows in the server’s database.');
      const db = knexFactory(knexConfig(url, { min: 0, max: 2 }));
      await use(db);
      await db.destroy();
    },
    { scope: 'worker' },
  ],

  shop: [
    async ({ db }, use) => {
      // The shop row is the one configuration row every screen reads, shared by all workers,
      // so it is ensured and left in place rather than created and deleted per test.
      await ensureShop(db, testShop);
      const row = await db('shop').where({ id: 1 }).first<ShopFacts>({ name: 'name', town: 'town', timeZone: 'time_zone' });
      if (!row) throw new Error('the shop row is missing after ensureShop');
      await use(row);
    },
    { scope: 'worker' },
  ],

  createUser: async ({ db }, use) => {
    const created: CreatedMember[] = [];
    await use(async (overrides = {}) => {
      const member = await createMember(db, overrides);
      created.push(member);
      return member;
    });
    if (created.length === 0) return;
    const emails = created.map((member) => member.email);
    const ids = created.map((member) => member.id);
    // Mail and sign-in attempts that the server recorded for these people go with them, and so
    // do the records that name them (sign-offs, audit entries), which would block the delete.
    await db('outbox_messages').whereRaw('to_addresses && ?::text[]', [emails]).delete();
    await db('sign_in_attempts').whereIn('email', emails).delete();
    await db('audit_log').whereIn('actor_id', ids).orWhereIn('member_id', ids).delete();
    await db('sign_offs').whereIn('member_id', ids).orWhereIn('signed_by', ids).orWhereIn('revoked_by', ids).delete();
    await deleteMembers(db, ids);
  },

  unknownEmail: async ({ db }, use) => {
    const email = uniqueEmail('nobody');
    await use(email);
    await db('sign_in_attempts').where({ email }).delete();
  },

  signInAs: async ({ page, createUser }, use) => {
    await use(async (role) => {
      const member = await createUser({ role });
      await signIn(page, member.email, member.password);
      return member;
    });
  },
});
