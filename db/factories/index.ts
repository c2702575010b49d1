import { randomUUID } from 'node:crypto';
import type { Knex } from 'knex';
import type { MachineCategory, Role } from '@chuckkey/core';
import { hashPassword } from '../src/passwords';

/** Builders shared by the demo seeds and the tests: each inserts one row and returns it. */

export interface MemberRow {
  id: string;
  email: string;
  first_name: string;
  last_name: string;
  role: Role;
  password_hash: string | null;
  active: boolean;
  created_at: Date;
  updated_at: Date;
}

export interface CreatedMember extends MemberRow {
  password: string;
}

export const TEST_PASSWORD = 'workshop-test-password';

const hashCache = new Map<string, Promise<string>>();
function cachedHash(password: string): Promise<string> {
  let hashed = hashCache.get(password);
  if (!hashed) {
    hashed = hashPassword(password);
    hashCache.set(password, hashed);
  }
  return hashed;
}

export function uniqueEmail(prefix = 'member'): string {
  return `${prefix}-${randomUUID().slice(0, 12)}@test.example.org`;
}

export async function createMember(
  db: Knex,
  overrides: Partial<Omit<MemberRow, 'id' | 'password_hash' | 'created_at' | 'updated_at'>> & {
    password?: string;
  } = {},
): Promise<CreatedMember> {
  const { password = TEST_PASSWORD, ...fields } = overrides;
  const [row] = await db<MemberRow>('members')
    .insert({
      email: fields.email ?? uniqueEmail(fields.role ?? 'member'),
      first_name: fields.first_name ?? 'Test',
      last_name: fields.last_name ?? 'Member',
      role: fields.role ?? 'member',
      active: fields.active ?? true,
      password_hash: await cachedHash(password),
    })
    .returning('*');
  if (!row) throw new Error('member insert returned no row');
  return { ...row, password };
}

export async function deleteMembers(db: Knex, ids: string[]): Promise<void> {
  if (ids.length === 0) return;
  // Their sign-offs and audit entries, given or received, go with them.
  await db('audit_log').whereIn('member_id', ids).orWhereIn('actor_id', ids).delete();
  await db('sign_offs').whereIn('member_id', ids).orWhereIn('signed_by', ids).orWhereIn('revoked_by', ids).delete();
  await db('invitations').whereIn('invited_by', ids).delete();
  await db('members').whereIn('id', ids).delete();
}

export async function ensureShop(
  db: Knex,
  shop: { name: string; town: string; time_zone: string } = {
    name: 'Test Shop',
    town: 'Testville',
    time_zone: 'UTC',
  },
): Promise<void> {
  await db('shop').insert({ id: 1, ...shop }).onConflict('id').ignore();
}

export interface AreaRow {
  id: string;
  name: string;
  sort_order: number;
}

export async function createArea(db: Knex, overrides: Partial<Omit<AreaRow, 'id'>> = {}): Promise<AreaRow> {
  const [row] = await db<AreaRow>('areas')
    .insert({ name: overrides.name ?? `Area ${randomUUID().slice(0, 8)}`, sort_order: overrides.sort_order ?? 0 })
    .returning('*');
  if (!row) throw new Error('area insert returned no row');
  return row;
}

export interface MachineRow {
  id: string;
  name: string;
  category: MachineCategory;
  area_id: string;
  reservable: boolean;
  meter_hours: number;
  created_at: Date;
}

export async function createMachine(
  db: Knex,
  overrides: Partial<Omit<MachineRow, 'id' | 'created_at'>> = {},
): Promise<MachineRow> {
  const areaId = overrides.area_id ?? (await createArea(db)).id;
  const [row] = await db<MachineRow>('machines')
    .insert({
      name: overrides.name ?? `Machine ${randomUUID().slice(0, 8)}`,
      category: overrides.category ?? 'lathe',
      area_id: areaId,
      reservable: overrides.reservable ?? false,
      meter_hours: overrides.meter_hours ?? 0,
    })
    .returning('*');
  if (!row) throw new Error('machine insert returned no row');
  return row;
}

export * from './trainings';
export * from './badges';
