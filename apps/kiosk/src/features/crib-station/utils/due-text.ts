const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY_MS = 24 * HOUR;

function shopDay(at: Date, timeZone: string): number {
  const [year, month, day] = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' })
    .format(at)
    .split('-')
    .map(Number);
  return Date.UTC(year ?? 1970, (month ?? 1) - 1, day ?? 1) / DAY_MS;
}

function clock(at: Date, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(at);
}

/**
 * A moment as people say it at the crib, on the shop's wall clock: "today 18:00", "tomorrow
 * 10:00", "Tuesday 18:00" within the week either side, else "14 March 18:00".
 */
export function whenWords(at: Date, now: Date, timeZone: string): string {
  const days = shopDay(at, timeZone) - shopDay(now, timeZone);
  const time = clock(at, timeZone);
  if (days === 0) return `today ${time}`;
  if (days === 1) return `tomorrow ${time}`;
  if (days === -1) return `yesterday ${time}`;
  if (Math.abs(days) < 7) return `${new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'long' }).format(at)} ${time}`;
  return `${new Intl.DateTimeFormat('en-GB', { timeZone, day: 'numeric', month: 'long' }).format(at)} ${time}`;
}

function plural(count: number, unit: string): string {
  return `${count} ${unit}${count === 1 ? '' : 's'}`;
}

/** How long past due, in the largest whole unit that reads naturally: minutes, hours, then days. */
export function overdueFor(dueAt: Date, now: Date): string {
  const late = Math.max(0, now.getTime() - dueAt.getTime());
  if (late < HOUR) return plural(Math.max(1, Math.floor(late / MINUTE)), 'minute');
  if (late < 2 * DAY_MS) return plural(Math.floor(late / HOUR), 'hour');
  return plural(Math.floor(late / DAY_MS), 'day');
}

/** "Due back Tuesday 18:00" for a tool in the basket or on the receipt. */
export function dueBackLine(dueAt: string, now: Date, timeZone: string): string {
  return `Due back ${whenWords(new Date(dueAt), now, timeZone)}`;
}

/** A tool the member has out: when it is due, or how long it is overdue. */
export function outLine(dueAt: string, now: Date, timeZone: string): string {
  const due = new Date(dueAt);
  if (due.getTime() > now.getTime()) return dueBackLine(dueAt, now, timeZone);
  return `Overdue by ${overdueFor(due, now)}, was due ${whenWords(due, now, timeZone)}`;
}

/** A tool someone else has: "Out to Ines until 18:00" (the day named when it is not today). */
export function outToLine(firstName: string, dueAt: string, now: Date, timeZone: string): string {
  const due = new Date(dueAt);
  if (due.getTime() <= now.getTime()) return `Out to ${firstName}, overdue since ${whenWords(due, now, timeZone)}`;
  const same = shopDay(due, timeZone) === shopDay(now, timeZone);
  return `Out to ${firstName} until ${same ? clock(due, timeZone) : whenWords(due, now, timeZone)}`;
}
