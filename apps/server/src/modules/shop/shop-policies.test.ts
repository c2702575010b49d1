import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { shopPoliciesSchema } from '@chuckkey/core';
import { browser, createTestContext, ownDatabase, signedIn, type Browser, type TestContext } from '../../test/harness';

let ctx: TestContext;
let admin: Browser & { member: { id: string } };
beforeAll(async () => {
  // The policies are shop-wide; clearance tests beside these read them from their own shops.
  ctx = createTestContext({ DATABASE_URL: await ownDatabase('shop_policies') });
  admin = await signedIn(ctx, 'admin');
});
afterAll(() => ctx.close());

describe('GET and PUT /api/shop/policies', () => {
  it('starts with the overdue-tool block off, and an admin turns it on and off again, each change in the audit log', async () => {
    // Off by default: product rule 8 ("both policies off by default").
    const initial = await admin.get('/api/shop/policies');
    expect(initial.status).toBe(200);
    expect(shopPoliciesSchema.parse(initial.body)).toEqual({ overdueCheckoutBlockDays: null });

    const on = await admin.put('/api/shop/policies', { overdueCheckoutBlockDays: 3 });
    expect(on.status).toBe(200);
    expect(on.body).toEqual({ overdueCheckoutBlockDays: 3 });
    expect((await admin.get('/api/shop/policies')).body).toEqual({ overdueCheckoutBlockDays: 3 });

    const zero = await admin.put('/api/shop/policies', { overdueCheckoutBlockDays: 0 });
    expect(zero.body).toEqual({ overdueCheckoutBlockDays: 0 });
    const off = await admin.put('/api/shop/policies', { overdueCheckoutBlockDays: null });
    expect(off.body).toEqual({ overdueCheckoutBlockDays: null });

    const entries = await ctx.db('audit_log').where({ action: 'shop.policies_changed' }).orderBy('id').select('actor_id', 'entity', 'entity_id', 'details');
    expect(entries.map((e) => e.details)).toEqual([
      { before: { overdueCheckoutBlockDays: null }, after: { overdueCheckoutBlockDays: 3 } },
      { before: { overdueCheckoutBlockDays: 3 }, after: { overdueCheckoutBlockDays: 0 } },
      { before: { overdueCheckoutBlockDays: 0 }, after: { overdueCheckoutBlockDays: null } },
    ]);
    expect(entries[0]).toMatchObject({ actor_id: admin.member.id, entity: 'shop', entity_id: '1' });
  });

  it.each([
    ['a negative number', -1],
    ['a fraction', 1.5],
    ['text', '2'],
    ['more than a year', 366],
    ['nothing', undefined],
  ])('answers 400 validation_failed for %s of days, keyed by the field, and changes nothing', async (_what, days) => {
    const before = (await admin.get('/api/shop/policies')).body;
    const res = await admin.put('/api/shop/policies', { overdueCheckoutBlockDays: days });
    // RFC 9457 problem details with field errors, as every route answers bad input.
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('validation_failed');
    expect(res.body.errors.overdueCheckoutBlockDays).toEqual(['Give a whole number of days from 0 to 365.']);
    expect((await admin.get('/api/shop/policies')).body).toEqual(before);
  });

  it('answers 403 to members and instructors, reading or changing, and 401 when signed out', async () => {
    for (const role of ['member', 'instructor'] as const) {
      const person = await signedIn(ctx, role);
      expect((await person.get('/api/shop/policies')).status).toBe(403);
      expect((await person.put('/api/shop/policies', { overdueCheckoutBlockDays: 1 })).status).toBe(403);
    }
    const anonymous = await browser(ctx);
    expect((await anonymous.get('/api/shop/policies')).status).toBe(401);
    expect((await anonymous.put('/api/shop/policies', { overdueCheckoutBlockDays: 1 })).status).toBe(401);
    expect((await ctx.db('shop').first('overdue_checkout_block_days').where({ id: 1 }))?.overdue_checkout_block_days).not.toBe(1);
  });
});
