import { DAY_RAIL_END_MINUTES, DAY_RAIL_START_MINUTES } from '@chuckkey/core';

const DAY_MINUTES = 24 * 60;
const RAIL_MINUTES = DAY_RAIL_END_MINUTES - DAY_RAIL_START_MINUTES;

/** What a bar on the rail stands for; each has its own word, icon and colour. */
export type TimeBarKind = 'member' | 'class' | 'session';

export interface RailSpan {
  /** Percent of the rail's width from its 06:00 end. */
  left: number;
  width: number;
  /** The span began before 06:00 or runs past midnight, so that end of the bar is cut off. */
  clippedStart: boolean;
  clippedEnd: boolean;
}

interface WallClock {
  date: string;
  minutes: number;
}

const partsFormats = new Map<string, Intl.DateTimeFormat>();

function wallClock(at: Date, timeZone: string): WallClock {
  let format = partsFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });
    partsFormats.set(timeZone, format);
  }
  const part = (type: Intl.DateTimeFormatPartTypes) => format.formatToParts(at).find((p) => p.type === type)?.value ?? '0';
  return { date: `${part('year')}-${part('month')}-${part('day')}`, minutes: Number(part('hour')) * 60 + Number(part('minute')) };
}

function daysBetween(from: string, to: string): number {
  return Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / 86_400_000);
}

/**
 * Minutes after midnight of the shop's calendar date `day` on its wall clock: negative for an
 * instant on an earlier day, 1,440 and more for a later one. Wall-clock minutes keep 14:00 at the
 * same place on the rail whether or not the clocks changed that night.
 */
export function wallMinutes(at: Date, day: string, timeZone: string): number {
  const clock = wallClock(at, timeZone);
  return daysBetween(day, clock.date) * DAY_MINUTES + clock.minutes;
}

/** Where a wall-clock minute of the day falls on the 06:00–24:00 rail, in percent, held to its ends. */
export function railPercent(minutes: number): number {
  const clamped = Math.min(Math.max(minutes, DAY_RAIL_START_MINUTES), DAY_RAIL_END_MINUTES);
  return ((clamped - DAY_RAIL_START_MINUTES) / RAIL_MINUTES) * 100;
}

/** The part of [start, end) that lies on the day's rail, or null when none of it does. */
export function railSpan(start: Date, end: Date, day: string, timeZone: string): RailSpan | null {
  const from = wallMinutes(start, day, timeZone);
  const to = wallMinutes(end, day, timeZone);
  if (to <= DAY_RAIL_START_MINUTES || from >= DAY_RAIL_END_MINUTES || to <= from) return null;
  const left = railPercent(from);
  return { left, width: railPercent(to) - left, clippedStart: from < DAY_RAIL_START_MINUTES, clippedEnd: to > DAY_RAIL_END_MINUTES };
}

/** "14:00" on the shop's wall clock. */
export function clockLabel(at: Date, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(at);
}

const kindWords: Record<TimeBarKind, string> = { member: 'Reserved', class: 'Class', session: 'In use' };

/**
 * The bar in words, as screen readers and the legend give it: "Reserved 14:00–16:00". A session
 * still running has no end yet, so it reads "In use since 13:05".
 */
export function spanWords(kind: TimeBarKind, start: Date, end: Date, timeZone: string): string {
  if (kind === 'session') return `${kindWords[kind]} since ${clockLabel(start, timeZone)}`;
  return `${kindWords[kind]} ${clockLabel(start, timeZone)}–${clockLabel(end, timeZone)}`;
}
