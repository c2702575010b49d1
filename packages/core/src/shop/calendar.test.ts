import { describe, expect, it } from 'vitest';
import { addCalendarDays, wallClockAt, wallTimeToInstant } from './calendar';

// Offsets and the dates the clocks change come from the IANA time zone database, read through
// Intl: America/Chicago goes from CST (UTC−6) to CDT (UTC−5) at 2:00 on Sunday 8 March 2026.
const CHICAGO = 'America/Chicago';

describe('addCalendarDays', () => {
  it('crosses month ends and leap days as the Gregorian calendar does (ISO 8601)', () => {
    expect(addCalendarDays('2026-02-27', 2)).toBe('2026-03-01');
    expect(addCalendarDays('2028-02-28', 1)).toBe('2028-02-29');
    expect(addCalendarDays('2027-01-01', -1)).toBe('2026-12-31');
  });
});

describe('wallClockAt', () => {
  it("reads the shop's date and minutes, not UTC's (IANA tz database via Intl)", () => {
    // 04:30 UTC on 9 March 2026 is 23:30 CDT on Sunday 8 March.
    expect(wallClockAt(new Date('2026-03-09T04:30:00Z'), CHICAGO)).toEqual({ date: '2026-03-08', minutes: 23 * 60 + 30 });
  });
});

describe('wallTimeToInstant', () => {
  it('keeps 9:00 at 9:00 on the shop clock on both sides of the change (IANA tz database via Intl)', () => {
    expect(wallTimeToInstant('2026-03-07', 9 * 60, CHICAGO)?.toISOString()).toBe('2026-03-07T15:00:00.000Z');
    expect(wallTimeToInstant('2026-03-14', 9 * 60, CHICAGO)?.toISOString()).toBe('2026-03-14T14:00:00.000Z');
  });

  it('has no instant for a time the clocks skip, and the first of a repeated hour (IANA tz database via Intl)', () => {
    expect(wallTimeToInstant('2026-03-08', 2 * 60 + 30, CHICAGO)).toBeNull();
    // America/Chicago returns to CST at 2:00 on Sunday 1 November 2026: 1:30 happens twice, first at UTC−5.
    expect(wallTimeToInstant('2026-11-01', 90, CHICAGO)?.toISOString()).toBe('2026-11-01T06:30:00.000Z');
  });

  it('reads midnight at the end of a day as the next day starting', () => {
    expect(wallTimeToInstant('2026-03-07', 1440, CHICAGO)?.toISOString()).toBe('2026-03-08T06:00:00.000Z');
  });
});

