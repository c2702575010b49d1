import { describe, expect, it } from 'vitest';
import { maintenanceDue, type MaintenanceSchedule } from './due';

const ZONE = 'America/Chicago';
const createdAt = new Date('2026-11-02T15:00:00Z'); // 09:00 on 2 November in Chicago
const byHours = (everyHours: number, startMeterHours = 100): MaintenanceSchedule => ({ everyHours, everyDays: null, startMeterHours, createdAt });
const byDays = (everyDays: number): MaintenanceSchedule => ({ everyHours: null, everyDays, startMeterHours: 0, createdAt });

describe('maintenance due by meter hours', () => {
  it('a task never done counts from the meter when it was set up', () => {
    expect(maintenanceDue(byHours(8), null, 104, createdAt, ZONE)).toEqual({ status: 'ok', nextDueHours: 108, nextDueDate: null });
  });

  it('is due within the last tenth of the interval and overdue only past the due reading', () => {
    // 8 h interval: due from 0.8 h before the reading (the last tenth), overdue above it.
    expect(maintenanceDue(byHours(8), null, 107.19, createdAt, ZONE).status).toBe('ok');
    expect(maintenanceDue(byHours(8), null, 107.2, createdAt, ZONE).status).toBe('due');
    expect(maintenanceDue(byHours(8), null, 108, createdAt, ZONE).status).toBe('due');
    expect(maintenanceDue(byHours(8), null, 108.01, createdAt, ZONE).status).toBe('overdue');
  });

  it('adds hundredths exactly, as the database adds numerics', () => {
    // 12.34 + 8 in binary floating point is 20.339999999999996; the meter at 20.34 is not past it.
    const last = { doneAt: createdAt, meterHours: 12.34 };
    expect(maintenanceDue(byHours(8, 0), last, 20.34, createdAt, ZONE)).toMatchObject({ status: 'due', nextDueHours: 20.34 });
  });

  it('the meter moving past two intervals at once is overdue once, then due again a full interval after the completion', () => {
    // Common practice: a late service restarts the count at the reading it was done at.
    const schedule = byHours(40, 0);
    expect(maintenanceDue(schedule, null, 95.5, createdAt, ZONE)).toEqual({ status: 'overdue', nextDueHours: 40, nextDueDate: null });
    const done = { doneAt: new Date('2026-11-20T18:00:00Z'), meterHours: 95.5 };
    // From the completion's 95.5 h, not the next multiple of 40 (120 h).
    expect(maintenanceDue(schedule, done, 95.5, done.doneAt, ZONE)).toEqual({ status: 'ok', nextDueHours: 135.5, nextDueDate: null });
    expect(maintenanceDue(schedule, done, 125, done.doneAt, ZONE).status).toBe('ok');
  });
});

describe('maintenance due by days in the shop calendar', () => {
  it('a task never done counts from the day it was set up', () => {
    expect(maintenanceDue(byDays(30), null, 0, createdAt, ZONE)).toEqual({ status: 'ok', nextDueDate: '2026-12-02', nextDueHours: null });
  });

  it('is due in the last tenth of the days, due on the date itself and overdue the day after', () => {
    // 30 days: due from 3 days before. Times are 09:00 Chicago (15:00 UTC, CST from 1 November,
    // IANA time zone database through Intl).
    expect(maintenanceDue(byDays(30), null, 0, new Date('2026-11-28T15:00:00Z'), ZONE).status).toBe('ok');
    expect(maintenanceDue(byDays(30), null, 0, new Date('2026-11-29T15:00:00Z'), ZONE).status).toBe('due');
    expect(maintenanceDue(byDays(30), null, 0, new Date('2026-12-03T05:59:00Z'), ZONE).status).toBe('due');
    expect(maintenanceDue(byDays(30), null, 0, new Date('2026-12-03T06:00:00Z'), ZONE).status).toBe('overdue');
  });

  it('counts the dates in the shop time zone, not UTC', () => {
    // 20:00 on 2 December in Chicago is already 3 December in UTC: still the due date at the shop.
    const last = { doneAt: new Date('2026-11-03T02:00:00Z'), meterHours: 0 }; // 20:00 on 2 November in Chicago
    expect(maintenanceDue(byDays(30), last, 0, new Date('2026-12-03T02:00:00Z'), ZONE)).toMatchObject({ status: 'due', nextDueDate: '2026-12-02' });
  });

  it('after a completion counts from the completion date', () => {
    const last = { doneAt: new Date('2026-12-10T17:00:00Z'), meterHours: 0 };
    expect(maintenanceDue(byDays(90), last, 0, new Date('2026-12-10T17:00:00Z'), ZONE)).toMatchObject({ status: 'ok', nextDueDate: '2027-03-10' });
  });

  it('a short interval is due for at least its last day', () => {
    // A tenth of 5 days rounds up to one whole day.
    expect(maintenanceDue(byDays(5), null, 0, new Date('2026-11-05T15:00:00Z'), ZONE).status).toBe('ok');
    expect(maintenanceDue(byDays(5), null, 0, new Date('2026-11-06T15:00:00Z'), ZONE).status).toBe('due');
  });
});

describe('maintenance due by hours and days together', () => {
  const both: MaintenanceSchedule = { everyHours: 500, everyDays: 180, startMeterHours: 1000, createdAt };

  it('reports both limits', () => {
    expect(maintenanceDue(both, null, 1100, createdAt, ZONE)).toEqual({ status: 'ok', nextDueHours: 1500, nextDueDate: '2027-05-01' });
  });

  it('is overdue when past either limit, whichever comes first', () => {
    expect(maintenanceDue(both, null, 1500.01, createdAt, ZONE).status).toBe('overdue');
    expect(maintenanceDue(both, null, 1100, new Date('2027-05-02T15:00:00Z'), ZONE).status).toBe('overdue');
  });

  it('overdue on one limit outweighs due soon on the other', () => {
    expect(maintenanceDue(both, null, 1460, new Date('2027-05-02T15:00:00Z'), ZONE).status).toBe('overdue');
    expect(maintenanceDue(both, null, 1460, createdAt, ZONE).status).toBe('due');
  });
});
