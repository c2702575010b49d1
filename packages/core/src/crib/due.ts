import { shopHoursAt, type ClosureDays, type WeeklyHours } from '../shop/hours';

/**
 * When the shop is closed, or keeps no closing today, a tool without its own loan period is due a
 * day after it goes out: the crib is only staffed while the shop is open, so a day reaches the
 * next opening in most weekly schedules, and a member is never handed a due time already past.
 */
export const FALLBACK_LOAN_HOURS = 24;

const HOUR_MS = 3_600_000;

export interface CribDueHours {
  weekly: readonly WeeklyHours[];
  closures: readonly ClosureDays[];
  timeZone: string;
}

/** When a tool lent `now` is due back: its own loan period from now, else the shop's closing time today. */
export function cribDueAt(loanPeriodHours: number | null, hours: CribDueHours, now: Date): Date {
  if (loanPeriodHours !== null) return new Date(now.getTime() + loanPeriodHours * HOUR_MS);
  const today = shopHoursAt(hours.weekly, hours.closures, hours.timeZone, now);
  if (today.open && today.closesAt) return today.closesAt;
  return new Date(now.getTime() + FALLBACK_LOAN_HOURS * HOUR_MS);
}
