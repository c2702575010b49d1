import { describe, expect, it } from 'vitest';
import { closureDays, intervalsText, shopMoment, todayText } from './hours-text';

const CHICAGO = 'America/Chicago';

describe('closureDays', () => {
  it('writes one day, or the first and last day of several, as the calendar dates they are', () => {
    // ISO 8601 calendar: 24 December 2026 is a Thursday, 26 December a Saturday.
    expect(closureDays({ startsOn: '2026-12-24', endsOn: '2026-12-24' }, 'en-GB')).toBe('Thu, 24 Dec 2026');
    // ICU puts thin spaces around the dash of a range; any space will do here.
    expect(closureDays({ startsOn: '2026-12-24', endsOn: '2026-12-26' }, 'en-GB').replace(/\s/g, ' ')).toBe('Thu, 24 Dec – Sat, 26 Dec 2026');
  });
});

describe('intervalsText', () => {
  it('lists the openings as the shop set them, midnight as 24:00', () => {
    expect(intervalsText([{ opensAt: '09:00', closesAt: '12:00' }, { opensAt: '18:00', closesAt: '24:00' }], 'Closed')).toBe('09:00–12:00, 18:00–24:00');
    expect(intervalsText([], 'Closed all day')).toBe('Closed all day');
  });
});

describe('shopMoment', () => {
  // IANA tz database: Chicago is on CDT (UTC−5) from 8 March 2026.
  it('says “today” for a time on the shop’s own date, in the shop’s time zone', () => {
    expect(shopMoment('2026-03-10T21:00:00Z', CHICAGO, '2026-03-10', 'en-GB')).toBe('16:00 today');
  });

  it('names the weekday within the week and adds the date further ahead', () => {
    // 14:00Z on Saturday 14 March is 09:00 CDT; ISO 8601 calendar: 14 March 2026 is a Saturday.
    expect(shopMoment('2026-03-14T14:00:00Z', CHICAGO, '2026-03-10', 'en-GB')).toBe('Saturday 09:00');
    expect(shopMoment('2026-03-21T14:00:00Z', CHICAGO, '2026-03-10', 'en-GB')).toBe('Saturday 21 March, 09:00');
  });

  it('takes the day from the shop’s calendar, not UTC’s', () => {
    // 03:00Z on 11 March is 22:00 CDT on 10 March.
    expect(shopMoment('2026-03-11T03:00:00Z', CHICAGO, '2026-03-10', 'en-GB')).toBe('22:00 today');
  });
});

describe('todayText', () => {
  const base = { timeZone: CHICAGO, weekly: [{ weekday: 2 as const, opensAt: '16:00', closesAt: '22:00' }] };

  it('with no hours set, says the shop is open at all times', () => {
    const today = { date: '2026-03-10', open: true, opensAt: null, closesAt: null, intervals: [{ opensAt: '00:00', closesAt: '24:00' }], closure: null };
    expect(todayText({ ...base, weekly: [], today }, 'en-GB')).toEqual({
      state: 'Open at all times',
      change: 'No opening hours are set.',
      hours: '00:00–24:00',
    });
  });

  it('when open, says until when', () => {
    const today = { date: '2026-03-10', open: true, opensAt: null, closesAt: '2026-03-11T03:00:00Z', intervals: [{ opensAt: '16:00', closesAt: '22:00' }], closure: null };
    expect(todayText({ ...base, today }, 'en-GB')).toEqual({ state: 'Open now', change: 'Until 22:00 today.', hours: '16:00–22:00' });
  });

  it('when a closure covers today, names it and the next opening', () => {
    const today = { date: '2026-03-10', open: false, opensAt: '2026-03-11T21:00:00Z', closesAt: null, intervals: [], closure: { reason: 'Winter deep clean' } };
    expect(todayText({ ...base, today }, 'en-GB')).toEqual({
      state: 'Closed today: Winter deep clean',
      change: 'Opens Wednesday 16:00.',
      hours: 'Closed all day',
    });
  });

  it('when closed with no opening in sight, says so', () => {
    const today = { date: '2026-03-10', open: false, opensAt: null, closesAt: null, intervals: [], closure: null };
    expect(todayText({ ...base, today }, 'en-GB').change).toBe('No opening in the next two weeks.');
  });
});
