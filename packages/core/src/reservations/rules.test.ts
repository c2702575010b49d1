import { describe, expect, it } from 'vitest';
import type { WeeklyHours } from '../shop/hours';
import {
  DEFAULT_RESERVATION_RULES,
  quotaWeeks,
  reservationCreateSchema,
  reservationRefusal,
  reservationRulesInputSchema,
  suspensionEnd,
  type ReservationFacts,
  type ReservationRules,
} from './rules';

const CHICAGO = 'America/Chicago';
const at = (iso: string) => new Date(iso);
const DAY = 86_400_000;

// ISO 8601 weekdays: Monday 1 … Sunday 7. Open every day 08:00–20:00.
const everyDay: WeeklyHours[] = [1, 2, 3, 4, 5, 6, 7].map((weekday) => ({ weekday, opensAt: '08:00', closesAt: '20:00' }));
const saturdayMorning: WeeklyHours[] = [{ weekday: 6, opensAt: '09:00', closesAt: '13:00' }];

const mig = { id: '6f1c1a52-8f8e-4c55-9e0a-4d4c1b9b0001', name: 'MIG welding safety' };

function facts(overrides: Partial<Omit<ReservationFacts, 'machine'>> & { rules?: Partial<ReservationRules>; reservable?: boolean; trainings?: { id: string; name: string }[] } = {}): ReservationFacts {
  const { rules, reservable, trainings, ...rest } = overrides;
  return {
    timeZone: CHICAGO,
    machine: {
      name: 'MIG welder',
      reservable: reservable ?? true,
      rules: { ...DEFAULT_RESERVATION_RULES, ...rules },
      requiredTrainings: trainings ?? [],
    },
    signOffs: [],
    hours: { weekly: [], closures: [] },
    memberReservations: [],
    noShows: [],
    ...rest,
  };
}

/** Wall-clock time in Chicago as the IANA tz database through Intl gives it: 'YYYY-MM-DD HH:MM'. */
function chicagoWallClock(instant: Date): string {
  const parts = Object.fromEntries(
    new Intl.DateTimeFormat('en-CA', { timeZone: CHICAGO, year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' })
      .formatToParts(instant)
      .map((p) => [p.type, p.value]),
  );
  return `${parts.year}-${parts.month}-${parts.day} ${parts.hour}:${parts.minute}`;
}

// "Now" for most cases: Friday 6 March 2026, 12:00 CST (UTC−6, IANA tz database).
const now = at('2026-03-06T18:00:00Z');

describe('reservationRefusal()', () => {
  it('allows a reservation that every rule lets through', () => {
    // IANA tz database: Tuesday 10 March 2026 10:00 CDT (UTC−5) is 15:00Z.
    expect(reservationRefusal(facts({ hours: { weekly: everyDay, closures: [] } }), { start: at('2026-03-10T15:00:00Z'), end: at('2026-03-10T17:00:00Z') }, now)).toBeNull();
  });

  it('refuses a machine that is not reservable with not_reservable', () => {
    const refusal = reservationRefusal(facts({ reservable: false }), { start: at('2026-03-10T15:00:00Z'), end: at('2026-03-10T16:00:00Z') }, now);
    expect(refusal?.code).toBe('not_reservable');
  });

  it('refuses a start that has passed with in_the_past', () => {
    expect(reservationRefusal(facts(), { start: at('2026-03-06T17:45:00Z'), end: at('2026-03-06T18:30:00Z') }, now)?.code).toBe('in_the_past');
  });

  it('refuses a start or a length off the slot step with bad_step', () => {
    // 15:10Z is 10:10 CDT: not on a 15-minute step.
    expect(reservationRefusal(facts(), { start: at('2026-03-10T15:10:00Z'), end: at('2026-03-10T16:10:00Z') }, now)?.code).toBe('bad_step');
    // On the step, but 50 minutes long.
    expect(reservationRefusal(facts(), { start: at('2026-03-10T15:00:00Z'), end: at('2026-03-10T15:50:00Z') }, now)?.code).toBe('bad_step');
  });

  it('measures the step on the shop wall clock, not in UTC, for a time zone off the whole hour', () => {
    // IANA tz database: Asia/Kolkata is UTC+05:30 all year, so 03:30Z is 09:00 local, on a 60-minute step.
    const kolkata = facts({ timeZone: 'Asia/Kolkata', rules: { slotMinutes: 60 } });
    expect(reservationRefusal(kolkata, { start: at('2026-03-10T03:30:00Z'), end: at('2026-03-10T04:30:00Z') }, now)).toBeNull();
    expect(reservationRefusal(kolkata, { start: at('2026-03-10T03:00:00Z'), end: at('2026-03-10T04:00:00Z') }, now)?.code).toBe('bad_step');
  });

  it('refuses a reservation longer than the machine allows with too_long, naming both lengths', () => {
    const refusal = reservationRefusal(facts({ rules: { maxMinutes: 120 } }), { start: at('2026-03-10T15:00:00Z'), end: at('2026-03-10T17:15:00Z') }, now);
    expect(refusal).toEqual({ code: 'too_long', message: 'A reservation on the MIG welder can be at most 2 h long; this one is 2 h 15 min.' });
  });

  it('refuses a start more calendar days ahead than the horizon with beyond_horizon', () => {
    // Today is 6 March in Chicago; 20 March is 14 days ahead, 21 March 15.
    expect(reservationRefusal(facts(), { start: at('2026-03-20T15:00:00Z'), end: at('2026-03-20T16:00:00Z') }, now)).toBeNull();
    expect(reservationRefusal(facts(), { start: at('2026-03-21T15:00:00Z'), end: at('2026-03-21T16:00:00Z') }, now)?.code).toBe('beyond_horizon');
  });

  it('refuses a member with the no-show limit reached within the window with suspended, until the suspension ends', () => {
    const noShows = [at('2026-02-10T15:00:00Z'), at('2026-02-20T15:00:00Z'), at('2026-03-02T15:00:00Z')];
    const request = { start: at('2026-03-10T15:00:00Z'), end: at('2026-03-10T16:00:00Z') };
    expect(reservationRefusal(facts({ noShows }), request, now)?.code).toBe('suspended');
    // Seven days after the third no-show (2 March 15:00Z) the member may reserve again.
    expect(reservationRefusal(facts({ noShows }), request, at('2026-03-09T15:00:00Z'))).toBeNull();
  });

  it('does not suspend for no-shows spread wider than the window', () => {
    const noShows = [at('2026-01-10T15:00:00Z'), at('2026-02-20T15:00:00Z'), at('2026-03-02T15:00:00Z')];
    expect(suspensionEnd(noShows, DEFAULT_RESERVATION_RULES)).toBeNull();
  });

  describe('training_required, judged at the reserved start', () => {
    const request = { start: at('2026-03-14T15:00:00Z'), end: at('2026-03-14T17:00:00Z') };

    it('names the training when there is no sign-off', () => {
      expect(reservationRefusal(facts({ trainings: [mig] }), request, now)).toEqual({
        code: 'training_required',
        message: 'Reserving the MIG welder needs a sign-off for MIG welding safety.',
      });
    });

    it('refuses a sign-off that is valid now but lapses before the start', () => {
      const signOffs = [{ trainingId: mig.id, level: 'independent' as const, expiresAt: at('2026-03-12T06:00:00Z'), revokedAt: null }];
      const refusal = reservationRefusal(facts({ trainings: [mig], signOffs }), request, now);
      expect(refusal?.code).toBe('training_required');
      expect(refusal?.message).toContain('MIG welding safety lapses on Thursday 12 March 2026, before this reservation starts');
    });

    it('refuses a revoked sign-off', () => {
      const signOffs = [{ trainingId: mig.id, level: 'independent' as const, expiresAt: null, revokedAt: at('2026-03-01T12:00:00Z') }];
      expect(reservationRefusal(facts({ trainings: [mig], signOffs }), request, now)?.message).toBe('Your sign-off for MIG welding safety was withdrawn by an instructor.');
    });

    it('accepts a sign-off still valid at the start', () => {
      const signOffs = [{ trainingId: mig.id, level: 'supervised' as const, expiresAt: at('2026-03-15T06:00:00Z'), revokedAt: null }];
      expect(reservationRefusal(facts({ trainings: [mig], signOffs }), request, now)).toBeNull();
    });
  });

  describe('outside_hours', () => {
    it('refuses a reservation running past closing, and one on a closed weekday', () => {
      // Tuesday 10 March 2026, 19:00–21:00 CDT = 00:00Z–02:00Z on 11 March; the shop closes at 20:00.
      const late = reservationRefusal(facts({ hours: { weekly: everyDay, closures: [] } }), { start: at('2026-03-11T00:00:00Z'), end: at('2026-03-11T02:00:00Z') }, now);
      expect(late).toEqual({ code: 'outside_hours', message: "A reservation must fall within the shop's opening hours; that day they are 08:00–20:00." });
      const tuesday = reservationRefusal(facts({ hours: { weekly: saturdayMorning, closures: [] } }), { start: at('2026-03-10T15:00:00Z'), end: at('2026-03-10T16:00:00Z') }, now);
      expect(tuesday?.message).toBe('The shop is closed that day.');
    });

    it('refuses a day the shop is closed, giving the closure reason, even with no weekly hours set', () => {
      const closures = [{ startsOn: '2026-03-10', endsOn: '2026-03-11', reason: 'Floor resurfacing.' }];
      const refusal = reservationRefusal(facts({ hours: { weekly: [], closures } }), { start: at('2026-03-10T15:00:00Z'), end: at('2026-03-10T16:00:00Z') }, now);
      expect(refusal).toEqual({ code: 'outside_hours', message: 'The shop is closed that day: Floor resurfacing.' });
    });

    it('with no hours set, lets a reservation run across midnight', () => {
      // 23:00 CDT Tuesday to 01:00 CDT Wednesday.
      expect(reservationRefusal(facts(), { start: at('2026-03-11T04:00:00Z'), end: at('2026-03-11T06:00:00Z') }, now)).toBeNull();
    });

    it('accepts a reservation ending at a midnight closing', () => {
      const lateNight: WeeklyHours[] = [{ weekday: 2, opensAt: '18:00', closesAt: '24:00' }];
      // Tuesday 10 March 22:00–24:00 CDT = 03:00Z–05:00Z on 11 March.
      expect(reservationRefusal(facts({ hours: { weekly: lateNight, closures: [] } }), { start: at('2026-03-11T03:00:00Z'), end: at('2026-03-11T05:00:00Z') }, now)).toBeNull();
    });
  });

  describe('daylight-saving changes in America/Chicago', () => {
    it('a 9:00 Saturday reservation after the spring change (8 March 2026) is still 9:00 local and inside 09:00–13:00', () => {
      const hours = { weekly: saturdayMorning, closures: [] };
      // IANA tz database via Intl: Saturday 7 March 9:00 CST (UTC−6) is 15:00Z; Saturday 14 March 9:00 CDT (UTC−5) is 14:00Z.
      expect(chicagoWallClock(at('2026-03-07T15:00:00Z'))).toBe('2026-03-07 09:00');
      expect(chicagoWallClock(at('2026-03-14T14:00:00Z'))).toBe('2026-03-14 09:00');
      const before = at('2026-03-05T18:00:00Z');
      expect(reservationRefusal(facts({ hours }), { start: at('2026-03-07T15:00:00Z'), end: at('2026-03-07T17:00:00Z') }, before)).toBeNull();
      expect(reservationRefusal(facts({ hours }), { start: at('2026-03-14T14:00:00Z'), end: at('2026-03-14T16:00:00Z') }, now)).toBeNull();
      // The same UTC time as the week before, 15:00Z, is now 10:00 local; 13:00Z is 8:00 local, before opening.
      expect(reservationRefusal(facts({ hours }), { start: at('2026-03-14T13:00:00Z'), end: at('2026-03-14T15:00:00Z') }, now)?.code).toBe('outside_hours');
    });

    it('a 9:00 Saturday reservation after the autumn change (1 November 2026) is still 9:00 local', () => {
      const hours = { weekly: saturdayMorning, closures: [] };
      const autumnNow = at('2026-10-30T17:00:00Z');
      // IANA tz database via Intl: Saturday 31 October 9:00 CDT is 14:00Z; Saturday 7 November 9:00 CST is 15:00Z.
      expect(chicagoWallClock(at('2026-10-31T14:00:00Z'))).toBe('2026-10-31 09:00');
      expect(chicagoWallClock(at('2026-11-07T15:00:00Z'))).toBe('2026-11-07 09:00');
      expect(reservationRefusal(facts({ hours }), { start: at('2026-10-31T14:00:00Z'), end: at('2026-10-31T16:00:00Z') }, autumnNow)).toBeNull();
      expect(reservationRefusal(facts({ hours }), { start: at('2026-11-07T15:00:00Z'), end: at('2026-11-07T17:00:00Z') }, autumnNow)).toBeNull();
      expect(reservationRefusal(facts({ hours }), { start: at('2026-11-07T14:00:00Z'), end: at('2026-11-07T16:00:00Z') }, autumnNow)?.code).toBe('outside_hours');
    });

    it('the quota week of the spring change runs Monday 00:00 CST to Monday 00:00 CDT, 167 hours', () => {
      // IANA tz database: Monday 2 March 00:00 CST = 06:00Z; Monday 9 March 00:00 CDT = 05:00Z.
      const [week] = quotaWeeks({ start: at('2026-03-08T15:00:00Z'), end: at('2026-03-08T16:00:00Z') }, CHICAGO);
      expect(week).toEqual({ start: at('2026-03-02T06:00:00Z'), end: at('2026-03-09T05:00:00Z') });
      expect((week!.end.getTime() - week!.start.getTime()) / 3_600_000).toBe(167);
    });

    it('counts the quota per local week across the spring change: Sunday 23:00 CDT is the old week, Monday 00:00 CDT the new one', () => {
      const rules = { weeklyQuotaMinutes: 120 };
      // Two hours already booked on Sunday 8 March, 10:00–12:00 CDT.
      const memberReservations = [{ start: at('2026-03-08T15:00:00Z'), end: at('2026-03-08T17:00:00Z') }];
      const sundayLate = { start: at('2026-03-09T04:00:00Z'), end: at('2026-03-09T05:00:00Z') };
      const mondayMidnight = { start: at('2026-03-09T05:00:00Z'), end: at('2026-03-09T06:00:00Z') };
      expect(reservationRefusal(facts({ rules, memberReservations }), sundayLate, now)?.code).toBe('quota_exceeded');
      expect(reservationRefusal(facts({ rules, memberReservations }), mondayMidnight, now)).toBeNull();
    });

    it('counts the quota per local week across the autumn change, a 169-hour week', () => {
      const autumnNow = at('2026-10-30T17:00:00Z');
      // IANA tz database: Monday 26 October 00:00 CDT = 05:00Z; Monday 2 November 00:00 CST = 06:00Z.
      const [week] = quotaWeeks({ start: at('2026-11-01T15:00:00Z'), end: at('2026-11-01T16:00:00Z') }, CHICAGO);
      expect(week).toEqual({ start: at('2026-10-26T05:00:00Z'), end: at('2026-11-02T06:00:00Z') });
      const rules = { weeklyQuotaMinutes: 180 };
      // 01:00 CDT to 03:00 CST on Sunday 1 November is three hours of the clock going round once and a bit.
      const acrossTheChange = { start: at('2026-11-01T06:00:00Z'), end: at('2026-11-01T09:00:00Z') };
      expect(reservationRefusal(facts({ rules: { ...rules, maxMinutes: 180 } }), acrossTheChange, autumnNow)).toBeNull();
      // Sunday 23:00–24:00 CST belongs to the same week, so three booked hours leave nothing for it.
      const sundayLate = { start: at('2026-11-02T05:00:00Z'), end: at('2026-11-02T06:00:00Z') };
      const refusal = reservationRefusal(facts({ rules, memberReservations: [acrossTheChange] }), sundayLate, autumnNow);
      expect(refusal).toEqual({
        code: 'quota_exceeded',
        message: 'You may reserve the MIG welder for 3 h a week (Monday to Sunday); the week of Monday 26 October 2026 has 0 min left.',
      });
    });
  });

  it('checks the rules in order and answers only the first that fails', () => {
    // Too long and beyond the horizon: the length is named first.
    const refusal = reservationRefusal(facts(), { start: at('2026-04-10T15:00:00Z'), end: at('2026-04-10T19:00:00Z') }, now);
    expect(refusal?.code).toBe('too_long');
  });
});

describe('reservationCreateSchema', () => {
  it('parses ISO 8601 instants with an offset (RFC 3339 §5.6) into Dates', () => {
    const parsed = reservationCreateSchema.parse({ machineId: mig.id, start: '2026-03-14T09:00:00-05:00', end: '2026-03-14T11:00:00-05:00' });
    expect(parsed.start).toEqual(at('2026-03-14T14:00:00Z'));
    expect(parsed.end.getTime() - parsed.start.getTime()).toBe(2 * 3_600_000);
  });

  it('refuses an end that does not come after the start, and a time without an offset', () => {
    expect(reservationCreateSchema.safeParse({ machineId: mig.id, start: '2026-03-14T11:00:00Z', end: '2026-03-14T11:00:00Z' }).success).toBe(false);
    expect(reservationCreateSchema.safeParse({ machineId: mig.id, start: '2026-03-14T09:00:00', end: '2026-03-14T11:00:00Z' }).success).toBe(false);
  });
});

describe('suspensionEnd()', () => {
  it('ends the suspension suspensionDays after the no-show that reached the limit', () => {
    const noShows = [at('2026-03-01T15:00:00Z'), at('2026-03-03T15:00:00Z'), at('2026-03-05T15:00:00Z')];
    expect(suspensionEnd(noShows, DEFAULT_RESERVATION_RULES)).toEqual(new Date(at('2026-03-05T15:00:00Z').getTime() + 7 * DAY));
  });
});

describe('reservationRulesInputSchema', () => {
  const input = { reservable: true, ...DEFAULT_RESERVATION_RULES };

  it('accepts the default rules', () => {
    expect(reservationRulesInputSchema.parse(input)).toEqual(input);
  });

  it('refuses a step that does not divide the 1,440 minutes of a day, and a maximum that is not whole steps', () => {
    expect(reservationRulesInputSchema.safeParse({ ...input, slotMinutes: 25 }).error?.issues[0]?.path).toEqual(['slotMinutes']);
    expect(reservationRulesInputSchema.safeParse({ ...input, slotMinutes: 30, maxMinutes: 100 }).error?.issues[0]?.path).toEqual(['maxMinutes']);
    expect(reservationRulesInputSchema.safeParse({ ...input, noShowLimit: 0 }).success).toBe(false);
  });
});
