import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, expect } from 'vitest';
import { cribItemSchema, type CribItem } from '@chuckkey/core';
import type { CreatedMember } from '@chuckkey/db/factories';
import { createTestContext, signedIn, type Browser, type TestContext } from '../../test/harness';

/**
 * The set-up a crib test file shares: a context on the shared test database with an admin signed
 * in, made before the file's tests and closed after them, and the admin adding items through the
 * API. `ctx` and `admin` are there once the file's tests run.
 */
export function cribFixtures() {
  let ctx: TestContext | undefined;
  let admin: (Browser & { member: CreatedMember }) | undefined;
  beforeAll(async () => {
    ctx = createTestContext();
    admin = await signedIn(ctx, 'admin');
  });
  afterAll(() => ctx?.close());

  const made = <T>(value: T | undefined): T => {
    if (value === undefined) throw new Error('the crib fixtures are made before the file’s tests');
    return value;
  };
  const add = async (fields: Record<string, unknown>): Promise<CribItem> => {
    const res = await made(admin).post('/api/crib/items', fields);
    expect(res.status).toBe(201);
    return cribItemSchema.parse(res.body);
  };

  return {
    get ctx() {
      return made(ctx);
    },
    get admin() {
      return made(admin);
    },
    /** A tool with a tag no other test uses (upper case, as printed labels are). */
    tool: (fields: Record<string, unknown> = {}) =>
      add({ kind: 'tool', name: 'Telescoping bore gauge set', assetTag: `T-${randomUUID().slice(0, 13).toUpperCase()}`, binLocation: 'B2', ...fields }),
    /** A consumable counted `each`, `stock` of them on the shelf. */
    consumable: (stock: number, fields: Record<string, unknown> = {}) =>
      add({ kind: 'consumable', name: `Carbide insert ${randomUUID().slice(0, 4)}`, unit: 'each', stock, priceCents: 375, binLocation: 'C4', ...fields }),
  };
}
