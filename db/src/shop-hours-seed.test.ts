import { describe, expect, it } from 'vitest';
import { closureInputSchema, hoursOnDate, shopHoursAt, weeklyHoursInputSchema } from '@chuckkey/core';
import { demoShop } from '../seeds/01_shop';
import { seed } from '../seeds/08_shop_hours';
import { ownMigratedDatabase } from './test-database';

const own = ownMigratedDatabase('shop_hours', seed);

async function stored() {
  const weekly = await own.db('shop_hours')
    .select(own.db.raw(`weekday, to_char(opens_at, 'HH24:MI') as "opensAt", to_char(closes_at, 'HH24:MI') as "closesAt"`))
    .orderBy(['weekday', 'opens_at']);
  const closures = await own.db('shop_closures').select(own.db.raw(`starts_on::text as "startsOn", ends_on::text as "endsOn", reason`));
  return { weekly, closures };
}

describe('the demo shop’s opening hours', () => {
  it('are hours the Setup form would accept, closed on Mondays, with the winter deep clean as a closure', async () => {
    const { weekly, closures } = await stored();

    expect(weeklyHoursInputSchema.safeParse({ weekly }).success).toBe(true);
    for (const closure of closures) expect(closureInputSchema.safeParse(closure).success).toBe(true);
    // ISO 8601 weekday numbering: Monday is 1.
    expect(weekly.map((row) => row.weekday)).not.toContain(1);
    expect(closures).toEqual([{ startsOn: '2026-12-24', endsOn: '2026-12-26', reason: 'Winter deep clean' }]);
  });

  it('open the shop on a Tuesday evening and keep it shut during the deep clean, in the demo shop’s time zone', async () => {
    const { weekly, closures } = await stored();

    // IANA tz database: Chicago is on CDT (UTC−5) on 10 March 2026, so 23:00Z is Tuesday 18:00.
    expect(shopHoursAt(weekly, closures, demoShop.time_zone, new Date('2026-03-10T23:00:00Z')).open).toBe(true);
    // ISO 8601 calendar: 26 December 2026 is a Saturday, a day the shop would otherwise open.
    expect(hoursOnDate(weekly, closures, demoShop.time_zone, '2026-12-26')).toMatchObject({
      weekday: 6,
      closure: { reason: 'Winter deep clean' },
      intervals: [],
    });
  });
});
