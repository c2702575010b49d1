/**
 * iCalendar (RFC 5545) text for reservations: the attachment of the confirmation and
 * cancellation mail (METHOD:REQUEST / METHOD:CANCEL, RFC 5546) and a member's calendar feed.
 * Times are written in UTC, so no VTIMEZONE is needed and the instant a reservation holds is
 * the one the calendar shows, whatever the reader's zone.
 */

/** The product identifier of every object Chuckkey writes (RFC 5545 §3.7.3, in the usual FPI form). */
export const ICS_PRODUCT_ID = '-//Chuckkey//Chuckkey reservations//EN';

/** RFC 5545 §3.1: content lines longer than this many octets, not counting CRLF, are folded. */
export const ICS_MAX_LINE_OCTETS = 75;

const CRLF = '\r\n';

/** The two states a reservation takes in a calendar (RFC 5545 §3.8.1.11, VEVENT statuses). */
export type ReservationEventStatus = 'CONFIRMED' | 'CANCELLED';

export interface CalendarPerson {
  email: string;
  name?: string;
}

export interface ReservationEventInput {
  /** Stable for the life of the reservation: the cancellation must name the same UID as the confirmation. */
  uid: string;
  start: Date;
  end: Date;
  summary: string;
  location?: string | null;
  description?: string | null;
  status: ReservationEventStatus;
  /** The shop's address; RFC 5546 §3.2.2 and §3.2.5 expect it in a REQUEST and a CANCEL sent by mail. */
  organizer?: CalendarPerson | null;
  /** The member who holds the reservation. */
  attendee?: CalendarPerson | null;
}

/** A reservation checked and ready to be written; build it with `reservationEvent`. */
export interface ReservationEvent {
  readonly uid: string;
  readonly start: Date;
  readonly end: Date;
  readonly summary: string;
  readonly location: string | null;
  readonly description: string | null;
  readonly status: ReservationEventStatus;
  /**
   * RFC 5545 §3.8.7.4: a reservation is written once when confirmed and once when cancelled (its
   * times are never edited), so the cancellation's revision is 1 and a calendar that already has
   * revision 0 applies it.
   */
  readonly sequence: number;
  readonly organizer: CalendarPerson | null;
  readonly attendee: CalendarPerson | null;
}

export type CalendarMethod = 'REQUEST' | 'CANCEL';

export function reservationEvent(input: ReservationEventInput): ReservationEvent {
  const uid = input.uid.trim();
  if (uid === '') throw new RangeError('A calendar event needs a UID (RFC 5545 §3.8.4.7).');
  assertInstant(input.start, 'start');
  assertInstant(input.end, 'end');
  if (input.end.getTime() <= input.start.getTime()) {
    throw new RangeError('A reservation must end after it starts (RFC 5545 §3.8.2.2).');
  }
  return {
    uid,
    start: new Date(input.start.getTime()),
    end: new Date(input.end.getTime()),
    summary: input.summary,
    location: blankToNull(input.location),
    description: blankToNull(input.description),
    status: input.status,
    sequence: input.status === 'CANCELLED' ? 1 : 0,
    organizer: input.organizer ? checkedPerson(input.organizer) : null,
    attendee: input.attendee ? checkedPerson(input.attendee) : null,
  };
}

/**
 * The attachment of a confirmation (REQUEST) or cancellation (CANCEL) mail. Every event must
 * agree with the method: a REQUEST carries confirmed reservations and a CANCEL cancelled ones,
 * so that the STATUS and SEQUENCE a calendar receives always match what happened.
 */
export function calendarMessage(method: CalendarMethod, events: readonly ReservationEvent[], options: { now: Date }): string {
  if (events.length === 0) throw new RangeError('A calendar message carries at least one event (RFC 5545 §3.6).');
  const wanted: ReservationEventStatus = method === 'CANCEL' ? 'CANCELLED' : 'CONFIRMED';
  for (const event of events) {
    if (event.status !== wanted) {
      throw new RangeError(`A ${method} message carries ${wanted} events only; ${event.uid} is ${event.status}.`);
    }
  }
  // RFC 5546 §3.2 (from memory): one scheduling message is about one calendar entry, so one UID.
  const uids = new Set(events.map((event) => event.uid));
  if (uids.size > 1) throw new RangeError('A calendar message is about one reservation: all its events share one UID.');
  assertInstant(options.now, 'now');
  return writeCalendar([prop('METHOD', method)], events, options.now);
}

/**
 * A member's subscription feed: no METHOD (RFC 5545 §3.7.2: an object without one is not a
 * scheduling message). With no reservations the calendar holds no VEVENT, although the §3.6
 * grammar asks for at least one component: a subscriber must still get a calendar it can read,
 * or the member's last cancelled entries would stay in it.
 */
export function calendarFeed(events: readonly ReservationEvent[], options: { name: string; now: Date }): string {
  assertInstant(options.now, 'now');
  return writeCalendar(
    [
      // RFC 7986 §5.1 names a calendar with NAME; X-WR-CALNAME is the older extension most
      // subscribing readers still show (common practice, no published source).
      prop('NAME', escapeText(options.name)),
      prop('X-WR-CALNAME', escapeText(options.name)),
    ],
    events,
    options.now,
  );
}

/** RFC 5545 §3.3.11: backslash, semicolon, comma and line breaks are escaped in TEXT values. */
export function escapeText(value: string): string {
  return (
    value
      .replace(/\\/g, '\\\\')
      .replace(/;/g, '\\;')
      .replace(/,/g, '\\,')
      .replace(/\r\n|\r|\n/g, '\\n')
      // §3.3.11: TEXT may hold no control character other than HTAB.
      // eslint-disable-next-line no-control-regex
      .replace(/[\u0000-\u0008\u000B-\u001F\u007F]/g, '')
  );
}

/** RFC 5545 §3.3.5, form 2: a date-time in UTC, 'YYYYMMDDTHHMMSSZ' (whole seconds). */
export function formatUtcDateTime(instant: Date): string {
  assertInstant(instant, 'instant');
  const pad = (n: number, width = 2) => String(n).padStart(width, '0');
  return (
    `${pad(instant.getUTCFullYear(), 4)}${pad(instant.getUTCMonth() + 1)}${pad(instant.getUTCDate())}` +
    `T${pad(instant.getUTCHours())}${pad(instant.getUTCMinutes())}${pad(instant.getUTCSeconds())}Z`
  );
}

/**
 * RFC 5545 §3.1: a line longer than 75 octets is split into lines of at most 75 octets, each
 * continuation starting with one space (which counts toward its 75). Splits fall between
 * characters, never inside a UTF-8 multi-octet sequence. Returns the line with its CRLF.
 */
export function foldContentLine(line: string): string {
  const parts: string[] = [];
  let current = '';
  let octets = 0;
  for (const char of line) {
    const size = utf8Length(char);
    if (octets + size > ICS_MAX_LINE_OCTETS) {
      parts.push(current);
      current = ' ';
      octets = 1;
    }
    current += char;
    octets += size;
  }
  parts.push(current);
  return parts.join(CRLF) + CRLF;
}

/** One content line before folding (§3.1): name, parameters already written as ';NAME=value', value. */
interface Property {
  name: string;
  params?: string;
  value: string;
}

const prop = (name: string, value: string, params?: string): Property => (params ? { name, params, value } : { name, value });

function writeCalendar(extraProperties: Property[], events: readonly ReservationEvent[], now: Date): string {
  const lines: Property[] = [
    prop('BEGIN', 'VCALENDAR'),
    // §3.7.3 and §3.7.4: PRODID and VERSION are required once in every calendar object.
    prop('PRODID', ICS_PRODUCT_ID),
    prop('VERSION', '2.0'),
    prop('CALSCALE', 'GREGORIAN'),
    ...extraProperties,
  ];
  const stamp = formatUtcDateTime(now);
  for (const event of events) lines.push(...eventProperties(event, stamp));
  lines.push(prop('END', 'VCALENDAR'));
  return lines.map(({ name, params, value }) => foldContentLine(`${name}${params ?? ''}:${value}`)).join('');
}

function eventProperties(event: ReservationEvent, stamp: string): Property[] {
  const properties: Property[] = [
    prop('BEGIN', 'VEVENT'),
    prop('UID', escapeText(event.uid)),
    // §3.8.7.2: DTSTAMP is in UTC; for a message it is when the message was made. In a feed it
    // should be the last change in the store, which the time of writing is never earlier than.
    prop('DTSTAMP', stamp),
    prop('DTSTART', formatUtcDateTime(event.start)),
    prop('DTEND', formatUtcDateTime(event.end)),
    prop('SUMMARY', escapeText(event.summary)),
  ];
  if (event.location !== null) properties.push(prop('LOCATION', escapeText(event.location)));
  if (event.description !== null) properties.push(prop('DESCRIPTION', escapeText(event.description)));
  if (event.organizer !== null) properties.push(calAddress('ORGANIZER', event.organizer));
  if (event.attendee !== null) properties.push(calAddress('ATTENDEE', event.attendee));
  properties.push(
    prop('STATUS', event.status),
    prop('SEQUENCE', String(event.sequence)),
    // §3.8.2.7: a reservation holds the member's time; a cancelled one no longer does.
    prop('TRANSP', event.status === 'CANCELLED' ? 'TRANSPARENT' : 'OPAQUE'),
    prop('END', 'VEVENT'),
  );
  return properties;
}

/** §3.3.3 CAL-ADDRESS as a mailto URI, with the name as a CN parameter (§3.2.2), quoted per §3.1. */
function calAddress(name: 'ORGANIZER' | 'ATTENDEE', person: CalendarPerson): Property {
  const uri = `mailto:${person.email}`;
  if (!person.name) return prop(name, uri);
  // §3.1: a parameter value may not contain DQUOTE or control characters, even quoted.
  // eslint-disable-next-line no-control-regex
  const cn = person.name.replace(/["\u0000-\u001F\u007F]/g, '');
  return prop(name, uri, `;CN="${cn}"`);
}

function checkedPerson(person: CalendarPerson): CalendarPerson {
  // An address with a line break, space or quote would break the content line it is written on.
  if (!/^[^\s@"<>]+@[^\s@"<>]+$/.test(person.email)) {
    throw new RangeError(`Not an e-mail address for a calendar entry: ${JSON.stringify(person.email)}`);
  }
  return person.name ? { email: person.email, name: person.name } : { email: person.email };
}

function utf8Length(char: string): number {
  const code = char.codePointAt(0) ?? 0;
  if (code < 0x80) return 1;
  if (code < 0x800) return 2;
  if (code < 0x10000) return 3;
  return 4;
}

function assertInstant(value: Date, what: string): void {
  if (!(value instanceof Date) || Number.isNaN(value.getTime())) {
    throw new RangeError(`The ${what} of a calendar entry is not a valid instant.`);
  }
}

function blankToNull(value: string | null | undefined): string | null {
  return value === undefined || value === null || value.trim() === '' ? null : value;
}
