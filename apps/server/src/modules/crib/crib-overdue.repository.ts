import type { Db } from '../../lib/db';

/** Reminders a checkout gets at most, the first when it becomes overdue. */
export const OVERDUE_NOTICES_MAX = 3;

/** A reminder goes out again once this long has passed since the last one. */
export const OVERDUE_NOTICE_INTERVAL_MS = 24 * 3_600_000;

export interface OverdueCheckoutRecord {
  checkoutId: string;
  itemId: string;
  itemName: string;
  assetTag: string;
  binLocation: string | null;
  memberId: string;
  memberFirstName: string;
  memberLastName: string;
  memberEmail: string;
  dueAt: Date;
  noticesSent: number;
  lastNoticeAt: Date | null;
}

const intervalSeconds = `${OVERDUE_NOTICE_INTERVAL_MS / 1000} seconds`;

/**
 * Whether the open tool checkout `c` is owed a reminder at $now: past due, fewer than three sent,
 * and none within the interval. The claim repeats the test the list made, so a row changed since
 * (returned, or claimed by another run) is left alone.
 */
const owedNotice = (db: Db, now: Date) =>
  db.raw(
    `c.item_kind = 'tool' and c.returned_at is null and c.due_at < ?
     and c.overdue_notices_sent < ?
     and (c.last_overdue_notice_at is null or c.last_overdue_notice_at <= ?::timestamptz - ?::interval)`,
    [now, OVERDUE_NOTICES_MAX, now, intervalSeconds],
  );

/** Pass a transaction as `db` to make several calls one change. */
export function cribOverdueRepository(db: Db) {
  return {
    /** Every tool out past its due time at `now`, the longest overdue first. */
    async overdue(now: Date): Promise<OverdueCheckoutRecord[]> {
      return db({ c: 'crib_checkouts' })
        .join({ i: 'crib_items' }, 'i.id', 'c.item_id')
        .join({ p: 'members' }, 'p.id', 'c.member_id')
        .where('c.item_kind', 'tool')
        .whereNull('c.returned_at')
        .where('c.due_at', '<', now)
        .orderBy([{ column: 'c.due_at' }, { column: 'c.id' }])
        .select({
          checkoutId: 'c.id',
          itemId: 'c.item_id',
          itemName: 'i.name',
          assetTag: 'i.asset_tag',
          binLocation: 'i.bin_location',
          memberId: 'c.member_id',
          memberFirstName: 'p.first_name',
          memberLastName: 'p.last_name',
          memberEmail: 'p.email',
          dueAt: 'c.due_at',
          noticesSent: 'c.overdue_notices_sent',
          lastNoticeAt: 'c.last_overdue_notice_at',
        });
    },

    /** The checkouts owed a reminder at `now`, soonest due first. */
    async owedNotices(now: Date): Promise<string[]> {
      const rows: { id: string }[] = await db({ c: 'crib_checkouts' }).where(owedNotice(db, now)).orderBy('c.due_at').select('c.id');
      return rows.map((row) => row.id);
    },

    /**
     * Claims the checkout's next reminder in one statement and answers what the mail needs, or
     * undefined when it is not owed one any more. Under a concurrent run, the second UPDATE waits
     * on the row lock and then re-reads the row, which no longer passes the test.
     */
    async claimNotice(checkoutId: string, now: Date): Promise<OverdueCheckoutRecord | undefined> {
      const result = await db.raw<{ rows: OverdueCheckoutRecord[] }>(
        `update crib_checkouts c
         set overdue_notices_sent = c.overdue_notices_sent + 1, last_overdue_notice_at = ?
         from crib_items i, members p
         where c.id = ? and i.id = c.item_id and p.id = c.member_id and ?
         returning c.id as "checkoutId", c.item_id as "itemId", i.name as "itemName", i.asset_tag as "assetTag",
           i.bin_location as "binLocation", c.member_id as "memberId", p.first_name as "memberFirstName",
           p.last_name as "memberLastName", p.email as "memberEmail", c.due_at as "dueAt",
           c.overdue_notices_sent as "noticesSent", c.last_overdue_notice_at as "lastNoticeAt"`,
        [now, checkoutId, owedNotice(db, now)],
      );
      return result.rows[0];
    },
  };
}
