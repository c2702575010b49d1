import { calendarFeed, type CalendarFeedStatus, type ReservationStatus } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { notFound } from '../../lib/errors';
import { hashToken, randomToken } from '../../lib/tokens';
import { mailAddress, reservationCalendarEvent } from '../reservations/reservation-mail';
import { shopRepository } from '../shop/shop.repository';
import { calendarFeedRepository } from './calendar-feed.repository';

const DAY = 86_400_000;
/** How far back the feed reaches: recent reservations stay in a calendar, older ones drop out. */
const FEED_PAST_DAYS = 90;
const FEED_LIMIT = 500;

/** Statuses whose time the member no longer holds: their entries are written as cancelled, so subscribers drop them. */
const WITHDRAWN: readonly ReservationStatus[] = ['cancelled', 'no_show'];

const feedNotFound = () => notFound('calendar_feed_not_found', 'There is no calendar feed at this address; it may have been replaced or turned off.');

export function calendarFeedService({ config, db }: Deps) {
  const feeds = calendarFeedRepository(db);
  return {
    /** A new secret for the member's feed, replacing any earlier one; the URL is shown this once. */
    async create(memberId: string): Promise<{ url: string }> {
      const token = randomToken();
      await feeds.put(memberId, hashToken(token));
      return { url: `${config.publicUrl}/api/calendar/${token}.ics` };
    },

    /** Whether a feed exists: the web app cannot show the address again, only that one is live and since when. */
    async status(memberId: string): Promise<CalendarFeedStatus> {
      const createdAt = await feeds.createdAt(memberId);
      return { exists: createdAt !== undefined, createdAt: createdAt?.toISOString() ?? null };
    },

    async revoke(memberId: string): Promise<void> {
      if (!(await feeds.remove(memberId))) throw feedNotFound();
    },

    /** The feed's iCalendar text for whoever holds the secret. */
    async feed(token: string, now = new Date()): Promise<string> {
      const memberId = await feeds.memberOf(hashToken(token));
      if (!memberId) throw feedNotFound();
      const [shop, rows] = await Promise.all([shopRepository(db).get(), feeds.reservations(memberId, new Date(now.getTime() - FEED_PAST_DAYS * DAY), FEED_LIMIT)]);
      const organizer = { email: mailAddress(config.MAIL_FROM), name: shop.name };
      const events = rows.map((row) => reservationCalendarEvent(row, shop, organizer, WITHDRAWN.includes(row.status) ? 'CANCELLED' : 'CONFIRMED'));
      return calendarFeed(events, { name: `${shop.name} reservations`, now });
    },
  };
}
