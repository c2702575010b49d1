import type { ShopPolicies } from '@chuckkey/core';
import type { Db } from '../../lib/db';

/** Pass a transaction as `db` to make several calls one change. */
export function shopPoliciesRepository(db: Db) {
  return {
    async get(): Promise<ShopPolicies> {
      const row = await db('shop').first({ overdueCheckoutBlockDays: 'overdue_checkout_block_days' }).where({ id: 1 });
      if (!row) throw new Error('the shop row is missing: run the database set-up');
      return row;
    },

    /** Reads the policies with the shop row locked, so two changes log their before and after in turn. */
    async getForUpdate(): Promise<ShopPolicies> {
      const row = await db('shop').first({ overdueCheckoutBlockDays: 'overdue_checkout_block_days' }).where({ id: 1 }).forUpdate();
      if (!row) throw new Error('the shop row is missing: run the database set-up');
      return row;
    },

    async replace(policies: ShopPolicies): Promise<void> {
      await db('shop').where({ id: 1 }).update({ overdue_checkout_block_days: policies.overdueCheckoutBlockDays });
    },
  };
}
