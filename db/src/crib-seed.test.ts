import { describe, expect, it } from 'vitest';
import { demoCribAttention, demoCribConsumables, demoCribLoan, demoCribOverdue, demoCribTake, demoCribTools } from '../seeds/11_crib';
import { ownDatabase } from './test-database';

const own = ownDatabase('crib_seed', { seed: true });

/** Calendar date of an instant in the zone, as the IANA tz database through Intl gives it. */
const dateIn = (instant: Date, timeZone: string) => new Intl.DateTimeFormat('en-CA', { timeZone }).format(instant);
const clockIn = (instant: Date, timeZone: string) => new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(instant);

describe('the demo shop’s crib', () => {
  it('holds every demo tool under its own asset tag, all in good condition but the one needing attention, and the consumables in stock', async () => {
    const tools = await own.db('crib_items').where({ kind: 'tool' }).select('asset_tag', 'condition', 'in_circulation');
    expect(tools.map((row) => row.asset_tag).sort()).toEqual(demoCribTools.map((tool) => tool.assetTag).sort());
    const others = tools.filter((row) => row.asset_tag !== demoCribAttention.assetTag);
    expect(others.every((row) => row.condition === 'good' && row.in_circulation)).toBe(true);
    expect(tools.find((row) => row.asset_tag === demoCribAttention.assetTag)).toMatchObject({ condition: 'needs_attention', in_circulation: false });
    const consumables = await own.db('crib_items').where({ kind: 'consumable' }).select('name', 'stock', 'price_cents');
    expect(consumables).toHaveLength(demoCribConsumables.length);
    expect(consumables.every((row) => row.stock > 0 && row.price_cents > 0)).toBe(true);
  });

  const openTools = () =>
    own
      .db('crib_checkouts as c')
      .join('crib_items as i', 'i.id', 'c.item_id')
      .join('members as m', 'm.id', 'c.member_id')
      .where('c.item_kind', 'tool')
      .whereNull('c.returned_at')
      .select('i.asset_tag', 'm.email', 'c.due_at');

  it('has a tool out to the demo member, due tomorrow at 18:00 on the shop’s wall clock', async () => {
    const { time_zone: timeZone } = await own.db('shop').first('time_zone').where({ id: 1 });
    const loans = (await openTools()).filter((row) => row.email === demoCribLoan.memberEmail);
    expect(loans).toHaveLength(1);
    expect(loans[0]).toMatchObject({ asset_tag: demoCribLoan.assetTag });
    expect(dateIn(loans[0].due_at, timeZone)).toBe(dateIn(new Date(Date.now() + 86_400_000), timeZone));
    expect(clockIn(loans[0].due_at, timeZone)).toBe('18:00');
  });

  it('has one tool overdue with another member, due at 18:00 two days ago', async () => {
    const { time_zone: timeZone } = await own.db('shop').first('time_zone').where({ id: 1 });
    const late = (await openTools()).filter((row) => row.due_at.getTime() < Date.now());
    expect(late).toHaveLength(1);
    expect(late[0].asset_tag).toBe(demoCribOverdue.assetTag);
    expect(late[0].email).not.toBe(demoCribLoan.memberEmail);
    expect(dateIn(late[0].due_at, timeZone)).toBe(dateIn(new Date(Date.now() - 2 * 86_400_000), timeZone));
    expect(clockIn(late[0].due_at, timeZone)).toBe('18:00');
  });

  it('charges the demo member’s take of inserts at the item’s price, and takes them from stock', async () => {
    const item = await own.db('crib_items').first('id', 'stock', 'price_cents').where({ name: demoCribTake.name });
    const takes = await own.db('crib_checkouts').where({ item_id: item.id }).select('quantity', 'unit_price_cents');
    expect(takes).toEqual([{ quantity: demoCribTake.quantity, unit_price_cents: item.price_cents }]);
    const listed = demoCribConsumables.find((c) => c.name === demoCribTake.name);
    expect(item.stock).toBe((listed?.stock ?? 0) - demoCribTake.quantity);
  });
});
