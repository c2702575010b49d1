import { calendarMessage, reservationEvent, type CalendarMethod, type CalendarPerson, type ReservationEvent } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import type { Mail } from '../../lib/mailer';
import { shopRepository } from '../shop/shop.repository';
import { reservationsRepository, type ReservationMailRecord } from './reservations.repository';

export type ReservationMailKind = 'confirmation' | 'cancellation' | 'reminder' | 'no_show';

/** Every calendar entry of one reservation carries this UID, so a cancellation replaces its confirmation. */
export const reservationUid = (reservationId: string): string => `${reservationId}@chuckkey`;

/** The address part of `Name <address>` (or the whole value when it has no angle brackets). */
export function mailAddress(from: string): string {
  const match = /<([^<>]+)>\s*$/.exec(from);
  return (match?.[1] ?? from).trim();
}

interface ShopForMail {
  name: string;
  town: string;
  timeZone: string;
}

/** What a calendar entry of a reservation is written from. */
export type CalendarEntrySource = Pick<ReservationMailRecord, 'id' | 'startsAt' | 'endsAt' | 'machineName' | 'memberEmail' | 'memberFirstName' | 'memberLastName'> & {
  /** A class meeting is entered under the class's title. */
  classTitle?: string | null;
};

export function reservationCalendarEvent(row: CalendarEntrySource, shop: Omit<ShopForMail, 'timeZone'>, organizer: CalendarPerson, status: 'CONFIRMED' | 'CANCELLED'): ReservationEvent {
  return reservationEvent({
    uid: reservationUid(row.id),
    start: row.startsAt,
    end: row.endsAt,
    summary: row.classTitle ? `${row.classTitle} (${row.machineName})` : `${row.machineName} reserved`,
    location: `${shop.name}, ${shop.town}`,
    status,
    organizer,
    attendee: { email: row.memberEmail, name: `${row.memberFirstName} ${row.memberLastName}` },
  });
}

function when(row: ReservationMailRecord, timeZone: string): string {
  const day = new Intl.DateTimeFormat('en-US', { dateStyle: 'full', timeZone }).format(row.startsAt);
  const time = new Intl.DateTimeFormat('en-US', { timeStyle: 'short', timeZone });
  return `${day}, ${time.format(row.startsAt)}–${time.format(row.endsAt)}`;
}

function composeMail(kind: ReservationMailKind, row: ReservationMailRecord, shop: ShopForMail, appUrl: string, organizer: CalendarPerson, now: Date): Mail {
  const slot = when(row, shop.timeZone);
  const greeting = `Hello ${row.memberFirstName},`;
  const footer = ['', `Your reservations: ${appUrl}/`, '', shop.name];
  const calendar = (method: CalendarMethod) => ({
    filename: 'reservation.ics',
    contentType: `text/calendar; method=${method}; charset=UTF-8`,
    content: calendarMessage(method, [reservationCalendarEvent(row, shop, organizer, method === 'CANCEL' ? 'CANCELLED' : 'CONFIRMED')], { now }),
  });
  switch (kind) {
    case 'confirmation':
      return {
        to: row.memberEmail,
        subject: `Reserved: ${row.machineName}, ${slot}`,
        text: [
          greeting,
          '',
          `The ${row.machineName} at ${shop.name} is yours on ${slot} (${shop.timeZone} time).`,
          'Check in by scanning your badge at its station when you arrive; the calendar entry is attached.',
          ...footer,
        ].join('\n'),
        attachments: [calendar('REQUEST')],
      };
    case 'cancellation':
      return {
        to: row.memberEmail,
        subject: `Cancelled: ${row.machineName}, ${slot}`,
        text: [greeting, '', `Your reservation of the ${row.machineName} on ${slot} is cancelled; the time is free for others.`, ...footer].join('\n'),
        attachments: [calendar('CANCEL')],
      };
    case 'reminder':
      return {
        to: row.memberEmail,
        subject: `Coming up: ${row.machineName}, ${slot}`,
        text: [
          greeting,
          '',
          `Your reservation of the ${row.machineName} starts on ${slot}.`,
          'Scan your badge at its station when you arrive. If you cannot come, cancel it so that others can use the time.',
          ...footer,
        ].join('\n'),
      };
    case 'no_show':
      return {
        to: row.memberEmail,
        subject: `Released: ${row.machineName}, ${slot}`,
        text: [
          greeting,
          '',
          `You did not check in for your reservation of the ${row.machineName} on ${slot}, so it was released for others and counts as a no-show.`,
          'Too many no-shows pause reserving for a while; cancel a reservation you cannot keep.',
          ...footer,
        ].join('\n'),
      };
  }
}

/**
 * Mails about a member's reservation. Each is sent after its change committed; a failed hand-off
 * is logged and never undoes or fails the change it reports.
 */
export function reservationMail({ config, db, logger, mailer }: Deps) {
  const organizer: CalendarPerson = { email: mailAddress(config.MAIL_FROM) };
  return {
    /** Builds the mail without sending it, for a caller that claims it in a transaction first. */
    async compose(kind: ReservationMailKind, reservationId: string, now: Date): Promise<Mail | undefined> {
      const [row, shop] = await Promise.all([reservationsRepository(db).forMail(reservationId), shopRepository(db).get()]);
      if (!row) return undefined;
      return composeMail(kind, row, shop, config.publicUrl, { ...organizer, name: shop.name }, now);
    },

    /** Sends the mail; resolves whether it went out, and never rejects. */
    async send(kind: ReservationMailKind, reservationId: string, now = new Date()): Promise<boolean> {
      try {
        const mail = await this.compose(kind, reservationId, now);
        if (!mail) return false;
        await mailer.send(mail);
        return true;
      } catch (error) {
        logger.error({ err: error, reservationId, kind }, 'reservation mail not sent');
        return false;
      }
    },
  };
}
