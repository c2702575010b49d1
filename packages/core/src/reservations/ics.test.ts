import ICAL from 'ical.js';
import { describe, expect, it } from 'vitest';
import {
  calendarFeed,
  calendarMessage,
  escapeText,
  foldContentLine,
  formatUtcDateTime,
  ICS_MAX_LINE_OCTETS,
  ICS_PRODUCT_ID,
  reservationEvent,
  type ReservationEventInput,
} from './ics';

const now = new Date('2026-12-02T08:15:42.731Z');

function saturdayWelding(overrides: Partial<ReservationEventInput> = {}) {
  return reservationEvent({
    uid: '5b0f3c1e-7a2d-4e8b-9c61-2f4d8a7e1b90@reservations.chuckkey.example.org',
    // Saturday 5 December 2026, 9:00–11:00 in America/Chicago (CST, UTC−6).
    start: new Date('2026-12-05T15:00:00Z'),
    end: new Date('2026-12-05T17:00:00Z'),
    summary: 'MIG welder, bay 2',
    location: 'Metal shop, welding bay',
    description: 'Check in at the station up to 10 minutes before the start.',
    status: 'CONFIRMED',
    ...overrides,
  });
}

// RFC 7986 §5.1: NAME is a TEXT property; X-WR-CALNAME is read as TEXT too (common practice).
// ical.js 2.2.1 knows only RFC 5545's own properties and would keep these values escaped.
ICAL.design.icalendar.property['name'] = { defaultType: 'text' };
ICAL.design.icalendar.property['x-wr-calname'] = { defaultType: 'text' };

/** The object as the independent reader ical.js sees it. */
function parsed(text: string) {
  const calendar = new ICAL.Component(ICAL.parse(text));
  const vevents = calendar.getAllSubcomponents('vevent');
  return { calendar, vevents, events: vevents.map((vevent) => new ICAL.Event(vevent)) };
}

/** The physical lines of the text, without their CRLF (the text must end with one). */
function physicalLines(text: string): string[] {
  expect(text.endsWith('\r\n')).toBe(true);
  return text.slice(0, -2).split('\r\n');
}

const octets = (line: string) => new TextEncoder().encode(line).length;

/** The logical content lines after unfolding (RFC 5545 §3.1: drop each CRLF followed by one space). */
function unfolded(text: string): string[] {
  return physicalLines(text.replace(/\r\n /g, ''));
}

describe('calendarMessage()', () => {
  it('a confirmation is a REQUEST that an independent reader parses back to the same reservation', () => {
    const text = calendarMessage('REQUEST', [saturdayWelding()], { now });
    const { calendar, events } = parsed(text);

    // RFC 5545 §3.7.2: METHOD names the scheduling method (RFC 5546 §3.2.2 REQUEST).
    expect(calendar.getFirstPropertyValue('method')).toBe('REQUEST');
    // RFC 5545 §3.7.3 and §3.7.4: PRODID and VERSION:2.0 are required.
    expect(calendar.getFirstPropertyValue('prodid')).toBe(ICS_PRODUCT_ID);
    expect(calendar.getFirstPropertyValue('version')).toBe('2.0');
    expect(events).toHaveLength(1);
    const event = events[0]!;
    // RFC 5545 §3.8.4.7: UID identifies the reservation, as given.
    expect(event.uid).toBe('5b0f3c1e-7a2d-4e8b-9c61-2f4d8a7e1b90@reservations.chuckkey.example.org');
    // RFC 5545 §3.8.2.4 and §3.8.2.2: the start and end instants survive the round trip.
    expect(event.startDate.toJSDate().toISOString()).toBe('2026-12-05T15:00:00.000Z');
    expect(event.endDate.toJSDate().toISOString()).toBe('2026-12-05T17:00:00.000Z');
    expect(event.summary).toBe('MIG welder, bay 2');
    expect(event.location).toBe('Metal shop, welding bay');
    expect(event.description).toBe('Check in at the station up to 10 minutes before the start.');
    // RFC 5545 §3.8.1.11: a confirmed VEVENT; §3.8.7.4: first revision is 0.
    expect(event.component.getFirstPropertyValue('status')).toBe('CONFIRMED');
    expect(event.sequence).toBe(0);
  });

  it('writes DTSTAMP, DTSTART and DTEND as UTC date-times ending in Z, in whole seconds', () => {
    const lines = unfolded(calendarMessage('REQUEST', [saturdayWelding()], { now }));
    // RFC 5545 §3.8.7.2: DTSTAMP is in UTC; §3.3.5 form 2: date with UTC time, 'Z' suffix, no TZID.
    expect(lines).toContain('DTSTAMP:20261202T081542Z');
    expect(lines).toContain('DTSTART:20261205T150000Z');
    expect(lines).toContain('DTEND:20261205T170000Z');
    // RFC 5545 §3.3.11: the comma of a TEXT value is written escaped.
    expect(lines).toContain('SUMMARY:MIG welder\\, bay 2');
    expect(lines.filter((line) => line.includes('TZID'))).toEqual([]);

    const { events } = parsed(calendarMessage('REQUEST', [saturdayWelding()], { now }));
    const stamp = events[0]!.component.getFirstPropertyValue('dtstamp') as InstanceType<typeof ICAL.Time>;
    expect(stamp.zone).toBe(ICAL.Timezone.utcTimezone);
    expect(stamp.toJSDate().toISOString()).toBe('2026-12-02T08:15:42.000Z');
  });

  it('a reservation after the spring change to daylight time still reads 9:00 in the shop', () => {
    // IANA tz database via Intl: America/Chicago goes to CDT (UTC−5) on 8 March 2026, so
    // Saturday 14 March 9:00 local is 14:00Z.
    const event = saturdayWelding({ start: new Date('2026-03-14T14:00:00Z'), end: new Date('2026-03-14T16:00:00Z') });
    const read = parsed(calendarMessage('REQUEST', [event], { now })).events[0]!;
    const local = new Intl.DateTimeFormat('en-US', {
      timeZone: 'America/Chicago',
      weekday: 'long',
      hour: '2-digit',
      minute: '2-digit',
      hourCycle: 'h23',
    }).format(read.startDate.toJSDate());
    expect(local).toBe('Saturday 09:00');
  });

  it('a cancellation is a CANCEL with the same UID, STATUS:CANCELLED and a higher SEQUENCE', () => {
    const confirmed = saturdayWelding();
    const cancelled = saturdayWelding({ status: 'CANCELLED' });
    const request = parsed(calendarMessage('REQUEST', [confirmed], { now })).events[0]!;
    const { calendar, events } = parsed(calendarMessage('CANCEL', [cancelled], { now: new Date('2026-12-03T10:00:00Z') }));
    const cancel = events[0]!;

    // RFC 5546 §3.2.5: CANCEL names the event by its UID.
    expect(calendar.getFirstPropertyValue('method')).toBe('CANCEL');
    expect(cancel.uid).toBe(request.uid);
    // RFC 5545 §3.8.1.11: STATUS:CANCELLED.
    expect(cancel.component.getFirstPropertyValue('status')).toBe('CANCELLED');
    // RFC 5545 §3.8.7.4: a later revision carries a larger SEQUENCE, so calendars apply it.
    expect(cancel.sequence).toBeGreaterThan(request.sequence);
  });

  it('refuses a message whose events contradict its method, or that has none', () => {
    // RFC 5546 §3.2.2 / §3.2.5 (from memory): a REQUEST proposes the event, a CANCEL withdraws it.
    expect(() => calendarMessage('REQUEST', [saturdayWelding({ status: 'CANCELLED' })], { now })).toThrow(RangeError);
    expect(() => calendarMessage('CANCEL', [saturdayWelding()], { now })).toThrow(RangeError);
    // RFC 5545 §3.6: a calendar object holds at least one component.
    expect(() => calendarMessage('REQUEST', [], { now })).toThrow(RangeError);
    // RFC 5546 §3.2 (from memory): one scheduling message is about one UID.
    expect(() =>
      calendarMessage('REQUEST', [saturdayWelding(), saturdayWelding({ uid: 'another@reservations.chuckkey.example.org' })], { now }),
    ).toThrow(RangeError);
  });

  it('names the shop as organizer and the member as attendee, with names that need quoting', () => {
    const event = saturdayWelding({
      organizer: { email: 'desk@shop.example.org', name: 'Riverside Metal Shop: front desk' },
      attendee: { email: 'ana.quiroga@example.org', name: 'Ana "Q" Quiroga; Ñandú' },
    });
    const { events } = parsed(calendarMessage('REQUEST', [event], { now }));
    const vevent = events[0]!.component;
    // RFC 5545 §3.3.3 CAL-ADDRESS as a mailto URI; §3.2.2 CN; §3.1: ':' and ';' in a
    // parameter value need DQUOTEs, and a DQUOTE cannot be inside one.
    expect(vevent.getFirstPropertyValue('organizer')).toBe('mailto:desk@shop.example.org');
    expect(vevent.getFirstProperty('organizer')!.getParameter('cn')).toBe('Riverside Metal Shop: front desk');
    expect(vevent.getFirstPropertyValue('attendee')).toBe('mailto:ana.quiroga@example.org');
    expect(vevent.getFirstProperty('attendee')!.getParameter('cn')).toBe('Ana Q Quiroga; Ñandú');
  });

  it('ends every line, the last one too, with CRLF and no line with a bare CR or LF', () => {
    const text = calendarMessage('REQUEST', [saturdayWelding({ description: 'Line one\nline two\r\nline three' })], { now });
    // RFC 5545 §3.1: content lines are delimited by CRLF.
    expect(text.endsWith('END:VCALENDAR\r\n')).toBe(true);
    expect(text.replace(/\r\n/g, '')).not.toMatch(/[\r\n]/);
  });
});

describe('TEXT values', () => {
  it('escapes backslash, semicolon, comma and line breaks, and leaves a colon alone', () => {
    // RFC 5545 §3.3.11: ESCAPED-CHAR = "\\\\" / "\\;" / "\\," / "\\N" / "\\n"; COLON is a TSAFE-CHAR.
    expect(escapeText('a\\b;c,d\ne\r\nf\rg: h')).toBe('a\\\\b\\;c\\,d\\ne\\nf\\ng: h');
  });

  it('drops control characters other than tab', () => {
    // RFC 5545 §3.3.11: TSAFE-CHAR excludes CONTROL; HTAB (WSP) is allowed.
    expect(escapeText('bell\u0007 and\tTab\u007F')).toBe('bell and\tTab');
  });

  it('summary, location and description with commas, semicolons, backslashes and non-ASCII text round-trip', () => {
    const summary = 'Soldadora MIG, bahía 2; «sábado» C:\\piezas — 溶接機 🔥';
    const description = 'Bring: helmet, gloves; leather jacket.\nFire watch: 30 min after.\\ Ünïcödé ✓';
    const location = 'Taller, Straße 7; Øst';
    const { events } = parsed(calendarMessage('REQUEST', [saturdayWelding({ summary, description, location })], { now }));
    // RFC 5545 §3.3.11 escaping, read back by ical.js.
    expect(events[0]!.summary).toBe(summary);
    expect(events[0]!.description).toBe(description);
    expect(events[0]!.location).toBe(location);
  });
});

describe('folding', () => {
  it('keeps every line within 75 octets of UTF-8 and never splits a character', () => {
    const summary = 'Ünïcödé ✓ 溶接機の予約 🔥, ' + 'é'.repeat(60) + ' ' + '🔩'.repeat(40) + ' 溶'.repeat(30);
    const description = 'x'.repeat(74) + 'é' + 'y'.repeat(200);
    const text = calendarMessage('REQUEST', [saturdayWelding({ summary, description })], { now });
    const lines = physicalLines(text);

    // RFC 5545 §3.1: lines SHOULD NOT be longer than 75 octets, excluding the line break.
    for (const line of lines) expect(octets(line)).toBeLessThanOrEqual(ICS_MAX_LINE_OCTETS);
    // RFC 5545 §3.1: folding does not split a multi-octet sequence, so each physical line
    // is valid UTF-8 by itself (a split would leave a lone surrogate or a replacement char).
    for (const line of lines) {
      expect(line).not.toMatch(/[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/);
      expect(new TextDecoder('utf-8', { fatal: true }).decode(new TextEncoder().encode(line))).toBe(line);
    }
    expect(lines.some((line) => line.startsWith(' '))).toBe(true);
    // The long values come back whole through an independent unfolding parser.
    const event = parsed(text).events[0]!;
    expect(event.summary).toBe(summary);
    expect(event.description).toBe(description);
  });

  it('fills a line to exactly 75 octets and starts the continuation with one space', () => {
    const line = 'DESCRIPTION:' + 'a'.repeat(63) + 'b'.repeat(10);
    const folded = foldContentLine(line);
    // RFC 5545 §3.1: a long line is split with CRLF followed by a single whitespace.
    expect(folded).toBe('DESCRIPTION:' + 'a'.repeat(63) + '\r\n ' + 'b'.repeat(10) + '\r\n');
    expect(octets(folded.split('\r\n')[0]!)).toBe(75);
  });

  it('moves a character of several octets whole onto the next line rather than cut it', () => {
    // 74 ASCII octets, then 'é' (2 octets in UTF-8): 76 would be over, so 'é' starts the continuation.
    const folded = foldContentLine('X'.repeat(74) + 'é' + 'Z');
    expect(folded).toBe('X'.repeat(74) + '\r\n éZ\r\n');
    // A 4-octet character at the boundary: 73 + 4 > 75.
    expect(foldContentLine('X'.repeat(73) + '🔥')).toBe('X'.repeat(73) + '\r\n 🔥\r\n');
  });

  it('leaves a line of 75 octets as it is', () => {
    // RFC 5545 §3.1: only lines longer than 75 octets are folded.
    expect(foldContentLine('S'.repeat(75))).toBe('S'.repeat(75) + '\r\n');
  });
});

describe('formatUtcDateTime()', () => {
  it('writes the UTC form with the seconds truncated, whatever the local zone', () => {
    // RFC 5545 §3.3.5, FORM #2: DATE WITH UTC TIME, e.g. 19980119T070000Z.
    expect(formatUtcDateTime(new Date('1998-01-19T07:00:00.999Z'))).toBe('19980119T070000Z');
    expect(formatUtcDateTime(new Date('2026-11-01T06:59:59Z'))).toBe('20261101T065959Z');
  });
});

describe('reservationEvent()', () => {
  it('refuses a reservation that does not end after it starts, an empty UID or an invalid instant', () => {
    // RFC 5545 §3.8.2.2: DTEND must be later than DTSTART.
    const start = new Date('2026-12-05T15:00:00Z');
    expect(() => saturdayWelding({ start, end: start })).toThrow(RangeError);
    // RFC 5545 §3.8.4.7: UID is required.
    expect(() => saturdayWelding({ uid: '  ' })).toThrow(RangeError);
    expect(() => saturdayWelding({ start: new Date('not a date') })).toThrow(RangeError);
  });

  it('refuses an e-mail address that would break its content line', () => {
    expect(() => saturdayWelding({ attendee: { email: 'member@example.org\r\nATTENDEE:mailto:x@example.org' } })).toThrow(RangeError);
  });

  it('leaves out LOCATION and DESCRIPTION when they are blank', () => {
    const lines = unfolded(calendarMessage('REQUEST', [saturdayWelding({ location: '', description: null })], { now }));
    expect(lines.some((line) => line.startsWith('LOCATION'))).toBe(false);
    expect(lines.some((line) => line.startsWith('DESCRIPTION'))).toBe(false);
  });
});

describe('calendarFeed()', () => {
  it('is a calendar without METHOD, named, holding every reservation given', () => {
    const feed = calendarFeed(
      [
        saturdayWelding(),
        saturdayWelding({
          uid: '0d6c8a12-93b4-4f2e-8a77-c1e5b3d9f024@reservations.chuckkey.example.org',
          summary: 'Engine lathe, 13 in',
          start: new Date('2026-12-08T00:00:00Z'),
          end: new Date('2026-12-08T01:30:00Z'),
          status: 'CANCELLED',
        }),
      ],
      { name: 'Chuckkey: Ana, reservations', now },
    );
    const { calendar, events } = parsed(feed);
    // RFC 5545 §3.7.2: without METHOD the object is not a scheduling message.
    expect(calendar.getFirstPropertyValue('method')).toBeNull();
    expect(unfolded(feed).some((line) => line.startsWith('METHOD'))).toBe(false);
    // RFC 7986 §5.1 NAME (TEXT, §3.3.11 escaping); X-WR-CALNAME by common practice.
    expect(calendar.getFirstPropertyValue('name')).toBe('Chuckkey: Ana, reservations');
    expect(calendar.getFirstPropertyValue('x-wr-calname')).toBe('Chuckkey: Ana, reservations');
    expect(calendar.getFirstPropertyValue('version')).toBe('2.0');
    expect(events.map((event) => [event.summary, event.component.getFirstPropertyValue('status')])).toEqual([
      ['MIG welder, bay 2', 'CONFIRMED'],
      ['Engine lathe, 13 in', 'CANCELLED'],
    ]);
    // RFC 5545 §3.6: every VEVENT has UID and DTSTAMP.
    for (const event of events) {
      expect(event.uid).not.toBe('');
      expect(event.component.getFirstPropertyValue('dtstamp')).not.toBeNull();
    }
  });

  it('with no reservations, still reads as a calendar with no events', () => {
    const feed = calendarFeed([], { name: 'Reservations', now });
    expect(feed.startsWith('BEGIN:VCALENDAR\r\n')).toBe(true);
    expect(parsed(feed).events).toEqual([]);
  });
});
