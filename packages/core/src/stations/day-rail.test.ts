import { describe, expect, it } from 'vitest';
import { dayRailBounds } from './day-rail';

describe('dayRailBounds', () => {
  it('runs from 06:00 to midnight on the shop’s wall clock', () => {
    // IANA tz database via Intl: America/Chicago is on CST (UTC−6) on 2 December 2026.
    expect(dayRailBounds(new Date('2026-12-02T15:30:00Z'), 'America/Chicago')).toEqual({
      start: new Date('2026-12-02T12:00:00Z'),
      end: new Date('2026-12-03T06:00:00Z'),
    });
  });

  it('takes the shop’s date, not the UTC date, late in the local evening', () => {
    // IANA tz database via Intl: 03:30 UTC on 3 December is 21:30 CST on 2 December in Chicago.
    expect(dayRailBounds(new Date('2026-12-03T03:30:00Z'), 'America/Chicago').start).toEqual(new Date('2026-12-02T12:00:00Z'));
  });

  it('follows the zone across a change of the clocks', () => {
    // IANA tz database via Intl: Chicago moves to CDT (UTC−5) at 02:00 on Sunday 8 March 2026, so
    // 06:00 that day is 11:00 UTC while midnight before it was 06:00 UTC.
    expect(dayRailBounds(new Date('2026-03-08T18:00:00Z'), 'America/Chicago')).toEqual({
      start: new Date('2026-03-08T11:00:00Z'),
      end: new Date('2026-03-09T05:00:00Z'),
    });
    // IANA tz database via Intl: Lord Howe Island moves its clocks by 30 minutes at 02:00 local;
    // on 4 October 2026 it goes from UTC+10:30 to UTC+11.
    expect(dayRailBounds(new Date('2026-10-04T03:00:00Z'), 'Australia/Lord_Howe')).toEqual({
      start: new Date('2026-10-03T19:00:00Z'),
      end: new Date('2026-10-04T13:00:00Z'),
    });
  });
});
