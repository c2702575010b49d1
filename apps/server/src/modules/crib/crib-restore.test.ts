import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { cribAttentionSchema, cribCheckoutSchema, cribItemSchema } from '@chuckkey/core';
import { createMember } from '@chuckkey/db/factories';
import { signedIn } from '../../test/harness';
import { cribFixtures } from './crib.fixtures';

const crib = cribFixtures();

/** A tool lent to a new member and returned in `condition`. */
async function returned(condition: 'needs_attention' | 'damaged', note: string) {
  const item = await crib.tool();
  const member = await createMember(crib.ctx.db, { first_name: 'Odile', last_name: 'Farrant' });
  const out = await crib.admin.post('/api/crib/checkouts', { memberId: member.id, itemId: item.id, quantity: 1 });
  expect(out.status).toBe(201);
  const checkout = cribCheckoutSchema.parse(out.body);
  const back = await crib.admin.post(`/api/crib/checkouts/${checkout.id}/return`, { condition, note });
  expect(back.status).toBe(200);
  return { item, member, checkout };
}

describe('member names on the crib lists', () => {
  it('names the member on a checkout, on the open list and on the attention list', async () => {
    const item = await crib.tool();
    const member = await createMember(crib.ctx.db, { first_name: 'Ines', last_name: 'Halloran' });
    const out = await crib.admin.post('/api/crib/checkouts', { memberId: member.id, itemId: item.id, quantity: 1 });
    expect(cribCheckoutSchema.parse(out.body).memberName).toBe('Ines Halloran');
    const open = await crib.admin.get('/api/crib/checkouts?open=true');
    expect(open.body).toContainEqual(expect.objectContaining({ itemId: item.id, memberName: 'Ines Halloran' }));

    const checkout = cribCheckoutSchema.parse(out.body);
    await crib.admin.post(`/api/crib/checkouts/${checkout.id}/return`, { condition: 'needs_attention', note: 'Anvil sticks.' });
    const attention = (await crib.admin.get('/api/crib/attention')).body as unknown[];
    const row = attention.map((entry) => cribAttentionSchema.parse(entry)).find((entry) => entry.itemId === item.id);
    expect(row).toMatchObject({ memberId: member.id, memberName: 'Ines Halloran', note: 'Anvil sticks.', condition: 'needs_attention' });
  });
});

describe('POST /api/crib/items/:id/restore', () => {
  it('puts a damaged tool back in circulation in good condition, off the attention list, and records who did it', async () => {
    const { item, member } = await returned('damaged', 'Dial bezel cracked.');
    const res = await crib.admin.post(`/api/crib/items/${item.id}/restore`, { note: 'New bezel fitted.' });
    expect(res.status).toBe(200);
    expect(cribItemSchema.parse(res.body)).toMatchObject({ id: item.id, condition: 'good', inCirculation: true, available: true });

    const attention = (await crib.admin.get('/api/crib/attention')).body as { itemId: string }[];
    expect(attention.some((row) => row.itemId === item.id)).toBe(false);

    const audit = await crib.ctx.db('audit_log').first('actor_id', 'details').where({ action: 'crib.item_restored', entity_id: item.id });
    expect(audit).toMatchObject({ actor_id: crib.admin.member.id, details: { condition: 'damaged', inCirculation: false, note: 'New bezel fitted.' } });

    // Back on the shelf means it can be lent again.
    const again = await crib.admin.post('/api/crib/checkouts', { memberId: member.id, itemId: item.id, quantity: 1 });
    expect(again.status).toBe(201);
  });

  it('takes no body at all, as the note is optional', async () => {
    const { item } = await returned('needs_attention', 'Check the zero.');
    const res = await crib.admin.post(`/api/crib/items/${item.id}/restore`);
    expect(res.status).toBe(200);
    expect(cribItemSchema.parse(res.body).condition).toBe('good');
  });

  it('answers 404 crib_item_not_found for an unknown item and 409 not_a_tool for a consumable', async () => {
    const missing = await crib.admin.post(`/api/crib/items/${randomUUID()}/restore`, {});
    // RFC 9110 §15.5.5 (404 Not Found) and §15.5.10 (409 Conflict: the item is in a state that cannot take the change).
    expect(missing.status).toBe(404);
    expect(missing.body.code).toBe('crib_item_not_found');

    const wire = await crib.admin.post('/api/crib/items', { kind: 'consumable', name: 'MIG wire 0.8 mm', unit: 'spool', stock: 3, priceCents: 2400 });
    const consumable = await crib.admin.post(`/api/crib/items/${cribItemSchema.parse(wire.body).id}/restore`, {});
    expect(consumable.status).toBe(409);
    expect(consumable.body.code).toBe('not_a_tool');
  });

  it('answers 400 for a note over 1,000 characters and 403 to a member', async () => {
    const { item } = await returned('damaged', 'Bent.');
    const long = await crib.admin.post(`/api/crib/items/${item.id}/restore`, { note: 'x'.repeat(1001) });
    // RFC 9110 §15.5.1 (400 Bad Request) and §15.5.4 (403 Forbidden: signed in, but not allowed).
    expect(long.status).toBe(400);
    expect(long.body.errors.note).toBeDefined();

    const member = await signedIn(crib.ctx, 'member');
    const refused = await member.post(`/api/crib/items/${item.id}/restore`, {});
    expect(refused.status).toBe(403);
    expect((await crib.ctx.db('crib_items').first('condition').where({ id: item.id }))?.condition).toBe('damaged');
  });
});
