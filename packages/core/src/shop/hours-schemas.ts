import { z } from 'zod';

/** ISO 8601 weekday numbers: Monday is 1, Sunday is 7. */
export const weekdays = [1, 2, 3, 4, 5, 6, 7] as const;
export type Weekday = (typeof weekdays)[number];
export const weekdaySchema = z.literal(weekdays, { error: 'Choose a day from Monday (1) to Sunday (7).' });

export const weekdayNames: Record<Weekday, string> = {
  1: 'Monday',
  2: 'Tuesday',
  3: 'Wednesday',
  4: 'Thursday',
  5: 'Friday',
  6: 'Saturday',
  7: 'Sunday',
};

export const MINUTES_PER_DAY = 1_440;

/**
 * Minutes after midnight of a wall-clock time 'HH:MM' from 00:00 to 24:00, or null for anything
 * else. 24:00 is the midnight that ends the day, so a shop open until midnight closes at 24:00.
 */
export function clockMinutes(time: string): number | null {
  const match = /^(\d{2}):(\d{2})$/.exec(time);
  if (!match) return null;
  const hours = Number(match[1]);
  const minutes = Number(match[2]);
  if (minutes > 59 || hours > 24 || (hours === 24 && minutes > 0)) return null;
  return hours * 60 + minutes;
}

/** 'HH:MM' for minutes after midnight, 1440 being '24:00'. */
export function clockTime(minutes: number): string {
  return `${String(Math.floor(minutes / 60)).padStart(2, '0')}:${String(minutes % 60).padStart(2, '0')}`;
}

/** A time on the shop's wall clock. '9:00' is taken as '09:00', so a form need not insist on the zero. */
export const clockTimeSchema = z
  .string({ error: 'Enter a time.' })
  .trim()
  .min(1, { error: 'Enter a time.', abort: true })
  .regex(/^\d{1,2}:\d{2}$/, { error: 'Use the 24-hour clock, like 09:00 or 16:30.', abort: true })
  .transform((time) => time.padStart(5, '0'))
  .refine((time) => clockMinutes(time) !== null, { error: 'Use a time from 00:00 to 24:00 (midnight at the end of the day).' });

/** One stretch of a weekday when the shop is open, in the shop's time zone. */
export const openingIntervalSchema = z
  .object({
    weekday: weekdaySchema,
    opensAt: clockTimeSchema,
    closesAt: clockTimeSchema,
  })
  .refine(
    (interval) => {
      const opens = clockMinutes(interval.opensAt);
      const closes = clockMinutes(interval.closesAt);
      // A time that is no time already has its own message.
      return opens === null || closes === null || closes > opens;
    },
    { error: 'The closing time must be after the opening time.', path: ['closesAt'] },
  );
export type OpeningInterval = z.output<typeof openingIntervalSchema>;

/** The most opening stretches one weekday may have: a shop that opens more often than this is open all day. */
export const MAX_INTERVALS_PER_DAY = 6;

/**
 * The whole weekly schedule, replacing the one before. A weekday without intervals is closed; no
 * intervals at all means no hours are set and the shop counts as open at all times. Intervals of
 * one weekday may touch (12:00–14:00 and 14:00–18:00) but not overlap.
 */
export const weeklyHoursInputSchema = z
  .object({
    weekly: z.array(openingIntervalSchema).max(weekdays.length * MAX_INTERVALS_PER_DAY, {
      error: `Use at most ${MAX_INTERVALS_PER_DAY} opening times a day.`,
    }),
  })
  .superRefine(({ weekly }, ctx) => {
    for (const weekday of weekdays) {
      const ofDay = weekly
        .map((interval, index) => ({ index, opens: clockMinutes(interval.opensAt), closes: clockMinutes(interval.closesAt), interval }))
        .filter((entry) => entry.interval.weekday === weekday && entry.opens !== null && entry.closes !== null)
        .sort((a, b) => (a.opens ?? 0) - (b.opens ?? 0) || a.index - b.index);
      if (ofDay.length > MAX_INTERVALS_PER_DAY) {
        ctx.addIssue({
          code: 'custom',
          path: ['weekly', ofDay[MAX_INTERVALS_PER_DAY]!.index, 'opensAt'],
          message: `${weekdayNames[weekday]} has more than ${MAX_INTERVALS_PER_DAY} opening times.`,
        });
      }
      for (let i = 1; i < ofDay.length; i += 1) {
        const before = ofDay[i - 1]!;
        const entry = ofDay[i]!;
        if ((entry.opens ?? 0) < (before.closes ?? 0)) {
          ctx.addIssue({
            code: 'custom',
            path: ['weekly', entry.index, 'opensAt'],
            message: `Overlaps ${before.interval.opensAt}–${before.interval.closesAt} on ${weekdayNames[weekday]}.`,
          });
        }
      }
    }
  });
export type WeeklyHoursInput = z.output<typeof weeklyHoursInputSchema>;

const isoDate = (what: string) => z.iso.date({ error: `Enter the ${what} as a date.` });

/** Whole days the shop stays shut, first and last day included, whatever the weekly hours say. */
export const closureInputSchema = z
  .object({
    startsOn: isoDate('first day'),
    endsOn: isoDate('last day'),
    reason: z
      .string({ error: 'Say why the shop is closed.' })
      .trim()
      .min(1, { error: 'Say why the shop is closed, for example “Winter deep clean”.' })
      .max(200, { error: 'Use at most 200 characters.' }),
  })
  // ISO 8601 calendar dates compare as text in the order of the calendar.
  .refine((closure) => closure.endsOn >= closure.startsOn, { error: 'The last day cannot be before the first day.', path: ['endsOn'] });
export type ClosureInput = z.output<typeof closureInputSchema>;

export const openingTimesSchema = z.object({ opensAt: z.string(), closesAt: z.string() });
export type OpeningTimes = z.infer<typeof openingTimesSchema>;

export const shopClosureSchema = z.object({
  id: z.uuid(),
  startsOn: z.string(),
  endsOn: z.string(),
  reason: z.string(),
});
export type ShopClosure = z.infer<typeof shopClosureSchema>;

/** GET /api/shop/hours. Instants are ISO 8601 in UTC; `weekly` and `intervals` are wall-clock times. */
export const shopHoursSchema = z.object({
  timeZone: z.string(),
  weekly: z.array(z.object({ weekday: weekdaySchema, opensAt: z.string(), closesAt: z.string() })),
  closures: z.array(shopClosureSchema),
  today: z.object({
    /** The shop's calendar date now, 'YYYY-MM-DD'. */
    date: z.string(),
    open: z.boolean(),
    opensAt: z.string().nullable(),
    closesAt: z.string().nullable(),
    intervals: z.array(openingTimesSchema),
    closure: z.object({ reason: z.string() }).nullable(),
  }),
});
export type ShopHours = z.infer<typeof shopHoursSchema>;
