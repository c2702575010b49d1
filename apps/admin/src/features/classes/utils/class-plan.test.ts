import type { ClassDetail } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { bookedLabel, classHoldFormSchema, classLengths, classRequestBody, planClassHold, upcomingOccurrences } from './class-plan';

// Offsets and the dates the clocks change come from the IANA time zone database, read through
// Intl: America/Chicago goes from CDT (UTC−5) back to CST (UTC−6) at 2:00 on Sunday 1 November
// 2026, and forward again at 2:00 on Sunday 14 March 2027.
const CHICAGO = 'America/Chicago';
const NOW = new Date('2026-10-01T12:00:00Z');

const form = {
  machineId: '00000000-0000-4000-8000-0000000000aa',
  trainingId: '',
  title: '  Lathe basics class ',
  date: '2026-10-24',
  startTime: '09:00',
  lengthMinutes: '120',
  weeks: '3',
  capacity: '',
};

describe('classHoldFormSchema', () => {
  it('reads the fields into numbers, with no training and no capacity as null', () => {
    const parsed = classHoldFormSchema.parse(form);
    expect(parsed).toEqual({
      machineId: form.machineId,
      trainingId: null,
      title: 'Lathe basics class',
      date: '2026-10-24',
      startMinutes: 540,
      lengthMinutes: 120,
      weeks: 3,
      capacity: null,
    });
  });

  it('refuses more than 26 weeks, a length off the half hours and a capacity that is not a whole number', () => {
    const result = classHoldFormSchema.safeParse({ ...form, weeks: '27', lengthMinutes: '45', capacity: '2.5' });
    expect(result.success).toBe(false);
    const fields = result.error?.issues.map((issue) => issue.path[0]).sort();
    expect(fields).toEqual(['capacity', 'lengthMinutes', 'weeks']);
  });

  it('offers lengths in half hours up to a working day (common practice, no published source)', () => {
    expect(classLengths[0]).toBe(30);
    expect(classLengths.at(-1)).toBe(480);
    expect(classLengths).toHaveLength(16);
  });
});

describe('planClassHold', () => {
  it('keeps a weekly 9:00 class at 9:00 on the shop clock across the November change (IANA tz database via Intl)', () => {
    const plan = planClassHold(classHoldFormSchema.parse(form), CHICAGO, NOW);
    expect(plan.ok).toBe(true);
    if (!plan.ok) return;
    // 24 and 31 October are on CDT (UTC−5), 7 November on CST (UTC−6).
    expect(plan.occurrences.map((o) => o.start.toISOString())).toEqual(['2026-10-24T14:00:00.000Z', '2026-10-31T14:00:00.000Z', '2026-11-07T15:00:00.000Z']);
    expect(plan.occurrences.map((o) => o.end.toISOString())).toEqual(['2026-10-24T16:00:00.000Z', '2026-10-31T16:00:00.000Z', '2026-11-07T17:00:00.000Z']);
  });

  it('holds once when it repeats for one week', () => {
    const plan = planClassHold({ ...classHoldFormSchema.parse(form), weeks: 1 }, CHICAGO, NOW);
    expect(plan.ok && plan.occurrences).toHaveLength(1);
  });

  it('refuses a first class that has already begun', () => {
    const plan = planClassHold(classHoldFormSchema.parse(form), CHICAGO, new Date('2026-10-24T14:00:00Z'));
    expect(plan).toEqual({ ok: false, field: 'date', message: 'The first class must start in the future.' });
  });

  it('refuses a start time the clocks skip (IANA tz database via Intl: 2:30 on 14 March 2027 does not happen in Chicago)', () => {
    const plan = planClassHold({ ...classHoldFormSchema.parse(form), date: '2027-03-14', startMinutes: 150 }, CHICAGO, NOW);
    expect(plan.ok).toBe(false);
    expect(!plan.ok && plan.field).toBe('startTime');
  });
});

describe('classRequestBody', () => {
  it('sends the first meeting as instants and the number of weeks, as POST /api/classes takes them', () => {
    const values = classHoldFormSchema.parse({ ...form, capacity: '8' });
    const plan = planClassHold(values, CHICAGO, NOW);
    if (!plan.ok || !plan.occurrences[0]) throw new Error('the plan should hold');
    expect(classRequestBody(values, plan.occurrences[0])).toEqual({
      machineId: form.machineId,
      trainingId: null,
      title: 'Lathe basics class',
      start: '2026-10-24T14:00:00.000Z',
      end: '2026-10-24T16:00:00.000Z',
      weeks: 3,
      capacity: 8,
    });
  });
});

describe('upcomingOccurrences', () => {
  const occurrence = (n: number, startsAt: string, endsAt: string, status: ClassDetail['occurrences'][number]['status'] = 'active') => ({
    reservationId: `00000000-0000-4000-8000-00000000000${n}`,
    startsAt,
    endsAt,
    status,
  });

  it('keeps the live meetings not yet ended, soonest first', () => {
    const cls = {
      occurrences: [
        occurrence(3, '2026-10-31T14:00:00Z', '2026-10-31T16:00:00Z'),
        occurrence(1, '2026-09-26T14:00:00Z', '2026-09-26T16:00:00Z'),
        occurrence(2, '2026-10-24T14:00:00Z', '2026-10-24T16:00:00Z', 'cancelled'),
        occurrence(4, '2026-10-01T11:00:00Z', '2026-10-01T13:00:00Z'),
      ],
    };
    expect(upcomingOccurrences(cls, NOW).map((o) => o.reservationId.at(-1))).toEqual(['4', '3']);
  });
});

describe('bookedLabel', () => {
  it('says how many are booked, and of how many places when the class has a limit', () => {
    expect(bookedLabel(4, 8)).toBe('4 booked of 8 places');
    expect(bookedLabel(1, 1)).toBe('1 booked of 1 place');
    expect(bookedLabel(3, null)).toBe('3 booked');
  });
});
