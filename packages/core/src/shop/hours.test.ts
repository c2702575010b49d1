import { describe, expect, it } from 'vitest';
import {
  closureInputSchema,
  clockTimeSchema,
  describeWeeklyHours,
  hoursOnDate,
  openingIntervalSchema,
  shopDate,
  shopHoursAt,
  weeklyHoursInputSchema,
  type WeeklyHours,
} from './hours';

const CHICAGO = 'America/Chicago';
const at = (iso: string) => new Date(iso);

// Weekdays below are ISO 8601 numbers: Monday 1 … Sunday 7.
const demoWeek: WeeklyHours[] = [
  { weekday: 2, opensAt: '16:00', closesAt: '22:00' },
  { weekday: 3, opensAt: '16:00', closesAt: '22:00' },
  { weekday: 4, opensAt: '16:00', closesAt: '22:00' },
  { weekday: 5, opensAt: '16:00', closesAt: '22:00' },
  { weekday: 6, opensAt: '09:00', closesAt: '18:00' },
  { weekday: 7, opensAt: '12:00', closesAt: '18:00' },
];

describe('shopHoursAt()', () => {
  it('with no hours and no closures set, the shop is open at all times and names no closing', () => {
    expect(shopHoursAt([], [], CHICAGO, at('2026-03-09T08:00:00Z'))).toEqual({ open: true, opensAt: null, closesAt: null, closure: null });
  });

  it('inside an opening, the shop is open until that opening ends', () => {
    // IANA tz database: Chicago keeps CDT (UTC−5) from 8 March 2026, so 22:00Z on Tuesday 10 March is 17:00 local.
    expect(shopHoursAt(demoWeek, [], CHICAGO, at('2026-03-10T22:00:00Z'))).toEqual({
      open: true,
      opensAt: null,
      // 22:00 CDT on Tuesday = 03:00Z on Wednesday.
      closesAt: at('2026-03-11T03:00:00Z'),
      closure: null,
    });
  });

  it('on a day without hours, the shop is closed and names the next opening but no closing today', () => {
    // Monday 9 March 2026, 12:00 CDT. ISO 8601: 2026-03-09 is a Monday (weekday 1).
    expect(shopHoursAt(demoWeek, [], CHICAGO, at('2026-03-09T17:00:00Z'))).toEqual({
      open: false,
      // Tuesday 16:00 CDT.
      opensAt: at('2026-03-10T21:00:00Z'),
      closesAt: null,
      closure: null,
    });
  });

  it('after closing time, the shop is closed, says when it closed today and when it opens next', () => {
    // Tuesday 10 March 2026, 23:00 CDT.
    expect(shopHoursAt(demoWeek, [], CHICAGO, at('2026-03-11T04:00:00Z'))).toEqual({
      open: false,
      opensAt: at('2026-03-11T21:00:00Z'),
      closesAt: at('2026-03-11T03:00:00Z'),
      closure: null,
    });
  });

  it('opens on the minute and closes on the minute', () => {
    // Tuesday 10 March 2026: 16:00 CDT = 21:00Z, 22:00 CDT = 03:00Z the next day.
    expect(shopHoursAt(demoWeek, [], CHICAGO, at('2026-03-10T20:59:59Z')).open).toBe(false);
    expect(shopHoursAt(demoWeek, [], CHICAGO, at('2026-03-10T21:00:00Z')).open).toBe(true);
    expect(shopHoursAt(demoWeek, [], CHICAGO, at('2026-03-11T02:59:59Z')).open).toBe(true);
    expect(shopHoursAt(demoWeek, [], CHICAGO, at('2026-03-11T03:00:00Z')).open).toBe(false);
  });

  describe('on the days the clocks change in Chicago', () => {
    const sundayNineToFive: WeeklyHours[] = [{ weekday: 7, opensAt: '09:00', closesAt: '17:00' }];
    const sundayAllDay: WeeklyHours[] = [{ weekday: 7, opensAt: '00:00', closesAt: '24:00' }];

    it('on 8 March 2026 an opening of 09:00–17:00 is still 09:00–17:00 on the wall clock', () => {
      // IANA tz database / Energy Policy Act of 2005: US daylight saving time starts on the second
      // Sunday of March, 8 March 2026, at 02:00 CST (UTC−6), which becomes 03:00 CDT (UTC−5).
      expect(shopHoursAt(sundayNineToFive, [], CHICAGO, at('2026-03-08T13:00:00Z'))).toMatchObject({
        open: false,
        // 09:00 CDT.
        opensAt: at('2026-03-08T14:00:00Z'),
      });
      expect(shopHoursAt(sundayNineToFive, [], CHICAGO, at('2026-03-08T15:00:00Z'))).toMatchObject({
        open: true,
        // 17:00 CDT.
        closesAt: at('2026-03-08T22:00:00Z'),
      });
    });

    it('on 8 March 2026 a whole day open lasts 23 hours, midnight CST to midnight CDT', () => {
      // Saturday 7 March, noon CST: the next opening is Sunday's midnight, still on CST.
      expect(shopHoursAt(sundayAllDay, [], CHICAGO, at('2026-03-07T18:00:00Z')).opensAt).toEqual(at('2026-03-08T06:00:00Z'));
      const during = shopHoursAt(sundayAllDay, [], CHICAGO, at('2026-03-08T18:00:00Z'));
      expect(during.open).toBe(true);
      expect(during.closesAt).toEqual(at('2026-03-09T05:00:00Z'));
      // Arithmetic: 06:00Z to 05:00Z the next day is 23 hours.
      expect((during.closesAt!.getTime() - at('2026-03-08T06:00:00Z').getTime()) / 3_600_000).toBe(23);
    });

    it('on 1 November 2026 an opening of 09:00–17:00 is still 09:00–17:00 on the wall clock', () => {
      // IANA tz database / Energy Policy Act of 2005: daylight saving time ends on the first Sunday
      // of November, 1 November 2026, at 02:00 CDT, which becomes 01:00 CST (UTC−6).
      expect(shopHoursAt(sundayNineToFive, [], CHICAGO, at('2026-11-01T12:00:00Z'))).toMatchObject({
        open: false,
        // 09:00 CST.
        opensAt: at('2026-11-01T15:00:00Z'),
      });
      expect(shopHoursAt(sundayNineToFive, [], CHICAGO, at('2026-11-01T16:00:00Z'))).toMatchObject({
        open: true,
        // 17:00 CST.
        closesAt: at('2026-11-01T23:00:00Z'),
      });
    });

    it('on 1 November 2026 a whole day open lasts 25 hours, midnight CDT to midnight CST', () => {
      const during = shopHoursAt(sundayAllDay, [], CHICAGO, at('2026-11-01T12:00:00Z'));
      expect(during.open).toBe(true);
      expect(during.closesAt).toEqual(at('2026-11-02T06:00:00Z'));
      // Arithmetic: midnight CDT is 05:00Z; 05:00Z to 06:00Z the next day is 25 hours.
      expect((during.closesAt!.getTime() - at('2026-11-01T05:00:00Z').getTime()) / 3_600_000).toBe(25);
    });
  });

  describe('closures', () => {
    const deepClean = { startsOn: '2026-12-24', endsOn: '2026-12-26', reason: 'Winter deep clean' };

    it('a closure over several days shuts the shop on each of them and the next opening skips them', () => {
      // ISO 8601 calendar: 24 December 2026 is a Thursday and 27 December a Sunday. Chicago is on
      // CST (UTC−6) in December (IANA tz database).
      for (const now of ['2026-12-24T23:00:00Z', '2026-12-25T18:00:00Z', '2026-12-26T16:00:00Z']) {
        expect(shopHoursAt(demoWeek, [deepClean], CHICAGO, at(now)), now).toEqual({
          open: false,
          // Sunday 27 December, 12:00 CST.
          opensAt: at('2026-12-27T18:00:00Z'),
          closesAt: null,
          closure: { reason: 'Winter deep clean' },
        });
      }
    });

    it('the days before and after a closure keep their hours', () => {
      // Wednesday 23 December, 17:00 CST, and Sunday 27 December, 13:00 CST.
      expect(shopHoursAt(demoWeek, [deepClean], CHICAGO, at('2026-12-23T23:00:00Z'))).toMatchObject({ open: true, closure: null });
      expect(shopHoursAt(demoWeek, [deepClean], CHICAGO, at('2026-12-27T19:00:00Z'))).toMatchObject({ open: true, closure: null });
    });

    it('a closure counts in the shop’s calendar, not in UTC', () => {
      // 23 December, 23:30 CST is already 24 December in UTC, but not yet in the shop.
      expect(shopHoursAt(demoWeek, [deepClean], CHICAGO, at('2026-12-24T05:30:00Z')).closure).toBeNull();
    });

    it('with no weekly hours, a closure still shuts the shop for its days, and it opens again at midnight after', () => {
      expect(shopHoursAt([], [deepClean], CHICAGO, at('2026-12-26T18:00:00Z'))).toEqual({
        open: false,
        // Sunday 27 December, 00:00 CST.
        opensAt: at('2026-12-27T06:00:00Z'),
        closesAt: null,
        closure: { reason: 'Winter deep clean' },
      });
    });

    it('names no next opening when none falls within the next 14 days', () => {
      const longClosure = { startsOn: '2026-12-20', endsOn: '2027-01-10', reason: 'Moving to the new building' };
      expect(shopHoursAt(demoWeek, [longClosure], CHICAGO, at('2026-12-24T18:00:00Z'))).toMatchObject({ open: false, opensAt: null });
    });
  });

  describe('openings that end at midnight', () => {
    it('an opening until 24:00 closes at the midnight that ends the day', () => {
      const saturdayEvening: WeeklyHours[] = [{ weekday: 6, opensAt: '18:00', closesAt: '24:00' }];
      // Saturday 14 March 2026, 23:30 CDT; it closes at Sunday 00:00 CDT = 05:00Z.
      expect(shopHoursAt(saturdayEvening, [], CHICAGO, at('2026-03-15T04:30:00Z'))).toMatchObject({
        open: true,
        closesAt: at('2026-03-15T05:00:00Z'),
      });
      // Sunday 00:30: that closing was yesterday's, so none is named for today.
      expect(shopHoursAt(saturdayEvening, [], CHICAGO, at('2026-03-15T05:30:00Z'))).toMatchObject({ open: false, closesAt: null });
    });

    it('an opening until 24:00 followed by one from 00:00 the next day counts as one', () => {
      const overnight: WeeklyHours[] = [
        { weekday: 6, opensAt: '18:00', closesAt: '24:00' },
        { weekday: 7, opensAt: '00:00', closesAt: '02:00' },
      ];
      // Saturday 23:30 CDT: open until Sunday 02:00 CDT = 07:00Z.
      expect(shopHoursAt(overnight, [], CHICAGO, at('2026-03-15T04:30:00Z'))).toMatchObject({
        open: true,
        closesAt: at('2026-03-15T07:00:00Z'),
      });
    });

    it('open 00:00–24:00 every day is open with no closing in sight', () => {
      const always = ([1, 2, 3, 4, 5, 6, 7] as const).map((weekday) => ({ weekday, opensAt: '00:00', closesAt: '24:00' }));
      expect(shopHoursAt(always, [], CHICAGO, at('2026-03-08T08:30:00Z'))).toEqual({ open: true, opensAt: null, closesAt: null, closure: null });
    });
  });

  it('touching openings of one day count as one', () => {
    const split: WeeklyHours[] = [
      { weekday: 2, opensAt: '14:00', closesAt: '18:00' },
      { weekday: 2, opensAt: '09:00', closesAt: '14:00' },
    ];
    // Tuesday 10 March 2026, 10:00 CDT: open until 18:00 CDT = 23:00Z.
    expect(shopHoursAt(split, [], CHICAGO, at('2026-03-10T15:00:00Z')).closesAt).toEqual(at('2026-03-10T23:00:00Z'));
  });
});

describe('hoursOnDate()', () => {
  it('gives a weekday’s openings in wall-clock time', () => {
    // ISO 8601: 2026-03-14 is a Saturday (weekday 6).
    expect(hoursOnDate(demoWeek, [], CHICAGO, '2026-03-14')).toEqual({
      date: '2026-03-14',
      weekday: 6,
      closure: null,
      intervals: [{ opensAt: '09:00', closesAt: '18:00' }],
    });
    expect(hoursOnDate(demoWeek, [], CHICAGO, '2026-03-09').intervals).toEqual([]);
  });

  it('takes an instant’s date in the shop’s calendar', () => {
    // 03:00Z on Tuesday 10 March is 22:00 CDT on Monday 9 March in Chicago (IANA tz database).
    expect(hoursOnDate(demoWeek, [], CHICAGO, at('2026-03-10T03:00:00Z'))).toMatchObject({ date: '2026-03-09', weekday: 1, intervals: [] });
  });

  it('a closure empties the day and names its reason', () => {
    const closure = { startsOn: '2026-12-24', endsOn: '2026-12-26', reason: 'Winter deep clean' };
    expect(hoursOnDate(demoWeek, [closure], CHICAGO, '2026-12-26')).toEqual({
      date: '2026-12-26',
      weekday: 6,
      closure: { reason: 'Winter deep clean' },
      intervals: [],
    });
  });

  it('with no hours set, every day is open around the clock', () => {
    expect(hoursOnDate([], [], CHICAGO, '2026-03-09').intervals).toEqual([{ opensAt: '00:00', closesAt: '24:00' }]);
  });

  it('lists several openings earliest first and joins touching ones', () => {
    const day: WeeklyHours[] = [
      { weekday: 3, opensAt: '18:00', closesAt: '21:00' },
      { weekday: 3, opensAt: '12:00', closesAt: '14:00' },
      { weekday: 3, opensAt: '09:00', closesAt: '12:00' },
    ];
    // ISO 8601: 2026-03-11 is a Wednesday (weekday 3).
    expect(hoursOnDate(day, [], CHICAGO, '2026-03-11').intervals).toEqual([
      { opensAt: '09:00', closesAt: '14:00' },
      { opensAt: '18:00', closesAt: '21:00' },
    ]);
  });
});

describe('shopDate()', () => {
  it('is the calendar date in the shop’s time zone', () => {
    // IANA tz database: Chicago is on CDT (UTC−5) until 07:00Z on 1 November 2026, so 05:30Z is
    // 00:30 on 1 November there and 04:30Z is 23:30 on 31 October.
    expect(shopDate(at('2026-11-01T05:30:00Z'), CHICAGO)).toBe('2026-11-01');
    expect(shopDate(at('2026-11-01T04:30:00Z'), CHICAGO)).toBe('2026-10-31');
    expect(shopDate(at('2026-11-01T04:30:00Z'), 'UTC')).toBe('2026-11-01');
  });
});

describe('describeWeeklyHours()', () => {
  it('says every weekday from Monday, closed ones too', () => {
    expect(describeWeeklyHours(demoWeek)).toBe(
      'Monday closed; Tuesday 16:00–22:00; Wednesday 16:00–22:00; Thursday 16:00–22:00; Friday 16:00–22:00; Saturday 09:00–18:00; Sunday 12:00–18:00',
    );
    expect(describeWeeklyHours([])).toBe('No hours set (open at all times)');
  });
});

describe('the hours schemas', () => {
  const errorsOf = (result: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
    Object.fromEntries((result.error?.issues ?? []).map((issue) => [issue.path.join('.'), issue.message]));

  it('take wall-clock times from 00:00 to 24:00 and write them with two-digit hours', () => {
    expect(clockTimeSchema.parse('00:00')).toBe('00:00');
    expect(clockTimeSchema.parse('24:00')).toBe('24:00');
    expect(clockTimeSchema.parse(' 9:30 ')).toBe('09:30');
    for (const bad of ['24:01', '25:00', '12:60', '9', '09.30', 'noon']) {
      expect(clockTimeSchema.safeParse(bad).success, bad).toBe(false);
    }
    expect(clockTimeSchema.safeParse('').error?.issues.map((i) => i.message)).toEqual(['Enter a time.']);
  });

  it('refuse an opening that closes before or when it opens, naming the closing time', () => {
    expect(errorsOf(openingIntervalSchema.safeParse({ weekday: 2, opensAt: '18:00', closesAt: '09:00' }))).toEqual({
      closesAt: 'The closing time must be after the opening time.',
    });
    expect(openingIntervalSchema.safeParse({ weekday: 2, opensAt: '09:00', closesAt: '09:00' }).success).toBe(false);
  });

  it('number weekdays as ISO 8601 does, Monday 1 to Sunday 7', () => {
    expect(openingIntervalSchema.safeParse({ weekday: 7, opensAt: '09:00', closesAt: '10:00' }).success).toBe(true);
    expect(errorsOf(openingIntervalSchema.safeParse({ weekday: 0, opensAt: '09:00', closesAt: '10:00' }))).toEqual({
      weekday: 'Choose a day from Monday (1) to Sunday (7).',
    });
    expect(openingIntervalSchema.safeParse({ weekday: 8, opensAt: '09:00', closesAt: '10:00' }).success).toBe(false);
  });

  it('refuse overlapping openings on one weekday, naming the later one; touching ones and other days are fine', () => {
    const result = weeklyHoursInputSchema.safeParse({
      weekly: [
        { weekday: 2, opensAt: '09:00', closesAt: '13:00' },
        { weekday: 2, opensAt: '16:00', closesAt: '22:00' },
        { weekday: 2, opensAt: '12:00', closesAt: '14:00' },
        { weekday: 3, opensAt: '12:00', closesAt: '14:00' },
      ],
    });
    expect(errorsOf(result)).toEqual({ 'weekly.2.opensAt': 'Overlaps 09:00–13:00 on Tuesday.' });

    expect(
      weeklyHoursInputSchema.safeParse({
        weekly: [
          { weekday: 2, opensAt: '09:00', closesAt: '12:00' },
          { weekday: 2, opensAt: '12:00', closesAt: '24:00' },
          { weekday: 3, opensAt: '00:00', closesAt: '24:00' },
        ],
      }).success,
    ).toBe(true);
    expect(weeklyHoursInputSchema.parse({ weekly: [] })).toEqual({ weekly: [] });
  });

  it('take closures as ISO 8601 calendar dates, the last day not before the first, with a reason', () => {
    expect(closureInputSchema.parse({ startsOn: '2026-12-24', endsOn: '2026-12-24', reason: ' Winter deep clean ' })).toEqual({
      startsOn: '2026-12-24',
      endsOn: '2026-12-24',
      reason: 'Winter deep clean',
    });
    expect(errorsOf(closureInputSchema.safeParse({ startsOn: '2026-12-26', endsOn: '2026-12-24', reason: 'Winter deep clean' }))).toEqual({
      endsOn: 'The last day cannot be before the first day.',
    });
    // ISO 8601 / Gregorian calendar: 2026 is not a leap year, so there is no 29 February.
    expect(closureInputSchema.safeParse({ startsOn: '2026-02-29', endsOn: '2026-03-01', reason: 'Inventory' }).success).toBe(false);
    expect(errorsOf(closureInputSchema.safeParse({ startsOn: '2026-12-24', endsOn: '2026-12-24', reason: '  ' }))).toEqual({
      reason: 'Say why the shop is closed, for example “Winter deep clean”.',
    });
  });
});
