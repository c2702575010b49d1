import { describe, expect, it } from 'vitest';
import { demoCribConsumables, demoCribLoan, demoCribTools } from '../seeds/11_crib';
import { ownDatabase } from './test-database';

const own = ownDatabase('crib_seed', { seed: true });

/** Calendar date of an instant in the zone, as the IANA tz database through Intl gives it. */
const dateIn = (instant: Date, timeZone: string) => new Intl.DateTimeFormat('en-CA', { timeZone }).format(instant);
const clockIn = (instant: Date, timeZone: string) => new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(instant);

describe('the demo shop’s crib', () => {
  it('holds every demo tool in good condition under its own asset tag, and the consumables in stock', async () => {
    const tools = await own.db('crib_items').where({ kind: 'tool' }).select('asset_tag', 'condition', 'in_circulation');
    expect(tools.map((row) => row.asset_tag).sort()).toEqual(demoCribTools.map((tool) => tool.assetTag).sort());
    expect(tools.every((row) => row.condition === 'good' && row.in_circulation)).toBe(true);
    const consumables = await own.db('crib_items').where({ kind: 'consumable' }).select('name', 'stock', 'price_cents');
    expect(consumables).toHaveLength(demoCribConsumables.length);
    expect(consumables.every((row) => row.stock > 0 && row.price_cents > 0)).toBe(true);
  });

  it('has one tool out to the demo member, due tomorrow at 18:00 on the shop’s wall clock', async () => {
    const { time_zone: timeZone } = await own.db('shop').first('time_zone').where({ id: 1 });
    const open = await own
      .db('crib_checkouts as c')
      .join('crib_items as i', 'i.id', 'c.item_id')
      .join('members as m', 'm.id', 'c.member_id')
      .whereNull('c.returned_at')
      .select('i.asset_tag', 'm.email', 'c.due_at');
    expect(open).toHaveLength(1);
    expect(open[0]).toMatchObject({ asset_tag: demoCribLoan.assetTag, email: demoCribLoan.memberEmail });
    expect(dateIn(open[0].due_at, timeZone)).toBe(dateIn(new Date(Date.now() + 86_400_000), timeZone));
    expect(clockIn(open[0].due_at, timeZone)).toBe('18:00');
  });
});
