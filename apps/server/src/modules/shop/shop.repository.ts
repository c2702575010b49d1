import type { OpeningInterval, Shop, ShopClosure, ShopHours } from '@chuckkey/core';
import type { Db } from '../../lib/db';

// Times and dates leave the database as text: 'HH:MM' (24:00 stays 24:00) and 'YYYY-MM-DD', the
// shop's own wall clock and calendar, never shifted into the server's time zone.
const weeklyColumns = {
  weekday: 'weekday',
  opensAt: "to_char(opens_at, 'HH24:MI')",
  closesAt: "to_char(closes_at, 'HH24:MI')",
};
const closureColumns = {
  id: 'id',
  startsOn: 'starts_on::text',
  endsOn: 'ends_on::text',
  reason: 'reason',
};
const selectList = (columns: Record<string, string>) =>
  Object.entries(columns)
    .map(([alias, expression]) => `${expression} as "${alias}"`)
    .join(', ');

/** Pass a transaction as `db` to make several calls one change. */
export function shopRepository(db: Db) {
  return {
    async get(): Promise<Shop> {
      const row = await db('shop').first({ name: 'name', town: 'town', timeZone: 'time_zone' }).where({ id: 1 });
      // A database without its shop row has not been set up: a bug in set-up, not user input.
      if (!row) throw new Error('the shop row is missing: run the database set-up');
      return row;
    },

    /** Holds the shop row until the transaction ends, so that two changes of the hours run one after the other. */
    async lock(): Promise<void> {
      await db('shop').where({ id: 1 }).forUpdate().first('id');
    },

    /** The weekly schedule by weekday and opening time; the table's check keeps weekdays within 1–7. */
    async weeklyHours(): Promise<ShopHours['weekly']> {
      return db('shop_hours').select(db.raw(selectList(weeklyColumns))).orderBy(['weekday', 'opens_at']);
    },

    /** Replaces the whole weekly schedule; call inside a transaction. */
    async replaceWeeklyHours(weekly: readonly OpeningInterval[]): Promise<void> {
      await db('shop_hours').delete();
      if (weekly.length === 0) return;
      await db('shop_hours').insert(weekly.map((row) => ({ weekday: row.weekday, opens_at: row.opensAt, closes_at: row.closesAt })));
    },

    /** Closures whose last day is `fromDate` or later, soonest first. */
    async closuresFrom(fromDate: string): Promise<ShopClosure[]> {
      return db('shop_closures')
        .select(db.raw(selectList(closureColumns)))
        .where('ends_on', '>=', fromDate)
        .orderBy([{ column: 'starts_on' }, { column: 'ends_on' }, { column: 'created_at' }]);
    },

    async findClosure(id: string): Promise<ShopClosure | undefined> {
      return db('shop_closures').first(db.raw(selectList(closureColumns))).where({ id });
    },

    async addClosure(closure: { startsOn: string; endsOn: string; reason: string; createdBy: string }): Promise<ShopClosure> {
      const [inserted] = await db('shop_closures')
        .insert({ starts_on: closure.startsOn, ends_on: closure.endsOn, reason: closure.reason, created_by: closure.createdBy })
        .returning<{ id: string }[]>('id');
      const row = inserted && (await this.findClosure(inserted.id));
      if (!row) throw new Error('closure insert returned no row');
      return row;
    },

    /** True when a closure was removed. */
    async removeClosure(id: string): Promise<boolean> {
      return (await db('shop_closures').where({ id }).delete()) > 0;
    },
  };
}
export type ShopRepository = ReturnType<typeof shopRepository>;
