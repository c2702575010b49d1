import type { Knex } from 'knex';

/**
 * The browser tests run on whatever database they are given, the demo shop's included, at any
 * hour of any day; the demo shop's hours (and its winter closure) would refuse members outside
 * them. A test that needs members cleared opens the shop all week while it runs, then puts back
 * what was there.
 *
 * Hours are shop-wide, and test files run side by side in several workers: each test that
 * changes them holds a PostgreSQL advisory lock from `openAllWeek` until `restoreHours`, so no two
 * of them change or put back the hours at the same time. The lock lives in a transaction of its
 * own, which also ends it should the worker stop halfway.
 */

/** Any number will do, as long as nothing else in the shop's database locks the same one. */
const HOURS_LOCK = 7_031_407;

interface HoursRow {
  id: string;
  weekday: number;
  opens_at: string;
  closes_at: string;
}

interface ClosureRow {
  id: string;
  starts_on: string;
  ends_on: string;
  reason: string;
  created_by: string | null;
  created_at: string;
}

export interface SavedHours {
  hours: HoursRow[];
  closures: ClosureRow[];
  lock: Knex.Transaction;
}

/** Saves the weekly hours and closures, then opens the shop 00:00–24:00 every day with no closures. */
export async function openAllWeek(db: Knex): Promise<SavedHours> {
  const lock = await db.transaction();
  try {
    await lock.raw('select pg_advisory_xact_lock(?)', [HOURS_LOCK]);
    const hours = await db<HoursRow>('shop_hours').select('id', 'weekday', 'opens_at', 'closes_at');
    // Dates and instants as text, so that they go back exactly as they were (microseconds and all),
    // whatever the runner's time zone.
    const closures = await db('shop_closures').select<ClosureRow[]>(
      'id',
      db.raw('starts_on::text as starts_on'),
      db.raw('ends_on::text as ends_on'),
      'reason',
      'created_by',
      db.raw('created_at::text as created_at'),
    );
    await db.transaction(async (trx) => {
      await trx('shop_closures').delete();
      await trx('shop_hours').delete();
      // ISO 8601 weekdays, Monday 1 … Sunday 7; 24:00 is the midnight that ends the day.
      await trx('shop_hours').insert([1, 2, 3, 4, 5, 6, 7].map((weekday) => ({ weekday, opens_at: '00:00', closes_at: '24:00' })));
    });
    return { hours, closures, lock };
  } catch (error) {
    await lock.rollback();
    throw error;
  }
}

/** Puts back the hours and closures `openAllWeek` saved, and lets the next test change them. */
export async function restoreHours(db: Knex, saved: SavedHours): Promise<void> {
  try {
    await db.transaction(async (trx) => {
      await trx('shop_closures').delete();
      await trx('shop_hours').delete();
      if (saved.hours.length > 0) await trx('shop_hours').insert(saved.hours);
      if (saved.closures.length > 0) await trx('shop_closures').insert(saved.closures);
    });
  } finally {
    await saved.lock.commit();
  }
}

/** Opens the shop all week around every test of the file or group it is called in. */
export function openShopForEachTest(test: { beforeEach: (fn: (args: { db: Knex }) => Promise<void>) => void; afterEach: (fn: (args: { db: Knex }) => Promise<void>) => void }): void {
  let saved: SavedHours | undefined;
  test.beforeEach(async ({ db }) => {
    saved = await openAllWeek(db);
  });
  test.afterEach(async ({ db }) => {
    if (saved) await restoreHours(db, saved);
    saved = undefined;
  });
}
