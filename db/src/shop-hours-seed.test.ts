import knexFactory, { type Knex } from 'knex';
import { register } from 'tsx/esm/api';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closureInputSchema, hoursOnDate, shopHoursAt, weeklyHoursInputSchema } from '@chuckkey/core';
import { demoShop } from '../seeds/01_shop';
import { seed } from '../seeds/08_shop_hours';
import { knexConfig } from './config';
import { dropDatabase, setupDatabase } from './setup';

// Knex imports migration files at run time; tsx lets this process import TypeScript.
register();

const url = process.env.DATABASE_URL;
if (!url) throw new Error('DATABASE_URL must name a database these tests may drop and create (npm test sets it).');

/** A database of this file's own, migrated without the rest of the demo: the hours need none of it. */
const sibling = new URL(url);
sibling.pathname = `${sibling.pathname}_shop_hours`;
const databaseUrl = sibling.toString();

let db: Knex;
beforeAll(async () => {
  await dropDatabase(databaseUrl);
  await setupDatabase(databaseUrl, { seed: false });
  db = knexFactory(knexConfig(databaseUrl, { min: 0, max: 2 }));
  await seed(db);
});
afterAll(async () => {
  await db?.destroy();
  await dropDatabase(databaseUrl);
});

async function stored() {
  const weekly = await db('shop_hours')
    .select(db.raw(`weekday, to_char(opens_at, 'HH24:MI') as "opensAt", to_char(closes_at, 'HH24:MI') as "closesAt"`))
    .orderBy(['weekday', 'opens_at']);
  const closures = await db('shop_closures').select(db.raw(`starts_on::text as "startsOn", ends_on::text as "endsOn", reason`));
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
