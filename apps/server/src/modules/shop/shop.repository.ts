import type { Shop } from '@chuckkey/core';
import type { Db } from '../../lib/db';

export function shopRepository(db: Db) {
  return {
    async get(): Promise<Shop> {
      const row = await db('shop').first({ name: 'name', town: 'town', timeZone: 'time_zone' }).where({ id: 1 });
      // A database without its shop row has not been set up: a bug in set-up, not user input.
      if (!row) throw new Error('the shop row is missing: run the database set-up');
      return row;
    },
  };
}
