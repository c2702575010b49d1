import { describe, expect, it } from 'vitest';
import { matchingPreset, presetRange, rangeProblem, readRange, shopToday } from './date-range';

describe('shopToday', () => {
  it("takes today from the shop's wall clock after daylight saving starts, not from UTC", () => {
    // 05:30 UTC on 9 March 2026 is 00:30 CDT (UTC−5) in Chicago, daylight saving having begun on
    // 8 March at 02:00 (IANA tz database via Intl); on standard time's offset it would still be the 8th.
    expect(shopToday(new Date('2026-03-09T05:30:00Z'), 'America/Chicago')).toBe('2026-03-09');
    // 04:30 UTC is 23:30 CDT on the 8th: the shop's day has not turned yet.
    expect(shopToday(new Date('2026-03-09T04:30:00Z'), 'America/Chicago')).toBe('2026-03-08');
  });

  it('keeps the day right across the night daylight saving ends', () => {
    // 1 November 2026 is the day Chicago falls back to CST (UTC−6) (IANA tz database via Intl):
    // 05:30 UTC is 00:30 CDT on the 1st; 05:30 UTC the next day is 23:30 CST on the 1st.
    expect(shopToday(new Date('2026-11-01T05:30:00Z'), 'America/Chicago')).toBe('2026-11-01');
    expect(shopToday(new Date('2026-11-02T05:30:00Z'), 'America/Chicago')).toBe('2026-11-01');
  });
});

describe('presetRange', () => {
  it('counts today as the last of the 30 days, across the day clocks change', () => {
    // Calendar arithmetic on dates, not 24-hour steps: 8 March 2026 (23 hours long in Chicago) is still one day.
    expect(presetRange('last30Days', '2026-03-20')).toEqual({ from: '2026-02-19', to: '2026-03-20' });
  });

  it('starts three months back the day after the same date, clamped to a shorter month', () => {
    expect(presetRange('last3Months', '2026-12-02')).toEqual({ from: '2026-09-03', to: '2026-12-02' });
    // No 31 February: the same date three months before 31 May 2026 is 28 February (2026 is no leap year).
    expect(presetRange('last3Months', '2026-05-31')).toEqual({ from: '2026-03-01', to: '2026-05-31' });
    // Back across a new year.
    expect(presetRange('last3Months', '2027-01-15')).toEqual({ from: '2026-10-16', to: '2027-01-15' });
  });

  it('runs this year from 1 January to today', () => {
    expect(presetRange('thisYear', '2026-12-02')).toEqual({ from: '2026-01-01', to: '2026-12-02' });
    expect(presetRange('thisYear', '2026-01-01')).toEqual({ from: '2026-01-01', to: '2026-01-01' });
  });
});

describe('matchingPreset', () => {
  it('names the preset a range is on this day, and none for a range typed in', () => {
    expect(matchingPreset({ from: '2026-11-03', to: '2026-12-02' }, '2026-12-02')).toBe('last30Days');
    expect(matchingPreset({ from: '2026-11-04', to: '2026-12-02' }, '2026-12-02')).toBeUndefined();
  });
});

describe('rangeProblem', () => {
  it('accepts a range of real dates in order', () => {
    expect(rangeProblem({ from: '2026-03-01', to: '2026-03-01' })).toBeUndefined();
  });

  it('refuses dates that are not ISO 8601 calendar dates, or do not exist', () => {
    expect(rangeProblem({ from: '03/01/2026', to: '2026-03-31' })?.field).toBe('from');
    // No 30 February in any year (Gregorian calendar).
    expect(rangeProblem({ from: '2026-02-01', to: '2026-02-30' })?.field).toBe('to');
  });

  it('refuses a last day before the first, and more than the 400 days one report covers', () => {
    expect(rangeProblem({ from: '2026-03-02', to: '2026-03-01' })?.message).toBe('The last day must not come before the first day.');
    // 1 January 2026 to 4 February 2027 is 400 days counted inclusively; one more is too many.
    expect(rangeProblem({ from: '2026-01-01', to: '2027-02-04' })).toBeUndefined();
    expect(rangeProblem({ from: '2026-01-01', to: '2027-02-05' })?.message).toBe('A report covers at most 400 days.');
  });
});

describe('readRange', () => {
  it('reads the range from the address, or falls back to the last 30 days', () => {
    expect(readRange(new URLSearchParams('from=2026-06-01&to=2026-06-30'), '2026-12-02')).toEqual({ from: '2026-06-01', to: '2026-06-30' });
    expect(readRange(new URLSearchParams('from=2026-06-30&to=2026-06-01'), '2026-12-02')).toEqual({ from: '2026-11-03', to: '2026-12-02' });
    expect(readRange(new URLSearchParams(), '2026-12-02')).toEqual({ from: '2026-11-03', to: '2026-12-02' });
  });
});
