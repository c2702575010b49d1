import type { ReservationStatus } from '@chuckkey/core';
import type { Db } from '../../lib/db';
import type { ReservationMailRecord } from '../reservations/reservations.repository';

export type FeedReservation = Pick<
  ReservationMailRecord,
  'id' | 'startsAt' | 'endsAt' | 'status' | 'machineName' | 'memberEmail' | 'memberFirstName' | 'memberLastName'
> & { status: ReservationStatus; classTitle: string | null };

export function calendarFeedRepository(db: Db) {
  return {
    /** Creates the member's feed or replaces its secret, so an old URL stops working at once. */
    async put(memberId: string, tokenHash: string): Promise<void> {
      await db('calendar_feeds')
        .insert({ member_id: memberId, token_hash: tokenHash })
        .onConflict('member_id')
        .merge({ token_hash: tokenHash, created_at: db.fn.now() });
    },

    /** When the member's current feed secret was made, or undefined when they have none. */
    async createdAt(memberId: string): Promise<Date | undefined> {
      const row = await db('calendar_feeds').where({ member_id: memberId }).first<{ createdAt: Date } | undefined>({ createdAt: 'created_at' });
      return row?.createdAt;
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

    /**
     * The member's reservations and the meetings of classes they are booked into, starting on or
     * after `since`, soonest first, at most `limit`. The feed's member is every entry's attendee.
     */
    async reservations(memberId: string, since: Date, limit: number): Promise<FeedReservation[]> {
      return db('reservations as r')
        .join('machines as m', 'm.id', 'r.machine_id')
        .join('members as p', (on) => on.onVal('p.id', memberId))
        .leftJoin('classes as c', 'c.id', 'r.class_id')
        .where((mine) => {
          mine.where('r.member_id', memberId).orWhereIn('r.class_id', db('class_members').where({ member_id: memberId }).select('class_id'));
        })
        .where('r.starts_at', '>=', since)
        .orderBy('r.starts_at')
        .limit(limit)
        .select({
          id: 'r.id',
          startsAt: 'r.starts_at',
          // A reservation given back early ended, for the member's calendar, when it was released.
          endsAt: db.raw('coalesce(r.released_at, r.ends_at)'),
          status: 'r.status',
          machineName: 'm.name',
          memberEmail: 'p.email',
          memberFirstName: 'p.first_name',
          memberLastName: 'p.last_name',
          classTitle: 'c.title',
        });
    },
  };
}
