import type { ReservationStatus } from '@chuckkey/core';
import type { Db } from '../../lib/db';
import type { ReservationMailRecord } from '../reservations/reservations.repository';

export type FeedReservation = Pick<
  ReservationMailRecord,
  'id' | 'startsAt' | 'endsAt' | 'status' | 'machineName' | 'memberEmail' | 'memberFirstName' | 'memberLastName'
> & { status: ReservationStatus };

export function calendarFeedRepository(db: Db) {
  return {
    /** Creates the member's feed or replaces its secret, so an old URL stops working at once. */
    async put(memberId: string, tokenHash: string): Promise<void> {
      await db('calendar_feeds')
        .insert({ member_id: memberId, token_hash: tokenHash })
        .onConflict('member_id')
        .merge({ token_hash: tokenHash, created_at: db.fn.now() });
    },

    async remove(memberId: string): Promise<boolean> {
      return (await db('calendar_feeds').where({ member_id: memberId }).delete()) > 0;
    },

    /** The active member whose feed has this secret's hash. */
    async memberOf(tokenHash: string): Promise<string | undefined> {
      const row = await db('calendar_feeds as f')
        .join('members as p', 'p.id', 'f.member_id')
        .where({ 'f.token_hash': tokenHash, 'p.active': true })
        .first<{ memberId: string } | undefined>({ memberId: 'f.member_id' });
      return row?.memberId;
    },

    /** The member's reservations starting on or after `since`, soonest first, at most `limit`. */
    async reservations(memberId: string, since: Date, limit: number): Promise<FeedReservation[]> {
      return db('reservations as r')
        .join('machines as m', 'm.id', 'r.machine_id')
        .join('members as p', 'p.id', 'r.member_id')
        .where('r.member_id', memberId)
        .where('r.starts_at', '>=', since)
        .orderBy('r.starts_at')
        .limit(limit)
        .select({
          id: 'r.id',
          startsAt: 'r.starts_at',
          endsAt: 'r.ends_at',
          status: 'r.status',
          machineName: 'm.name',
          memberEmail: 'p.email',
          memberFirstName: 'p.first_name',
          memberLastName: 'p.last_name',
        });
    },
  };
}
