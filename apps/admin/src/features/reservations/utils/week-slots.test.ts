import type { MyReservation } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { mondayOf, quotaLeft, weekSlots } from './week-slots';

// Offsets and the dates the clocks change come from the IANA time zone database, read through
// Intl: America/Chicago goes from CST (UTC−6) to CDT (UTC−5) at 2:00 on Sunday 8 March 2026.
const CHICAGO = 'America/Chicago';
const saturdayHours = [{ weekday: 6, opensAt: '09:00', closesAt: '12:00' }];

describe('mondayOf', () => {
  it("finds the Monday of the shop's week, not of UTC's (ISO 8601 weeks start on Monday)", () => {
    // Sunday 8 March 2026 at 23:30 in Chicago is already Monday in UTC.
    expect(mondayOf(new Date('2026-03-09T04:30:00Z'), CHICAGO)).toBe('2026-03-02');
  });
});

describe('weekSlots', () => {
  const base = {
    monday: '2026-03-02',
    timeZone: CHICAGO,
    slotMinutes: 60,
    weekly: saturdayHours,
    closures: [],
    taken: [],
    now: new Date('2026-03-01T00:00:00Z'),
  };

  it('lists Monday to Sunday, with slots only inside the opening hours, each named for a screen reader', () => {
    const days = weekSlots(base);
    expect(days.map((d) => d.name)).toEqual(['Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday', 'Sunday']);
    expect(days[0]?.slots).toEqual([]);
    expect(days[5]?.slots.map((s) => s.label)).toEqual(['Saturday 9:00, free', 'Saturday 10:00, free', 'Saturday 11:00, free']);
  });

  it('marks a slot taken while a claim or its cleanup buffer overlaps it, and a class hold as such', () => {
    const days = weekSlots({
      ...base,
      taken: [
        { start: '2026-03-07T15:00:00Z', end: '2026-03-07T15:30:00Z', blockedUntil: '2026-03-07T16:15:00Z', kind: 'member' },
        { start: '2026-03-07T17:00:00Z', end: '2026-03-07T18:00:00Z', blockedUntil: '2026-03-07T18:00:00Z', kind: 'class' },
      ],
    });
    expect(days[5]?.slots.map((s) => s.state)).toEqual(['taken', 'taken', 'class']);
  });

  it('names the class that holds a slot, for the eye and for a screen reader', () => {
    const days = weekSlots({
      ...base,
      taken: [{ start: '2026-03-07T15:00:00Z', end: '2026-03-07T16:00:00Z', blockedUntil: '2026-03-07T16:00:00Z', kind: 'class', title: 'Lathe basics class' }],
    });
    const slot = days[5]?.slots[0];
    expect(slot?.classTitle).toBe('Lathe basics class');
    expect(slot?.label).toBe('Saturday 9:00, held for the class Lathe basics class');
    expect(days[5]?.slots[1]?.classTitle).toBeNull();
  });

  it('marks slots that have begun as past', () => {
    const days = weekSlots({ ...base, now: new Date('2026-03-07T16:30:00Z') });
    expect(days[5]?.slots.map((s) => s.state)).toEqual(['past', 'past', 'free']);
  });

  it('skips the hour the clocks jump over on the night they go forward (IANA tz database via Intl)', () => {
    const days = weekSlots({ ...base, weekly: [], slotMinutes: 60 });
    // With no hours set the day rail runs 6:00–24:00; Sunday 8 March still has 18 whole hours there.
    expect(days[6]?.slots).toHaveLength(18);
    expect(days[6]?.slots[0]?.start.toISOString()).toBe('2026-03-08T11:00:00.000Z');
    const night = weekSlots({ ...base, weekly: [{ weekday: 7, opensAt: '01:00', closesAt: '04:00' }], slotMinutes: 60 });
    expect(night[6]?.slots.map((s) => s.time)).toEqual(['1:00', '3:00']);
  });

  it('names a closure instead of offering slots', () => {
    const days = weekSlots({ ...base, closures: [{ startsOn: '2026-03-07', endsOn: '2026-03-07', reason: 'Floor resurfacing' }] });
    expect(days[5]).toMatchObject({ closure: 'Floor resurfacing', slots: [] });
  });
});

describe('quotaLeft', () => {
  const reservation = (start: string, end: string, status: MyReservation['status'] = 'active'): MyReservation => ({
    id: '00000000-0000-4000-8000-000000000001',
    machineId: '00000000-0000-4000-8000-0000000000aa',
    machineName: 'MIG welder',
    kind: 'member',
    start,
    end,
    status,
  });

  it('counts live claims on the machine inside the Monday-to-Sunday week of the shop (common practice: ISO 8601 weeks)', () => {
    const mine = [
      reservation('2026-03-07T15:00:00Z', '2026-03-07T17:00:00Z'),
      reservation('2026-03-06T15:00:00Z', '2026-03-06T16:00:00Z', 'cancelled'),
      // Monday 9 March 0:00 in Chicago (CDT) is 05:00 UTC: this one falls in the next week.
      reservation('2026-03-09T05:00:00Z', '2026-03-09T06:00:00Z'),
    ];
    expect(quotaLeft(mine, '00000000-0000-4000-8000-0000000000aa', '2026-03-02', CHICAGO, 360)).toBe(240);
    expect(quotaLeft(mine, '00000000-0000-4000-8000-0000000000bb', '2026-03-02', CHICAGO, 360)).toBe(360);
  });

  it("leaves a class the member is booked into out of their quota: the hold is the instructor's (common practice, no published source)", () => {
    const mine = [{ ...reservation('2026-03-07T15:00:00Z', '2026-03-07T18:00:00Z'), kind: 'class' as const }];
    expect(quotaLeft(mine, '00000000-0000-4000-8000-0000000000aa', '2026-03-02', CHICAGO, 360)).toBe(360);
  });
});
