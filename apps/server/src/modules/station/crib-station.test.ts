import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { cribCheckoutSchema, cribStationCheckoutResultSchema, cribStationConsumablesSchema, cribStationMemberResultSchema, cribTagLookupResultSchema } from '@chuckkey/core';
import { createTestContext } from '../../test/harness';
import { badgeHolder, pairedBoard, pairedCrib, pairedDevice } from './station.fixtures';
import { cribFixtures } from '../crib/crib.fixtures';

const crib = cribFixtures();

const HOUR = 3_600_000;

/** A tool with its own loan period, so its due time is known whatever the shop's hours are. */
const tool = (name = 'Telescoping bore gauge set') => crib.tool({ name, loanPeriodHours: 4 });

async function stock(itemId: string): Promise<number | null> {
  const row = await crib.ctx.db('crib_items').first('stock').where({ id: itemId });
  return row?.stock ?? null;
}

async function openCheckouts(itemId: string) {
  return crib.ctx.db('crib_checkouts').where({ item_id: itemId }).whereNull('returned_at').select('id', 'member_id');
}

describe('the crib station’s checkout', () => {
  it('shows the member what they have out, finds a tool by its tag in any case and checks out a basket of a tool and a consumable', async () => {
    const { device, station } = await pairedCrib(crib.ctx);
    const member = await badgeHolder(crib.ctx, 'member', { firstName: 'Ines' });
    const gauge = await tool();
    const inserts = await crib.consumable(10, { priceCents: 375 });

    const before = cribStationMemberResultSchema.parse((await device.post('/api/station/crib/member', { badge: member.badge })).body);
    expect(before).toEqual({ member: { id: member.member.id, firstName: 'Ines' }, out: [] });

    // A hand scanner may add spaces, and a label may be typed in lower case.
    const sent = Date.now();
    const lookup = await device.post('/api/station/crib/items/lookup', { tag: `  ${gauge.assetTag!.toLowerCase()} ` });
    expect(lookup.status).toBe(200);
    const found = cribTagLookupResultSchema.parse(lookup.body).item;
    expect(found).toMatchObject({ id: gauge.id, kind: 'tool', name: gauge.name, assetTag: gauge.assetTag, binLocation: 'B2', available: true, openCheckout: null });
    // The tool's own loan period, 4 hours from the look-up.
    expect(Date.parse(found.dueAt) - sent).toBeGreaterThanOrEqual(4 * HOUR);
    expect(Date.parse(found.dueAt) - Date.now()).toBeLessThanOrEqual(4 * HOUR);

    const consumables = cribStationConsumablesSchema.parse((await device.get('/api/station/crib/consumables')).body);
    expect(consumables).toContainEqual({ id: inserts.id, name: inserts.name, unit: 'each', stock: 10, binLocation: 'C4' });
    expect(consumables.map((row) => row.id)).not.toContain(gauge.id);

    const res = await device.post('/api/station/crib/checkouts', { badge: member.badge, items: [{ itemId: gauge.id, quantity: 1 }, { itemId: inserts.id, quantity: 3 }] });
    expect(res.status).toBe(201);
    const { checkouts } = cribStationCheckoutResultSchema.parse(res.body);
    expect(checkouts).toHaveLength(2);
    expect(checkouts[0]).toMatchObject({ itemId: gauge.id, memberId: member.member.id, quantity: 1, unitPriceCents: null });
    // The take keeps the unit price of its moment, whatever the item's price becomes later.
    expect(checkouts[1]).toMatchObject({ itemId: inserts.id, quantity: 3, dueAt: null, unitPriceCents: 375 });
    expect(await stock(inserts.id)).toBe(7);

    const audit = await crib.ctx.db('audit_log').where({ action: 'crib.checked_out', entity_id: gauge.id }).first('actor_id', 'member_id', 'details');
    expect(audit).toMatchObject({ actor_id: member.member.id, member_id: member.member.id, details: { via: 'station', stationId: station.id } });
    const recorded = await crib.ctx.db('crib_checkouts').first('recorded_by').where({ id: checkouts[0]!.id });
    expect(recorded).toEqual({ recorded_by: member.member.id });

    const after = cribStationMemberResultSchema.parse((await device.post('/api/station/crib/member', { badge: member.badge })).body);
    expect(after.member && after.out).toEqual([{ ...checkouts[0], overdue: false }]);
    const outNow = cribTagLookupResultSchema.parse((await device.post('/api/station/crib/items/lookup', { tag: gauge.assetTag })).body).item;
    expect(outNow).toMatchObject({ available: false, openCheckout: { id: checkouts[0]!.id, memberFirstName: 'Ines', dueAt: checkouts[0]!.dueAt } });
  });

  it('marks a tool past its due time as overdue, and lists the soonest due first', async () => {
    const { device } = await pairedCrib(crib.ctx);
    const member = await badgeHolder(crib.ctx, 'member', { firstName: 'Jonas' });
    const [late, later] = await Promise.all([tool('Thread pitch gauge'), tool('Boring bar, 3/8 in')]);
    await crib.ctx.db('crib_checkouts').insert([
      { item_id: later.id, item_kind: 'tool', member_id: member.member.id, quantity: 1, checked_out_at: new Date(Date.now() - 3 * HOUR), due_at: new Date(Date.now() + HOUR) },
      { item_id: late.id, item_kind: 'tool', member_id: member.member.id, quantity: 1, checked_out_at: new Date(Date.now() - 3 * HOUR), due_at: new Date(Date.now() - HOUR) },
    ]);
    const answer = cribStationMemberResultSchema.parse((await device.post('/api/station/crib/member', { badge: member.badge })).body);
    expect(answer.member && answer.out.map((row) => [row.itemId, row.overdue])).toEqual([
      [late.id, true],
      [later.id, false],
    ]);
  });

  it('takes nothing from a basket whose second tool is already out, and names that line', async () => {
    const { device } = await pairedCrib(crib.ctx);
    const [ines, jonas] = await Promise.all([badgeHolder(crib.ctx, 'member', { firstName: 'Ines' }), badgeHolder(crib.ctx, 'member', { firstName: 'Jonas' })]);
    const [free, taken] = await Promise.all([tool('Depth micrometer'), tool('Telescoping bore gauge set')]);
    const inserts = await crib.consumable(5);
    const first = await device.post('/api/station/crib/checkouts', { badge: jonas.badge, items: [{ itemId: taken.id, quantity: 1 }] });
    expect(first.status).toBe(201);

    const res = await device.post('/api/station/crib/checkouts', {
      badge: ines.badge,
      items: [
        { itemId: free.id, quantity: 1 },
        { itemId: inserts.id, quantity: 2 },
        { itemId: taken.id, quantity: 1 },
      ],
    });
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ code: 'already_out', itemId: taken.id });
    expect(await openCheckouts(free.id)).toEqual([]);
    expect(await stock(inserts.id)).toBe(5);
    expect(await openCheckouts(taken.id)).toEqual([expect.objectContaining({ member_id: jonas.member.id })]);
    expect(await crib.ctx.db('audit_log').where({ action: 'crib.checked_out', entity_id: free.id }).select('id')).toEqual([]);
  });

  it('of two baskets with the same tool sent at once from two crib stations, one lands whole and the other takes nothing', async () => {
    const [east, west] = await Promise.all([pairedCrib(crib.ctx), pairedCrib(crib.ctx)]);
    const [ines, jonas] = await Promise.all([badgeHolder(crib.ctx, 'member', { firstName: 'Ines' }), badgeHolder(crib.ctx, 'member', { firstName: 'Jonas' })]);
    const [shared, ownA, ownB] = await Promise.all([tool('Parting blade holder'), tool('Center drill set'), tool('Dial indicator')]);
    const results = await Promise.all([
      east.device.post('/api/station/crib/checkouts', { badge: ines.badge, items: [{ itemId: ownA.id, quantity: 1 }, { itemId: shared.id, quantity: 1 }] }),
      west.device.post('/api/station/crib/checkouts', { badge: jonas.badge, items: [{ itemId: ownB.id, quantity: 1 }, { itemId: shared.id, quantity: 1 }] }),
    ]);
    expect(results.map((res) => res.status).sort()).toEqual([201, 409]);
    const loser = results.findIndex((res) => res.status === 409);
    expect(results[loser]?.body).toMatchObject({ code: 'already_out', itemId: shared.id });
    expect(await openCheckouts(loser === 0 ? ownA.id : ownB.id)).toEqual([]);
    expect(await openCheckouts(loser === 0 ? ownB.id : ownA.id)).toHaveLength(1);
    expect(await openCheckouts(shared.id)).toHaveLength(1);
  });

  it('takes nothing when a consumable’s stock is short, and names that line', async () => {
    const { device } = await pairedCrib(crib.ctx);
    const member = await badgeHolder(crib.ctx, 'member');
    const gauge = await tool();
    const wire = await crib.consumable(2);
    const res = await device.post('/api/station/crib/checkouts', { badge: member.badge, items: [{ itemId: gauge.id, quantity: 1 }, { itemId: wire.id, quantity: 3 }] });
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ code: 'short_stock', itemId: wire.id });
    expect(await openCheckouts(gauge.id)).toEqual([]);
    expect(await stock(wire.id)).toBe(2);
  });

  it('names an unknown badge without a member, refuses it at checkout with 401, and an empty basket with 400', async () => {
    const { device } = await pairedCrib(crib.ctx);
    const gauge = await tool();
    const stranger = 'A'.repeat(22);
    const lookup = await device.post('/api/station/crib/member', { badge: stranger });
    expect(lookup.status).toBe(200);
    expect(lookup.body).toEqual({ member: null, reason: 'unknown_badge' });
    const inactive = await badgeHolder(crib.ctx, 'member', { active: false });
    expect((await device.post('/api/station/crib/member', { badge: inactive.badge })).body).toEqual({ member: null, reason: 'member_inactive' });

    const res = await device.post('/api/station/crib/checkouts', { badge: stranger, items: [{ itemId: gauge.id, quantity: 1 }] });
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unknown_badge');
    expect(await openCheckouts(gauge.id)).toEqual([]);
    const member = await badgeHolder(crib.ctx, 'member');
    const empty = await device.post('/api/station/crib/checkouts', { badge: member.badge, items: [] });
    expect(empty.status).toBe(400);
    expect(empty.body.errors.items).toBeDefined();
  });

  it('answers 404 crib_item_not_found for a tag no tool carries', async () => {
    const { device } = await pairedCrib(crib.ctx);
    const res = await device.post('/api/station/crib/items/lookup', { tag: `NONE-${randomUUID().slice(0, 6)}` });
    expect(res.status).toBe(404);
    expect(res.body.code).toBe('crib_item_not_found');
  });
});

describe('who may use the crib station’s routes', () => {
  it('refuses a machine station and a board with 403 not_a_crib_station, and an unpaired device with 401', async () => {
    const machine = await pairedDevice(crib.ctx);
    const board = await pairedBoard(crib.ctx);
    const member = await badgeHolder(crib.ctx, 'member');
    const answers = await Promise.all([
      machine.device.post('/api/station/crib/member', { badge: member.badge }),
      machine.device.get('/api/station/crib/consumables'),
      board.device.post('/api/station/crib/returns', { tag: 'CK-0001', condition: 'good' }),
    ]);
    expect(answers.map((res) => [res.status, res.body.code])).toEqual([
      [403, 'not_a_crib_station'],
      [403, 'not_a_crib_station'],
      [403, 'not_a_crib_station'],
    ]);
    const unpaired = await crib.admin.get('/api/station/crib/consumables');
    expect(unpaired.status).toBe(401);
    expect(unpaired.body.code).toBe('station_required');
  });

  it('limits badge scans per station as a machine’s scan is limited, with Retry-After', async () => {
    const limited = createTestContext({ STATION_SCAN_LIMIT_PER_MINUTE: '2' });
    try {
      const { device } = await pairedCrib(limited);
      const member = await badgeHolder(limited, 'member');
      const statuses: number[] = [];
      for (let i = 0; i < 3; i += 1) statuses.push((await device.post('/api/station/crib/member', { badge: member.badge })).status);
      expect(statuses).toEqual([200, 200, 429]);
      const refused = await device.post('/api/station/crib/member', { badge: member.badge });
      expect(refused.body.code).toBe('too_many_requests');
      expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    } finally {
      await limited.close();
    }
  });
});

describe('returns at the crib station', () => {
  async function lentAt(device: Awaited<ReturnType<typeof pairedCrib>>['device']) {
    const member = await badgeHolder(crib.ctx, 'member', { firstName: 'Ines' });
    const gauge = await tool();
    const res = await device.post('/api/station/crib/checkouts', { badge: member.badge, items: [{ itemId: gauge.id, quantity: 1 }] });
    expect(res.status).toBe(201);
    return { member, gauge, checkout: cribStationCheckoutResultSchema.parse(res.body).checkouts[0]! };
  }

  it('takes a tool returned damaged out of circulation and onto the admins’ attention list, recorded by the station', async () => {
    const { device, station } = await pairedCrib(crib.ctx);
    const { gauge, checkout } = await lentAt(device);
    const res = await device.post('/api/station/crib/returns', { tag: gauge.assetTag, condition: 'damaged', note: 'The anvil of the small gauge is bent.' });
    expect(res.status).toBe(200);
    expect(cribCheckoutSchema.parse(res.body)).toMatchObject({ id: checkout.id, returnCondition: 'damaged', returnNote: 'The anvil of the small gauge is bent.', returnedAt: expect.any(String) });
    const attention = await crib.admin.get('/api/crib/attention');
    expect(attention.body).toContainEqual(expect.objectContaining({ itemId: gauge.id, condition: 'damaged', note: 'The anvil of the small gauge is bent.' }));
    expect(await crib.ctx.db('crib_items').first('in_circulation').where({ id: gauge.id })).toEqual({ in_circulation: false });
    const audit = await crib.ctx.db('audit_log').where({ action: 'crib.returned', entity_id: gauge.id }).first('actor_id', 'details');
    expect(audit).toMatchObject({ actor_id: null, details: { via: 'station', stationId: station.id, condition: 'damaged' } });
  });

  it('puts a tool returned good back on the shelf, ready for the next member', async () => {
    const { device } = await pairedCrib(crib.ctx);
    const { gauge } = await lentAt(device);
    const res = await device.post('/api/station/crib/returns', { tag: gauge.assetTag, condition: 'good' });
    expect(res.status).toBe(200);
    const again = cribTagLookupResultSchema.parse((await device.post('/api/station/crib/items/lookup', { tag: gauge.assetTag })).body).item;
    expect(again).toMatchObject({ available: true, openCheckout: null });
  });

  it('answers 409 not_checked_out for a tool that is not out, 404 for an unknown tag and 400 for damage without a note', async () => {
    const { device } = await pairedCrib(crib.ctx);
    const shelved = await tool();
    const notOut = await device.post('/api/station/crib/returns', { tag: shelved.assetTag, condition: 'good' });
    expect(notOut.status).toBe(409);
    expect(notOut.body.code).toBe('not_checked_out');
    const unknown = await device.post('/api/station/crib/returns', { tag: `NONE-${randomUUID().slice(0, 6)}`, condition: 'good' });
    expect(unknown.status).toBe(404);
    expect(unknown.body.code).toBe('crib_item_not_found');
    const { gauge } = await lentAt(device);
    const bare = await device.post('/api/station/crib/returns', { tag: gauge.assetTag, condition: 'damaged', note: '  ' });
    expect(bare.status).toBe(400);
    expect(bare.body.errors.note).toBeDefined();
    expect(await openCheckouts(gauge.id)).toHaveLength(1);
  });
});

describe('the unit price a consumable take keeps', () => {
  it('is the item’s price at the moment of the take, from the web app and the station alike; a tool keeps none', async () => {
    const { device } = await pairedCrib(crib.ctx);
    const member = await badgeHolder(crib.ctx, 'member');
    const wire = await crib.consumable(20, { priceCents: 1250 });
    const web = await crib.admin.post('/api/crib/checkouts', { memberId: member.member.id, itemId: wire.id, quantity: 1 });
    expect(web.status).toBe(201);
    expect(cribCheckoutSchema.parse(web.body).unitPriceCents).toBe(1250);

    const repriced = await crib.admin.put(`/api/crib/items/${wire.id}`, { kind: 'consumable', name: wire.name, unit: 'each', stock: 19, priceCents: 1400, binLocation: 'C4' });
    expect(repriced.status).toBe(200);
    const station = await device.post('/api/station/crib/checkouts', { badge: member.badge, items: [{ itemId: wire.id, quantity: 2 }] });
    expect(cribStationCheckoutResultSchema.parse(station.body).checkouts[0]?.unitPriceCents).toBe(1400);

    const prices = await crib.ctx.db('crib_checkouts').where({ item_id: wire.id }).orderBy('checked_out_at').pluck('unit_price_cents');
    expect(prices).toEqual([1250, 1400]);
    // The database refuses a take without its price, and a tool with one.
    await expect(crib.ctx.db('crib_checkouts').insert({ item_id: wire.id, item_kind: 'consumable', member_id: member.member.id, quantity: 1, unit_price_cents: null }).then(() => 'stored')).rejects.toThrow(/crib_checkouts_unit_price_for_takes/);
  });
});
