import { addCalendarDays, wallClockAt } from '../shop/calendar';

export const maintenanceStatuses = ['ok', 'due', 'overdue'] as const;
export type MaintenanceStatus = (typeof maintenanceStatuses)[number];

/** What a task's schedule is counted from: the fields of a task that decide when it is due. */
export interface MaintenanceSchedule {
  everyHours: number | null;
  everyDays: number | null;
  /** The machine's meter when the task was set up, counted from until it is first done. */
  startMeterHours: number;
  createdAt: Date;
}

export interface MaintenanceDone {
  doneAt: Date;
  meterHours: number;
}

export interface MaintenanceDue {
  status: MaintenanceStatus;
  /** The meter reading at which the task falls due, or null for a task kept by days only. */
  nextDueHours: number | null;
  /** The shop's calendar date ('YYYY-MM-DD') on which it falls due, or null for one kept by hours only. */
  nextDueDate: string | null;
}

/**
 * "Due soon" is the last tenth of the interval: 0.8 h of an 8 h oiling, 50 h of a 500 h oil
 * change, 9 days of a 90-day adjustment (whole days, so at least one). A tenth scales with the
 * task, so a short task does not sit in "due" for most of its life and a long one still warns
 * a few sessions ahead.
 */
export const DUE_SOON_FRACTION = 0.1;

/** Meter readings are kept to 0.01 h; comparing whole hundredths keeps sums such as 12.34 + 8 exact. */
const hundredths = (hours: number) => Math.round(hours * 100);

/**
 * When a task is next due and whether it is due now, from the machine's meter and the shop's
 * calendar. The next due point counts from the last time it was done (its meter reading and its
 * date in the shop's time zone), or from when the task was set up if it never was.
 *
 * The count restarts at the completion, not at the next multiple of the interval: if the meter
 * ran past two intervals before anyone did the work, the task is overdue once, and once done it
 * is next due a full interval after the reading at which it was done. That is common practice
 * for wear-based service (the oil is as old as the last change, not as the schedule), and it
 * never leaves a task due again a few hours after it was done late.
 *
 * Overdue is past either limit: the meter above the due reading, or the shop's date after the due
 * date (on the due date itself the task is due, not yet overdue). The scan's statement reads
 * overdue blocking tasks with the same rule in SQL.
 */
export function maintenanceDue(
  schedule: MaintenanceSchedule,
  last: MaintenanceDone | null,
  meterHours: number,
  now: Date,
  timeZone: string,
): MaintenanceDue {
  let overdue = false;
  let dueSoon = false;
  let nextDueHours: number | null = null;
  let nextDueDate: string | null = null;

  if (schedule.everyHours !== null) {
    const from = hundredths(last ? last.meterHours : schedule.startMeterHours);
    const due = from + hundredths(schedule.everyHours);
    const meter = hundredths(meterHours);
    nextDueHours = due / 100;
    if (meter > due) overdue = true;
    else if (due - meter <= hundredths(schedule.everyHours * DUE_SOON_FRACTION)) dueSoon = true;
  }

  if (schedule.everyDays !== null) {
    const fromDate = wallClockAt(last ? last.doneAt : schedule.createdAt, timeZone).date;
    nextDueDate = addCalendarDays(fromDate, schedule.everyDays);
    const today = wallClockAt(now, timeZone).date;
    const soonFrom = addCalendarDays(nextDueDate, -Math.max(1, Math.ceil(schedule.everyDays * DUE_SOON_FRACTION)));
    // 'YYYY-MM-DD' strings order as the dates they name.
    if (today > nextDueDate) overdue = true;
    else if (today >= soonFrom) dueSoon = true;
  }

  return { status: overdue ? 'overdue' : dueSoon ? 'due' : 'ok', nextDueHours, nextDueDate };
}
