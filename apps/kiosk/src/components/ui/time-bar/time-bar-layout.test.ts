import { describe, expect, it } from 'vitest';
import { railPercent, railSpan, spanWords, wallMinutes } from './time-bar-layout';

describe('railPercent', () => {
  // screens.md "Time bars": the day rail runs from 06:00 to 24:00, 18 hours.
  it('puts 06:00 at 0 %, 15:00 halfway and midnight at 100 %', () => {
    expect(railPercent(6 * 60)).toBe(0);
    expect(railPercent(15 * 60)).toBe(50);
    expect(railPercent(24 * 60)).toBe(100);
    expect(railPercent(9 * 60)).toBeCloseTo(16.667, 3);
  });

  it('holds minutes before 06:00 and after midnight to the rail’s ends', () => {
    expect(railPercent(3 * 60)).toBe(0);
    expect(railPercent(-120)).toBe(0);
    expect(railPercent(25 * 60)).toBe(100);
  });
});

describe('railSpan', () => {
  const day = '2026-12-02';
  const utc = 'UTC';

  it('places a reservation from 14:00 to 16:00', () => {
    const span = railSpan(new Date('2026-12-02T14:00:00Z'), new Date('2026-12-02T16:00:00Z'), day, utc);
    expect(span?.left).toBeCloseTo((8 / 18) * 100, 6);
    expect(span?.width).toBeCloseTo((2 / 18) * 100, 6);
    expect(span).toMatchObject({ clippedStart: false, clippedEnd: false });
  });

  it('cuts a span off at 06:00 and at midnight, and says so', () => {
    expect(railSpan(new Date('2026-12-02T05:00:00Z'), new Date('2026-12-02T07:00:00Z'), day, utc)).toMatchObject({ left: 0, clippedStart: true, clippedEnd: false });
    expect(railSpan(new Date('2026-12-02T05:00:00Z'), new Date('2026-12-02T07:00:00Z'), day, utc)?.width).toBeCloseTo((1 / 18) * 100, 6);
    const late = railSpan(new Date('2026-12-02T23:00:00Z'), new Date('2026-12-03T01:00:00Z'), day, utc);
    expect(late).toMatchObject({ clippedStart: false, clippedEnd: true });
    expect(late!.left + late!.width).toBeCloseTo(100, 6);
    // Yesterday evening into this morning: only the part after 06:00 is on the rail.
    expect(railSpan(new Date('2026-12-01T22:00:00Z'), new Date('2026-12-02T07:30:00Z'), day, utc)).toMatchObject({ left: 0, clippedStart: true });
  });

  it('leaves out a span wholly before 06:00 or on another day', () => {
    expect(railSpan(new Date('2026-12-02T04:00:00Z'), new Date('2026-12-02T06:00:00Z'), day, utc)).toBeNull();
    expect(railSpan(new Date('2026-12-03T09:00:00Z'), new Date('2026-12-03T10:00:00Z'), day, utc)).toBeNull();
    expect(railSpan(new Date('2026-12-01T09:00:00Z'), new Date('2026-12-01T10:00:00Z'), day, utc)).toBeNull();
  });

  it('reads the shop’s wall clock on the day the clocks go forward', () => {
    // IANA tz database via Intl: America/Chicago goes from CST (UTC−6) to CDT (UTC−5) at 02:00 on
    // Sunday 8 March 2026, so 14:00–16:00 local that day is 19:00–21:00 UTC.
    const span = railSpan(new Date('2026-03-08T19:00:00Z'), new Date('2026-03-08T21:00:00Z'), '2026-03-08', 'America/Chicago');
    expect(span?.left).toBeCloseTo((8 / 18) * 100, 6);
    expect(span?.width).toBeCloseTo((2 / 18) * 100, 6);
    // The same UTC hours a day earlier, on CST, were 13:00–15:00 local.
    expect(railSpan(new Date('2026-03-07T19:00:00Z'), new Date('2026-03-07T21:00:00Z'), '2026-03-07', 'America/Chicago')?.left).toBeCloseTo((7 / 18) * 100, 6);
  });

  it('reads the shop’s wall clock on the day the clocks go back', () => {
    // IANA tz database via Intl: Europe/Berlin goes from CEST (UTC+2) to CET (UTC+1) at 03:00 on
    // Sunday 25 October 2026, so 09:00 local that day is 08:00 UTC.
    expect(wallMinutes(new Date('2026-10-25T08:00:00Z'), '2026-10-25', 'Europe/Berlin')).toBe(9 * 60);
    expect(railSpan(new Date('2026-10-25T08:00:00Z'), new Date('2026-10-25T10:00:00Z'), '2026-10-25', 'Europe/Berlin')?.left).toBeCloseTo((3 / 18) * 100, 6);
  });
});

describe('wallMinutes', () => {
  it('counts from the shop’s midnight, not UTC’s', () => {
    // IANA tz database via Intl: 03:30 UTC on 3 December 2026 is 21:30 CST on 2 December in Chicago.
    expect(wallMinutes(new Date('2026-12-03T03:30:00Z'), '2026-12-02', 'America/Chicago')).toBe(21 * 60 + 30);
    expect(wallMinutes(new Date('2026-12-03T12:00:00Z'), '2026-12-02', 'America/Chicago')).toBe(24 * 60 + 6 * 60);
  });
});

describe('spanWords', () => {
  it('names the kind and the wall-clock times in words a screen reader speaks', () => {
    // IANA tz database via Intl: America/Chicago is on CST (UTC−6) in December.
    expect(spanWords('member', new Date('2026-12-02T20:00:00Z'), new Date('2026-12-02T22:00:00Z'), 'America/Chicago')).toBe('Reserved 14:00–16:00');
    expect(spanWords('class', new Date('2026-12-02T15:00:00Z'), new Date('2026-12-02T17:30:00Z'), 'America/Chicago')).toBe('Class 09:00–11:30');
    expect(spanWords('session', new Date('2026-12-02T19:05:00Z'), new Date('2026-12-02T19:40:00Z'), 'America/Chicago')).toBe('In use since 13:05');
  });
});
