import { TZDate } from '@date-fns/tz';
import { addWeeks, differenceInCalendarDays, startOfWeek } from 'date-fns';
import type { ClearanceSignOff } from '../clearance/clearance';
import { hoursOnDate, shopDate, type ClosureDays, type WeeklyHours } from '../shop/hours';
import { clockMinutes, MINUTES_PER_DAY } from '../shop/hours-schemas';
import { signOffState } from '../trainings/expiry';
import type { ReservationRefusalCode, ReservationRules } from './schemas';

export * from './schemas';

/** The rules a machine gets unless an admin changes them (the design's defaults). */
export const DEFAULT_RESERVATION_RULES: ReservationRules = {
  slotMinutes: 15,
  maxMinutes: 120,
  bufferMinutes: 0,
  horizonDays: 14,
  weeklyQuotaMinutes: 360,
  checkInMinutes: 10,
  noShowGraceMinutes: 15,
  noShowLimit: 3,
  noShowWindowDays: 30,
  suspensionDays: 7,
};

/** Everything the decision needs about one member and one machine, as plain data. */
export interface ReservationFacts {
  /** The shop's IANA time zone: slots, days, weeks and opening hours are on its wall clock. */
  timeZone: string;
  machine: {
    name: string;
    reservable: boolean;
    rules: ReservationRules;
    requiredTrainings: { id: string; name: string }[];
  };
  /** The member's sign-offs for the machine's required trainings, in any state. */
  signOffs: ClearanceSignOff[];
  hours: { weekly: readonly WeeklyHours[]; closures: readonly ClosureDays[] };
  /** The member's live claims (active or checked in) on the machine, in and around the weeks asked about. */
  memberReservations: { start: Date; end: Date }[];
  /** Starts of the member's reservations on the machine that were counted as no-shows. */
  noShows: Date[];
}

export interface ReservationRequest {
  start: Date;
  end: Date;
}

export interface ReservationRefusal {
  code: ReservationRefusalCode;
  message: string;
}

const MINUTE = 60_000;

/**
 * The first rule that refuses the reservation, or null when it may be made. The overlap with
 * other claims is not judged here: the database's exclusion constraint decides it, race-free.
 */
export function reservationRefusal(facts: ReservationFacts, request: ReservationRequest, now: Date): ReservationRefusal | null {
  const { machine, timeZone } = facts;
  const { rules } = machine;
  const say = new Wording(timeZone);
  const minutes = (request.end.getTime() - request.start.getTime()) / MINUTE;

  if (!machine.reservable) return refuse('not_reservable', `The ${machine.name} cannot be reserved; walk up when it is free.`);
  if (request.start.getTime() < now.getTime()) return refuse('in_the_past', 'That start time has already passed. Choose a later one.');
  if (!onStep(request.start, rules.slotMinutes, timeZone) || !Number.isInteger(minutes) || minutes <= 0 || minutes % rules.slotMinutes !== 0) {
    return refuse('bad_step', `Reservations on the ${machine.name} start and end on steps of ${say.duration(rules.slotMinutes)}, counted from midnight.`);
  }
  if (minutes > rules.maxMinutes) {
    return refuse('too_long', `A reservation on the ${machine.name} can be at most ${say.duration(rules.maxMinutes)} long; this one is ${say.duration(minutes)}.`);
  }
  const daysAhead = differenceInCalendarDays(new TZDate(request.start.getTime(), timeZone), new TZDate(now.getTime(), timeZone));
  if (daysAhead > rules.horizonDays) {
    return refuse('beyond_horizon', `The ${machine.name} can be reserved up to ${rules.horizonDays} days ahead; that start is ${daysAhead} days away.`);
  }

  const suspendedUntil = suspensionEnd(facts.noShows, rules);
  if (suspendedUntil && now.getTime() < suspendedUntil.getTime()) {
    return refuse(
      'suspended',
      `You cannot reserve the ${machine.name} until ${say.dateTime(suspendedUntil)}: ${rules.noShowLimit} missed reservations within ${rules.noShowWindowDays} days.`,
    );
  }

  for (const training of machine.requiredTrainings) {
    const held = facts.signOffs.filter((s) => s.trainingId === training.id);
    if (held.some((s) => ['valid', 'expiring'].includes(signOffState(s, request.start)))) continue;
    const lapsing = held
      .filter((s) => s.revokedAt === null && s.expiresAt !== null)
      .map((s) => s.expiresAt!.getTime())
      .sort((a, b) => b - a)[0];
    if (lapsing !== undefined) {
      return refuse('training_required', `Your sign-off for ${training.name} lapses on ${say.date(new Date(lapsing))}, before this reservation starts. Renew it first.`);
    }
    if (held.length > 0) return refuse('training_required', `Your sign-off for ${training.name} was withdrawn by an instructor.`);
    return refuse('training_required', `Reserving the ${machine.name} needs a sign-off for ${training.name}.`);
  }

  const hoursRefusal = outsideHours(facts, request);
  if (hoursRefusal) return refuse('outside_hours', hoursRefusal);

  for (const week of quotaWeeks(request, timeZone)) {
    const asked = overlapMinutes(request, week);
    const booked = facts.memberReservations.reduce((sum, r) => sum + overlapMinutes(r, week), 0);
    if (booked + asked > rules.weeklyQuotaMinutes) {
      const left = Math.max(0, rules.weeklyQuotaMinutes - booked);
      return refuse(
        'quota_exceeded',
        `You may reserve the ${machine.name} for ${say.duration(rules.weeklyQuotaMinutes)} a week (Monday to Sunday); the week of ${say.date(week.start)} has ${say.duration(left)} left.`,
      );
    }
  }
  return null;
}

function refuse(code: ReservationRefusalCode, message: string): ReservationRefusal {
  return { code, message };
}

/** Whether an instant falls on the slot step of the shop's wall clock (9:00, 9:15, … for 15 minutes). */
function onStep(instant: Date, slotMinutes: number, timeZone: string): boolean {
  const local = new TZDate(instant.getTime(), timeZone);
  if (local.getSeconds() !== 0 || local.getMilliseconds() !== 0) return false;
  return (local.getHours() * 60 + local.getMinutes()) % slotMinutes === 0;
}

/**
 * When the member's suspension ends: `noShowLimit` no-shows within `noShowWindowDays` suspend
 * reserving for `suspensionDays` from the last of them. The latest such run counts.
 */
export function suspensionEnd(noShows: readonly Date[], rules: ReservationRules): Date | null {
  const times = noShows.map((d) => d.getTime()).sort((a, b) => a - b);
  const windowMs = rules.noShowWindowDays * 86_400_000;
  let end: number | null = null;
  for (let i = rules.noShowLimit - 1; i < times.length; i += 1) {
    const last = times[i]!;
    const first = times[i - rules.noShowLimit + 1]!;
    if (last - first < windowMs) end = last + rules.suspensionDays * 86_400_000;
  }
  return end === null ? null : new Date(end);
}

/** Minutes after midnight on the shop's wall clock. */
function wallMinutes(instant: Date, timeZone: string): number {
  const local = new TZDate(instant.getTime(), timeZone);
  return local.getHours() * 60 + local.getMinutes() + local.getSeconds() / 60;
}

/**
 * Why the request falls outside the shop's hours, or null. It must lie inside one opening of its
 * start's day, compared on the wall clock so that 9:00–11:00 on a day the clocks change is
 * 9:00–11:00. With no hours set the shop is open at all times, closures apart. Class holds are
 * bounded by the same rule, each meeting on its own day.
 */
export function outsideHours(facts: Pick<ReservationFacts, 'timeZone' | 'hours'>, request: ReservationRequest): string | null {
  const { weekly, closures } = facts.hours;
  const { timeZone } = facts;
  const startDate = shopDate(request.start, timeZone);
  if (weekly.length === 0) {
    const lastMinute = new Date(request.end.getTime() - MINUTE);
    for (const date of new Set([startDate, shopDate(lastMinute, timeZone)])) {
      const closure = hoursOnDate(weekly, closures, timeZone, date).closure;
      if (closure) return `The shop is closed that day: ${closure.reason}`;
    }
    return null;
  }
  const day = hoursOnDate(weekly, closures, timeZone, startDate);
  if (day.closure) return `The shop is closed that day: ${day.closure.reason}`;
  if (day.intervals.length === 0) return 'The shop is closed that day.';
  const opens = wallMinutes(request.start, timeZone);
  const closes = endMinutes(request, timeZone);
  const fits = day.intervals.some((i) => (clockMinutes(i.opensAt) ?? MINUTES_PER_DAY) <= opens && closes <= (clockMinutes(i.closesAt) ?? 0));
  const hours = day.intervals.map((i) => `${i.opensAt}–${i.closesAt}`).join(', ');
  return fits ? null : `A reservation must fall within the shop's opening hours; that day they are ${hours}.`;
}

/** The end on the wall clock of the start's day: 1440 for the midnight that closes it, infinite past it. */
function endMinutes(request: ReservationRequest, timeZone: string): number {
  const minutes = wallMinutes(request.end, timeZone);
  const days = differenceInCalendarDays(new TZDate(request.end.getTime(), timeZone), new TZDate(request.start.getTime(), timeZone));
  if (days === 0) return minutes;
  return days === 1 && minutes === 0 ? MINUTES_PER_DAY : Number.POSITIVE_INFINITY;
}

export interface Week {
  start: Date;
  end: Date;
}

/**
 * The Monday-to-Sunday weeks of the shop's calendar that a request touches, each from Monday 00:00
 * local to the next Monday 00:00 local (167 or 169 hours in a week the clocks change).
 */
export function quotaWeeks(request: ReservationRequest, timeZone: string): Week[] {
  const weeks: Week[] = [];
  let start: Date = startOfWeek(new TZDate(request.start.getTime(), timeZone), { weekStartsOn: 1 });
  while (start.getTime() < request.end.getTime()) {
    const end: Date = addWeeks(start, 1);
    weeks.push({ start: new Date(start.getTime()), end: new Date(end.getTime()) });
    start = end;
  }
  return weeks;
}

function overlapMinutes(range: { start: Date; end: Date }, week: Week): number {
  const from = Math.max(range.start.getTime(), week.start.getTime());
  const to = Math.min(range.end.getTime(), week.end.getTime());
  return Math.max(0, to - from) / MINUTE;
}

class Wording {
  constructor(private readonly timeZone: string) {}

  /** "2 h", "1 h 30 min", "45 min". */
  duration(minutes: number): string {
    const h = Math.floor(minutes / 60);
    const m = minutes % 60;
    if (h === 0) return `${m} min`;
    return m === 0 ? `${h} h` : `${h} h ${m} min`;
  }

  /** "Monday 9 March 2026". */
  date(instant: Date): string {
    return new Intl.DateTimeFormat('en-GB', { timeZone: this.timeZone, weekday: 'long', day: 'numeric', month: 'long', year: 'numeric' })
      .format(instant)
      .replace(',', '');
  }

  /** "Monday 9 March 2026, 9:00". */
  dateTime(instant: Date): string {
    const time = new Intl.DateTimeFormat('en-GB', { timeZone: this.timeZone, hour: 'numeric', minute: '2-digit', hourCycle: 'h23' }).format(instant);
    return `${this.date(instant)}, ${time.replace(/^0/, '')}`;
  }
}
