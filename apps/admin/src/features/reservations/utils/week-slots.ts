import { addCalendarDays, hoursOnDate, parseCalendarDate, shopDate, wallTimeToInstant, weekdayNames, type ClosureDays, type MyReservation, type TakenRange, type Weekday, type WeeklyHours } from '@chuckkey/core';
import { clockLabel } from '../../../lib/shop-clock';

export { calendarDateLabel, clockLabel, durationLabel, spanLabel, startLabel } from '../../../lib/shop-clock';

const MINUTE = 60_000;

/** Without opening hours set, a day is shown on the design's day rail, 6:00 to midnight. */
const RAIL_OPENS = 6 * 60;
const RAIL_CLOSES = 24 * 60;

export type SlotState = 'free' | 'taken' | 'class' | 'past';

export interface Slot {
  start: Date;
  end: Date;
  /** The wall-clock time in the shop, "9:00". */
  time: string;
  state: SlotState;
  /** The class that holds the slot, when the machine is held for one and its title is known. */
  classTitle: string | null;
  /** What a screen reader says for the slot's button: "Saturday 9:00, free". */
  label: string;
}

/** A taken range as the week view reads it: a class hold may carry the class's title. */
export type TakenSpan = TakenRange & { title?: string | null | undefined };

export interface WeekDay {
  date: string;
  weekday: Weekday;
  name: string;
  closure: string | null;
  slots: Slot[];
}

function isoWeekday(date: string): Weekday {
  const { year, month, day } = parseCalendarDate(date);
  return (((new Date(Date.UTC(year, month - 1, day)).getUTCDay() + 6) % 7) + 1) as Weekday;
}

/** The Monday of the shop's week that holds `instant`, 'YYYY-MM-DD'. */
export function mondayOf(instant: Date, timeZone: string): string {
  const date = shopDate(instant, timeZone);
  return addCalendarDays(date, 1 - isoWeekday(date));
}

const stateWords: Record<SlotState, string> = { free: 'free', taken: 'taken', class: 'held for a class', past: 'past' };

export interface WeekInput {
  monday: string;
  timeZone: string;
  slotMinutes: number;
  weekly: readonly WeeklyHours[];
  closures: readonly ClosureDays[];
  taken: readonly TakenSpan[];
  now: Date;
}

/**
 * The week's days Monday to Sunday, each with its slots on the shop's wall clock inside the
 * opening hours. A slot is taken while any claim or the cleanup buffer after it overlaps it.
 */
export function weekSlots({ monday, timeZone, slotMinutes, weekly, closures, taken, now }: WeekInput): WeekDay[] {
  const claims = taken.map((range) => ({ start: Date.parse(range.start), until: Date.parse(range.blockedUntil), kind: range.kind, title: range.title ?? null }));
  return Array.from({ length: 7 }, (_, index) => {
    const date = addCalendarDays(monday, index);
    const hours = hoursOnDate(weekly, closures, timeZone, date);
    const name = weekdayNames[hours.weekday];
    const spans: [number, number][] =
      weekly.length === 0 && !hours.closure
        ? [[RAIL_OPENS, RAIL_CLOSES]]
        : hours.intervals.map((i) => [clockMinutesOf(i.opensAt), clockMinutesOf(i.closesAt)]);
    const slots: Slot[] = [];
    for (const [opens, closes] of spans) {
      const first = Math.ceil(opens / slotMinutes) * slotMinutes;
      for (let minutes = first; minutes + slotMinutes <= closes; minutes += slotMinutes) {
        const start = wallTimeToInstant(date, minutes, timeZone);
        if (!start) continue;
        // A slot lasts its step in real time: 1:00 on the night the clocks go forward ends at 3:00.
        const end = new Date(start.getTime() + slotMinutes * MINUTE);
        const claim = claims.find((c) => c.start < end.getTime() && start.getTime() < c.until);
        const state: SlotState = start.getTime() < now.getTime() ? 'past' : claim ? (claim.kind === 'class' ? 'class' : 'taken') : 'free';
        const time = clockLabel(minutes);
        const classTitle = state === 'class' ? (claim?.title ?? null) : null;
        const said = classTitle ? `held for the class ${classTitle}` : stateWords[state];
        slots.push({ start, end, time, state, classTitle, label: `${name} ${time}, ${said}` });
      }
    }
    return { date, weekday: hours.weekday, name, closure: hours.closure?.reason ?? null, slots };
  });
}

function clockMinutesOf(time: string): number {
  const [hours = 0, minutes = 0] = time.split(':').map(Number);
  return hours * 60 + minutes;
}

/**
 * Minutes of the weekly quota still free in the Monday-to-Sunday week starting `monday`: the
 * member's live claims on the machine that fall in that week count against it; a class they are
 * booked into is the instructor's hold, not theirs, and counts for nothing.
 */
export function quotaLeft(mine: readonly MyReservation[], machineId: string, monday: string, timeZone: string, quotaMinutes: number): number {
  const weekStart = wallTimeToInstant(monday, 0, timeZone)?.getTime() ?? Number.NaN;
  const weekEnd = wallTimeToInstant(addCalendarDays(monday, 7), 0, timeZone)?.getTime() ?? Number.NaN;
  const booked = mine
    .filter((r) => r.machineId === machineId && r.kind === 'member' && (r.status === 'active' || r.status === 'checked_in'))
    .reduce((sum, r) => sum + Math.max(0, Math.min(Date.parse(r.end), weekEnd) - Math.max(Date.parse(r.start), weekStart)) / MINUTE, 0);
  return Math.max(0, quotaMinutes - booked);
}

