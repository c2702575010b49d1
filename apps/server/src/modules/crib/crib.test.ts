import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { cribCheckoutSchema, cribItemPublicSchema, cribItemSchema } from '@chuckkey/core';
import { createMember } from '@chuckkey/db/factories';
import { browser, signedIn } from '../../test/harness';
import { cribFixtures } from './crib.fixtures';

const crib = cribFixtures();

describe('crib items', () => {
  it('lets an admin add a tool and answers 409 asset_tag_taken for a second tool with its tag', async () => {
    const first = await crib.tool({ serialNumber: 'SN-1' });
    expect(first).toMatchObject({ kind: 'tool', condition: 'good', inCirculation: true, loanPeriodHours: null, stock: null, available: true });
    const again = await crib.admin.post('/api/crib/items', { kind: 'tool', name: 'Another', assetTag: first.assetTag });
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('asset_tag_taken');
    expect(await crib.ctx.db('audit_log').where({ action: 'crib.item_created', entity_id: first.id }).count({ n: '*' }).first()).toEqual({ n: 1 });
  });

  it('answers 400 with field errors for a consumable without a unit or a negative stock', async () => {
    const res = await crib.admin.post('/api/crib/items', { kind: 'consumable', name: 'Inserts', stock: -1, priceCents: 100 });
    expect(res.status).toBe(400);
    expect(res.body.errors.unit).toBeDefined();
    expect(res.body.errors.stock).toBeDefined();
  });

  it('lets an admin change an item, and answers 404 for one that does not exist', async () => {
    const item = await crib.tool();
    const res = await crib.admin.put(`/api/crib/items/${item.id}`, { kind: 'tool', name: 'Outside micrometer 1–2 in', assetTag: item.assetTag, loanPeriodHours: 48 });
    expect(res.status).toBe(200);
    expect(cribItemSchema.parse(res.body)).toMatchObject({ name: 'Outside micrometer 1–2 in', loanPeriodHours: 48 });
    const missing = await crib.admin.put(`/api/crib/items/${randomUUID()}`, { kind: 'tool', name: 'Nothing', assetTag: 'T-none' });
    expect(missing.status).toBe(404);
    expect(missing.body.code).toBe('crib_item_not_found');
  });

  it('shows members only the name, kind, bin and whether an item can be had', async () => {
    const item = await crib.tool();
    const member = await signedIn(crib.ctx, 'member');
    const res = await member.get('/api/crib/items');
    expect(res.status).toBe(200);
    const mine = (res.body as unknown[]).map((row) => cribItemPublicSchema.strict().parse(row)).find((row) => row.id === item.id);
    expect(mine).toEqual({ id: item.id, kind: 'tool', name: item.name, binLocation: 'B2', available: true });
  });
});

describe('POST /api/crib/checkouts', () => {
  it('lends a tool with a due time and shows it among the member’s own checkouts', async () => {
    const item = await crib.tool({ loanPeriodHours: 4 });
    const member = await signedIn(crib.ctx, 'member');
    const before = Date.now();
    const res = await crib.admin.post('/api/crib/checkouts', { memberId: member.member.id, itemId: item.id, quantity: 1 });
    expect(res.status).toBe(201);
    const checkout = cribCheckoutSchema.parse(res.body);
    expect(checkout).toMatchObject({ itemId: item.id, memberId: member.member.id, quantity: 1, returnedAt: null });
    // The item's own loan period, 4 hours, counted from the checkout.
    const due = Date.parse(checkout.dueAt ?? '');
    expect(due - before).toBeGreaterThanOrEqual(4 * 3_600_000);
    expect(due - Date.now()).toBeLessThanOrEqual(4 * 3_600_000);
    const mine = await member.get('/api/crib/mine');
    expect(mine.status).toBe(200);
    expect(mine.body).toEqual([checkout]);
    const open = await crib.admin.get('/api/crib/checkouts?open=true');
    expect((open.body as { id: string }[]).map((row) => row.id)).toContain(checkout.id);
  });

  it('of two checkouts of one tool sent at once, exactly one lands and the other answers 409 already_out', async () => {
    const item = await crib.tool();
    const [a, b] = await Promise.all([createMember(crib.ctx.db), createMember(crib.ctx.db)]);
    const results = await Promise.all([
      crib.admin.post('/api/crib/checkouts', { memberId: a.id, itemId: item.id, quantity: 1 }),
      crib.admin.post('/api/crib/checkouts', { memberId: b.id, itemId: item.id, quantity: 1 }),
    ]);
    expect(results.map((res) => res.status).sort()).toEqual([201, 409]);
    expect(results.find((res) => res.status === 409)?.body.code).toBe('already_out');
    expect(await crib.ctx.db('crib_checkouts').where({ item_id: item.id }).whereNull('returned_at').select('id')).toHaveLength(1);
  });

  it('of 20 takes of one from a stock of 5 sent at once, five land and the stock stops at zero', async () => {
    const item = await crib.consumable(5);
    const member = await createMember(crib.ctx.db);
    const results = await Promise.all(
      Array.from({ length: 20 }, () => crib.admin.post('/api/crib/checkouts', { memberId: member.id, itemId: item.id, quantity: 1 })),
    );
    const statuses = results.map((res) => res.status);
    expect(statuses.filter((status) => status === 201)).toHaveLength(5);
    expect(statuses.filter((status) => status === 409)).toHaveLength(15);
    expect(results.filter((res) => res.status === 409).every((res) => res.body.code === 'short_stock')).toBe(true);
    expect(await crib.ctx.db('crib_items').first('stock').where({ id: item.id })).toEqual({ stock: 0 });
    expect(await crib.ctx.db('crib_checkouts').where({ item_id: item.id }).sum({ taken: 'quantity' }).first()).toEqual({ taken: 5 });
  });

  it('refuses a take larger than the stock and leaves the stock as it was', async () => {
    const item = await crib.consumable(3);
    const res = await crib.admin.post('/api/crib/checkouts', { memberId: crib.admin.member.id, itemId: item.id, quantity: 4 });
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('short_stock');
    expect(await crib.ctx.db('crib_items').first('stock').where({ id: item.id })).toEqual({ stock: 3 });
  });

  it('answers 409 out_of_circulation for an item taken off the shelf, and 400 for a tool taken by more than one', async () => {
    const shelved = await crib.tool({ inCirculation: false });
    const res = await crib.admin.post('/api/crib/checkouts', { memberId: crib.admin.member.id, itemId: shelved.id, quantity: 1 });
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('out_of_circulation');
    const item = await crib.tool();
    const two = await crib.admin.post('/api/crib/checkouts', { memberId: crib.admin.member.id, itemId: item.id, quantity: 2 });
    expect(two.status).toBe(400);
    expect(two.body.code).toBe('tool_quantity');
  });

  it('answers 404 for an unknown item or member and 400 for malformed input', async () => {
    const item = await crib.tool();
    const noItem = await crib.admin.post('/api/crib/checkouts', { memberId: crib.admin.member.id, itemId: randomUUID(), quantity: 1 });
    expect(noItem.body.code).toBe('crib_item_not_found');
    const noMember = await crib.admin.post('/api/crib/checkouts', { memberId: randomUUID(), itemId: item.id, quantity: 1 });
    expect(noMember.body.code).toBe('member_not_found');
    const bad = await crib.admin.post('/api/crib/checkouts', { memberId: 'someone', itemId: item.id, quantity: 0 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.errors).sort()).toEqual(['memberId', 'quantity']);
  });

  it('refuses an inactive member with 403 member_inactive, as the crib station does, and takes nothing', async () => {
    const [gauge, inserts] = await Promise.all([crib.tool(), crib.consumable(4)]);
    const inactive = await createMember(crib.ctx.db, { first_name: 'Bertil', last_name: 'Quarry', active: false });
    for (const item of [gauge, inserts]) {
      const res = await crib.admin.post('/api/crib/checkouts', { memberId: inactive.id, itemId: item.id, quantity: 1 });
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('member_inactive');
    }
    expect(await crib.ctx.db('crib_checkouts').where({ member_id: inactive.id })).toEqual([]);
    expect(await crib.ctx.db('crib_items').first('stock').where({ id: inserts.id })).toEqual({ stock: 4 });
  });
});

describe('POST /api/crib/checkouts/:id/return', () => {
  async function lent() {
    const item = await crib.tool();
    const member = await createMember(crib.ctx.db);
    const res = await crib.admin.post('/api/crib/checkouts', { memberId: member.id, itemId: item.id, quantity: 1 });
    expect(res.status).toBe(201);
    return { item, checkout: cribCheckoutSchema.parse(res.body) };
  }

  it('takes a tool returned as damaged out of circulation and puts it on the attention list', async () => {
    const { item, checkout } = await lent();
    const res = await crib.admin.post(`/api/crib/checkouts/${checkout.id}/return`, { condition: 'damaged', note: 'Anvil face is chipped.' });
    expect(res.status).toBe(200);
    expect(cribCheckoutSchema.parse(res.body)).toMatchObject({ returnCondition: 'damaged', returnNote: 'Anvil face is chipped.', returnedAt: expect.any(String) });
    expect(await crib.ctx.db('crib_items').first('condition', 'in_circulation').where({ id: item.id })).toEqual({ condition: 'damaged', in_circulation: false });
    const attention = await crib.admin.get('/api/crib/attention');
    expect(attention.status).toBe(200);
    expect(attention.body).toContainEqual(expect.objectContaining({ itemId: item.id, condition: 'damaged', note: 'Anvil face is chipped.' }));
    const again = await crib.admin.post('/api/crib/checkouts', { memberId: crib.admin.member.id, itemId: item.id, quantity: 1 });
    expect(again.body.code).toBe('out_of_circulation');
  });

  it('puts a tool returned in good condition back on the shelf, and a second return answers 409', async () => {
    const { item, checkout } = await lent();
    const res = await crib.admin.post(`/api/crib/checkouts/${checkout.id}/return`, { condition: 'good' });
    expect(res.status).toBe(200);
    const items = (await crib.admin.get('/api/crib/items')).body as { id: string; available: boolean }[];
    expect(items.find((row) => row.id === item.id)?.available).toBe(true);
    const again = await crib.admin.post(`/api/crib/checkouts/${checkout.id}/return`, { condition: 'good' });
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('already_returned');
  });

  it('answers 400 for an unknown condition and 404 for an unknown checkout', async () => {
    const { checkout } = await lent();
    const bad = await crib.admin.post(`/api/crib/checkouts/${checkout.id}/return`, { condition: 'broken' });
    expect(bad.status).toBe(400);
    expect(bad.body.errors.condition).toBeDefined();
    const missing = await crib.admin.post(`/api/crib/checkouts/${randomUUID()}/return`, { condition: 'good' });
    expect(missing.status).toBe(404);
    expect(missing.body.code).toBe('crib_checkout_not_found');
  });
});

describe('roles', () => {
  it('answers 403 to a member on the admins’ routes and 401 when signed out', async () => {
    const member = await signedIn(crib.ctx, 'member');
    const id = randomUUID();
    const answers = await Promise.all([
      member.post('/api/crib/items', { kind: 'tool', name: 'Bore gauge', assetTag: 'T-x' }),
      member.put(`/api/crib/items/${id}`, { kind: 'tool', name: 'Bore gauge', assetTag: 'T-x' }),
      member.post('/api/crib/checkouts', { memberId: member.member.id, itemId: id, quantity: 1 }),
      member.post(`/api/crib/checkouts/${id}/return`, { condition: 'good' }),
      member.get('/api/crib/checkouts?open=true'),
      member.get('/api/crib/attention'),
    ]);
    expect(answers.map((res) => res.status)).toEqual([403, 403, 403, 403, 403, 403]);
    const signedOut = await browser(crib.ctx);
    expect((await signedOut.get('/api/crib/items')).status).toBe(401);
    expect((await signedOut.get('/api/crib/mine')).status).toBe(401);
  });
});
