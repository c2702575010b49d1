import type { MaintenanceStatus, MaintenanceTask } from '@chuckkey/core';
import { calendarDateLabel } from '../../../lib/shop-clock';

export const statusWords: Record<MaintenanceStatus, string> = {
  ok: 'OK',
  due: 'Due soon',
  overdue: 'Overdue',
};

/** A meter reading as people read it: "1,843.5 h". */
export const hoursText = (hours: number) => `${new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 }).format(hours)} h`;

/** "Every 8 meter hours", "Every 90 days", "Every 500 meter hours or 180 days". */
export function everyWords(task: Pick<MaintenanceTask, 'everyHours' | 'everyDays'>): string {
  const parts: string[] = [];
  if (task.everyHours !== null) parts.push(`${new Intl.NumberFormat('en-US').format(task.everyHours)} meter hours`);
  if (task.everyDays !== null) parts.push(task.everyDays === 1 ? 'day' : `${task.everyDays} days`);
  return `Every ${parts.join(' or ')}`;
}

/** "At 1,851.5 h (meter at 1,843.5 h)", "On 12 Dec", or both, whichever the task keeps. */
export function nextDueWords(task: Pick<MaintenanceTask, 'nextDueHours' | 'nextDueDate' | 'machine'>): string {
  const parts: string[] = [];
  if (task.nextDueHours !== null) parts.push(`at ${hoursText(task.nextDueHours)} (meter ${hoursText(task.machine.meterHours)})`);
  if (task.nextDueDate !== null) parts.push(`on ${calendarDateLabel(task.nextDueDate, 'short')}`);
  const text = parts.join(' or ');
  return text.charAt(0).toUpperCase() + text.slice(1);
}

const statusRank: Record<MaintenanceStatus, number> = { overdue: 0, due: 1, ok: 2 };

/** Overdue first, then due soon, then the rest: the order in which the work wants doing. */
export function byUrgency(a: Pick<MaintenanceTask, 'status'>, b: Pick<MaintenanceTask, 'status'>): number {
  return statusRank[a.status] - statusRank[b.status];
}

/**
 * Hours and days do not compare, so tasks sort by their due date first (tasks kept by hours
 * alone after every dated one), then by the meter hours left.
 */
export function dueSortKey(task: Pick<MaintenanceTask, 'nextDueHours' | 'nextDueDate' | 'machine'>): [number, number] {
  const date = task.nextDueDate ? Date.parse(`${task.nextDueDate}T00:00:00Z`) : Number.POSITIVE_INFINITY;
  const hoursLeft = task.nextDueHours !== null ? task.nextDueHours - task.machine.meterHours : Number.POSITIVE_INFINITY;
  return [date, hoursLeft];
}
