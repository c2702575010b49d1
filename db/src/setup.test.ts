import knexFactory, { type Knex } from 'knex';
import { register } from 'tsx/esm/api';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { machineCategories } from '@chuckkey/core';
import { knexConfig } from './config';
import { verifyPassword } from './passwords';
import { dropDatabase, setupDatabase } from './setup';

// Knex imports migration and seed files at run time; tsx lets this process import TypeScript.
register();

const url = process.env.DATABASE_URL;
if (!url) throw new Error('DATABASE_URL must name a database these tests may drop and create (npm test sets it).');
const databaseUrl: string = url;

let db: Knex;
beforeAll(async () => {
  await dropDatabase(databaseUrl);
  await setupDatabase(databaseUrl, { seed: true });
  db = knexFactory(knexConfig(databaseUrl, { min: 0, max: 2 }));
});
afterAll(() => db?.destroy());

describe('the demo shop', () => {
  it('has about 40 members, 3 instructors and 2 admins, some no longer active', async () => {
    const rows: { role: string; count: number }[] = await db('members').select('role', db.raw('count(*)::int as count')).groupBy('role');
    const byRole = Object.fromEntries(rows.map((r) => [r.role, Number(r.count)]));
    expect(byRole.instructor).toBe(3);
    expect(byRole.admin).toBe(2);
    expect(byRole.member).toBeGreaterThanOrEqual(35);
    const inactive = await db('members').where({ active: false }).count({ count: '*' });
    expect(Number(inactive[0]?.count)).toBeGreaterThan(0);
  });

  it('lets the three demo accounts sign in with the documented password', async () => {
    const accounts = await db('members')
      .select('email', 'role', 'password_hash', 'active')
      .whereIn('email', ['admin@example.org', 'instructor@example.org', 'member@example.org'])
      .orderBy('email');
    expect(accounts.map((a) => [a.email, a.role, a.active])).toEqual([
      ['admin@example.org', 'admin', true],
      ['instructor@example.org', 'instructor', true],
      ['member@example.org', 'member', true],
    ]);
    for (const account of accounts) expect(await verifyPassword(account.password_hash, 'chuckkey-demo')).toBe(true);
  });

  it('has 12 machines across every category, each in an area of the shop', async () => {
    const machines = await db('machines').join('areas', 'areas.id', 'machines.area_id').select('machines.category', 'areas.name as area');
    expect(machines).toHaveLength(12);
    expect(new Set(machines.map((m) => m.category))).toEqual(new Set(machineCategories));
    expect(new Set(machines.map((m) => m.area)).size).toBeGreaterThanOrEqual(3);
  });

  it('uses only reserved example domains for e-mail (RFC 2606)', async () => {
    const emails = await db('members').pluck('email');
    expect(emails.every((e: string) => e.endsWith('@example.org'))).toBe(true);
  });
});

describe('set-up on a database that already has the shop', () => {
  it('runs no seed again and keeps what people changed', async () => {
    await db('members').where({ email: 'member@example.org' }).update({ first_name: 'Changed' });
    const before = await db('members').count({ count: '*' });
    const result = await setupDatabase(databaseUrl, { seed: true });
    expect(result.seeded).toBe(false);
    expect(result.migrations).toEqual([]);
    const after = await db('members').count({ count: '*' });
    expect(after).toEqual(before);
    expect(await db('members').where({ email: 'member@example.org' }).first('first_name')).toEqual({ first_name: 'Changed' });
  });
});

describe('migrations', () => {
  it('roll back completely and apply again', async () => {
    const scratch = knexFactory(knexConfig(databaseUrl, { min: 0, max: 1 }));
    try {
      await scratch.migrate.rollback(undefined, true);
      const left = await scratch.raw("select count(*)::int as n from information_schema.tables where table_schema = 'public' and table_name not like 'knex_%'");
      expect(left.rows[0].n).toBe(0);
      const [, applied] = await scratch.migrate.latest();
      expect(applied.length).toBeGreaterThan(0);
    } finally {
      await scratch.destroy();
    }
  });
});
