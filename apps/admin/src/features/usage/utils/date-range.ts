import { addCalendarDays, calendarDateIso, daysInRange, parseCalendarDate, USAGE_REPORT_MAX_DAYS, wallClockAt } from '@chuckkey/core';

/** The shop-calendar days a report covers, both included, as 'YYYY-MM-DD'. */
export interface DateRange {
  from: string;
  to: string;
}

export const rangePresets = ['last30Days', 'last3Months', 'thisYear'] as const;
export type RangePreset = (typeof rangePresets)[number];

export const rangePresetLabels: Record<RangePreset, string> = {
  last30Days: 'Last 30 days',
  last3Months: 'Last 3 months',
  thisYear: 'This year',
};

/** Today's date on the shop's wall clock, which is not the browser's when the two zones differ. */
export function shopToday(now: Date, timeZone: string): string {
  return wallClockAt(now, timeZone).date;
}

function lastDayOfMonth(year: number, month: number): number {
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

/** The same day of the month `months` earlier, or that month's last day when it is shorter. */
function monthsEarlier(date: string, months: number): string {
  const { year, month, day } = parseCalendarDate(date);
  const index = year * 12 + (month - 1) - months;
  const earlierYear = Math.floor(index / 12);
  const earlierMonth = (index % 12) + 1;
  return calendarDateIso({ year: earlierYear, month: earlierMonth, day: Math.min(day, lastDayOfMonth(earlierYear, earlierMonth)) });
}

/**
 * Each preset ends today and counts today as one of its days: "last 30 days" is thirty dates,
 * "last 3 months" starts the day after the same date three months back.
 */
export function presetRange(preset: RangePreset, today: string): DateRange {
  switch (preset) {
    case 'last30Days':
      return { from: addCalendarDays(today, -29), to: today };
    case 'last3Months':
      return { from: addCalendarDays(monthsEarlier(today, 3), 1), to: today };
    case 'thisYear':
      return { from: `${today.slice(0, 4)}-01-01`, to: today };
  }
}

/** The preset a range is, on this day, so the picker can mark it chosen. */
export function matchingPreset(range: DateRange, today: string): RangePreset | undefined {
  return rangePresets.find((preset) => {
    const candidate = presetRange(preset, today);
    return candidate.from === range.from && candidate.to === range.to;
  });
}

const isoDate = /^\d{4}-\d{2}-\d{2}$/;

function isCalendarDate(value: string): boolean {
  if (!isoDate.test(value)) return false;
  const parsed = parseCalendarDate(value);
  return parsed.month >= 1 && parsed.month <= 12 && parsed.day >= 1 && parsed.day <= lastDayOfMonth(parsed.year, parsed.month);
}

export type RangeProblem = { field: 'from' | 'to'; message: string };

/** What is wrong with a range typed in, in the same words the server uses, or undefined when it is fine. */
export function rangeProblem(range: DateRange): RangeProblem | undefined {
  if (!isCalendarDate(range.from)) return { field: 'from', message: 'Give the first day as a date, e.g. 2026-03-14.' };
  if (!isCalendarDate(range.to)) return { field: 'to', message: 'Give the last day as a date, e.g. 2026-03-14.' };
  const days = daysInRange(range.from, range.to);
  if (days < 1) return { field: 'to', message: 'The last day must not come before the first day.' };
  if (days > USAGE_REPORT_MAX_DAYS) return { field: 'to', message: `A report covers at most ${USAGE_REPORT_MAX_DAYS} days.` };
  return undefined;
}

/** The range in the page's address, or the last 30 days when the address has none that makes sense. */
export function readRange(search: URLSearchParams, today: string): DateRange {
  const range = { from: search.get('from') ?? '', to: search.get('to') ?? '' };
  return rangeProblem(range) ? presetRange('last30Days', today) : range;
}
