import { machineCategoryLabels, shopDate } from '@chuckkey/core';
import type { NameplateState } from '@/components/ui/nameplate';
import { formatElapsed } from '@/lib/elapsed';
import { formatShopTime } from './shop-clock';

/** The board is public: a person appears by first name and the initial of the last, nothing more. */
export interface ShortName {
  firstName: string;
  lastInitial: string;
}

export function shortName({ firstName, lastInitial }: ShortName): string {
  return lastInitial ? `${firstName} ${lastInitial}.` : firstName;
}

export function supervisorLine(supervisor: ShortName | null): string {
  return supervisor ? `Supervisor on duty: ${shortName(supervisor)}` : 'No supervisor on duty';
}

export interface TodayHours {
  open: boolean;
  intervals: readonly { opensAt: string; closesAt: string }[];
  closure: { reason: string } | null;
}

/** Today's opening hours as the header strip says them; `open` is whether the shop is open right now. */
export function hoursLine(today: TodayHours): string {
  if (today.closure) return `Closed today: ${today.closure.reason}`;
  const [first] = today.intervals;
  if (!first) return 'Closed today';
  if (today.intervals.length === 1 && first.opensAt === '00:00' && first.closesAt === '24:00') return 'Open all day';
  const times = today.intervals.map((interval) => `${interval.opensAt}–${interval.closesAt}`).join(', ');
  return `${today.open ? 'Open now' : 'Closed now'} · today ${times}`;
}

const weekdayFormats = new Map<string, Intl.DateTimeFormat>();

/** A time on the shop's clock: "14:30" today, "Sat 09:00" on another day. */
export function formatShopMoment(instant: Date, now: Date, timeZone: string): string {
  const time = formatShopTime(instant, timeZone);
  if (shopDate(instant, timeZone) === shopDate(now, timeZone)) return time;
  let weekday = weekdayFormats.get(timeZone);
  if (!weekday) {
    weekday = new Intl.DateTimeFormat('en', { weekday: 'short', timeZone });
    weekdayFormats.set(timeZone, weekday);
  }
  return `${weekday.format(instant)} ${time}`;
}

export interface PlateFacts {
  state: NameplateState;
  category: string;
  member: ShortName | null;
  startedAt: string | null;
  nextReservationAt: string | null;
  tagOut: { reason: string; since: string } | null;
}

export interface PlateText {
  detail: string;
  /** The running session's elapsed time, at the end of the detail line. */
  aside: string | null;
}

function categoryLabel(category: string): string {
  return machineCategoryLabels[category as keyof typeof machineCategoryLabels] ?? category;
}

/**
 * The one line of detail under a nameplate's state, and the elapsed time beside it. `now` is the
 * server's clock as the board reckons it, so a TV whose own clock is off still counts right.
 */
export function plateText(machine: PlateFacts, now: Date, timeZone: string): PlateText {
  const next = machine.nextReservationAt ? formatShopMoment(new Date(machine.nextReservationAt), now, timeZone) : null;
  switch (machine.state) {
    case 'in_use': {
      const who = machine.member ? shortName(machine.member) : 'A member';
      return {
        detail: next ? `${who} · next ${next}` : who,
        aside: machine.startedAt ? formatElapsed(now.getTime() - new Date(machine.startedAt).getTime()) : null,
      };
    }
    case 'tagged_out':
      return { detail: machine.tagOut?.reason ?? 'Out of service', aside: null };
    case 'reserved':
      return { detail: next ? `From ${next}` : 'Reserved', aside: null };
    case 'offline':
      return { detail: next ? `Station not reporting · next ${next}` : 'Station not reporting', aside: null };
    case 'available':
      return { detail: next ? `Next reservation ${next}` : categoryLabel(machine.category), aside: null };
  }
}
