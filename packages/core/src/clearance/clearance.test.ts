// The behaviour checked here is that of product.md, The rules: clearance rules 1–8.
import { describe, expect, it } from 'vitest';
import { signOffExpiry } from '../trainings/expiry';
import type { ClearanceFacts } from './clearance';
import { evaluateClearance } from './clearance';
import { clearanceDecisionSchema, UNKNOWN_BADGE, unknownBadgeReason } from './schemas';

const TZ = 'America/Chicago';
// IANA time zone database: US daylight saving time starts on 8 March 2026, so on 12 March
// Chicago is UTC−5 (CDT) and 15:00 UTC is 10:00 on Thursday 12 March in the shop.
const NOW = new Date('2026-03-12T15:00:00Z');
const minutes = (n: number) => new Date(NOW.getTime() + n * 60_000);
const days = (n: number) => new Date(NOW.getTime() + n * 86_400_000);

const LATHE = 'training-lathe';
const CHUCK = 'training-chuck';

function facts(overrides: Partial<ClearanceFacts> = {}): ClearanceFacts {
  return {
    timeZone: TZ,
    member: { id: 'member-wren', firstName: 'Wren', role: 'member', active: true, waiverOnFile: true },
    machine: {
      id: 'machine-lathe-1',
      name: 'Lathe 1',
      requiredTrainings: [
        {
          id: LATHE,
          name: 'Metal lathe fundamentals',
          teachers: ['Tobias', 'Bettina'],
          // Saturday 14 March 2026, 9:00 CDT.
          nextClass: { startsAt: new Date('2026-03-14T14:00:00Z') },
        },
      ],
      taggedOut: null,
      overdueBlockingTasks: [],
    },
    signOffs: [{ trainingId: LATHE, level: 'independent', expiresAt: days(200), revokedAt: null }],
    supervisorOnDuty: null,
    runningSession: null,
    upcomingReservations: [],
    shopHours: { open: true },
    policies: { overdueCheckoutBlockDays: null, overdueCheckouts: [], balanceLimitCents: null, balanceCents: 0 },
    ...overrides,
  };
}

const withMember = (member: Partial<ClearanceFacts['member']>) => facts({ member: { ...facts().member, ...member } });
const withMachine = (machine: Partial<ClearanceFacts['machine']>) => facts({ machine: { ...facts().machine, ...machine } });
const codes = (f: ClearanceFacts, now = NOW) => evaluateClearance(f, now).reasons.map((r) => r.code);

describe('evaluateClearance()', () => {
  it('when every rule holds, the lathe clears the member and shows all eight rungs ticked', () => {
    const decision = evaluateClearance(facts(), NOW);

    expect(decision.cleared).toBe(true);
    expect(decision.reasons).toEqual([]);
    expect(decision.rungs.map((r) => r.rule)).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
    expect(decision.rungs.every((r) => r.passed && r.reasons.length === 0)).toBe(true);
    expect(clearanceDecisionSchema.parse(decision)).toEqual(decision);
  });

  describe('rule 1: membership and waiver', () => {
    it('when the membership has lapsed, the lathe refuses the member with membership_inactive', () => {
      expect(codes(withMember({ active: false }))).toEqual(['membership_inactive']);
    });

    it('when no waiver is on file, the lathe refuses the member with waiver_missing', () => {
      const decision = evaluateClearance(withMember({ waiverOnFile: false }), NOW);

      expect(decision.reasons).toEqual([
        {
          code: 'waiver_missing',
          rule: 1,
          message: 'There is no safety waiver on file for you.',
          nextStep: 'Accept the safety waiver on your profile in the web app, or ask an admin.',
        },
      ]);
    });

    it('when both fail, both reasons are given', () => {
      expect(codes(withMember({ active: false, waiverOnFile: false }))).toEqual(['membership_inactive', 'waiver_missing']);
    });
  });

  describe('rule 2: sign-offs', () => {
    it('when the member has never been signed off, the lathe says who teaches the training and when the next class is', () => {
      const decision = evaluateClearance(facts({ signOffs: [] }), NOW);

      expect(decision.cleared).toBe(false);
      expect(decision.reasons).toEqual([
        {
          code: 'sign_off_missing',
          rule: 2,
          message: 'You have no sign-off for Metal lathe fundamentals.',
          nextStep: 'Ask Tobias or Bettina about Metal lathe fundamentals; the next class is Saturday 9:00.',
        },
      ]);
    });

    it('when no one is listed to teach it and no class is planned, the next step says to ask an instructor', () => {
      const f = withMachine({ requiredTrainings: [{ id: LATHE, name: 'Metal lathe fundamentals', nextClass: null }] });

      const [reason] = evaluateClearance({ ...f, signOffs: [] }, NOW).reasons;

      expect(reason?.nextStep).toBe('Ask an instructor about Metal lathe fundamentals; no class is on the calendar yet.');
    });

    it('names three teachers as a list and a class more than a week away by its date', () => {
      const f = withMachine({
        requiredTrainings: [
          {
            id: LATHE,
            name: 'Metal lathe fundamentals',
            teachers: ['Tobias', 'Bettina', 'Ines'],
            // Saturday 28 March 2026, 9:30 CDT.
            nextClass: { startsAt: new Date('2026-03-28T14:30:00Z') },
          },
        ],
      });

      const [reason] = evaluateClearance({ ...f, signOffs: [] }, NOW).reasons;

      expect(reason?.nextStep).toBe(
        'Ask Tobias, Bettina or Ines about Metal lathe fundamentals; the next class is Saturday 28 March, 9:30.',
      );
    });

    it('when the lathe sign-off expired yesterday, the lathe refuses the member with sign_off_expired', () => {
      // Local midnight starting Wednesday 11 March 2026 in Chicago (CDT) is 05:00 UTC.
      const f = facts({ signOffs: [{ trainingId: LATHE, level: 'independent', expiresAt: new Date('2026-03-11T05:00:00Z'), revokedAt: null }] });

      const decision = evaluateClearance(f, NOW);

      expect(decision.reasons).toEqual([
        {
          code: 'sign_off_expired',
          rule: 2,
          message: 'Your sign-off for Metal lathe fundamentals lapsed on 11 March 2026.',
          nextStep: 'Ask Tobias or Bettina about Metal lathe fundamentals to renew it; the next class is Saturday 9:00.',
        },
      ]);
    });

    it('when an instructor revoked the sign-off, the lathe refuses the member with sign_off_revoked', () => {
      const f = facts({ signOffs: [{ trainingId: LATHE, level: 'independent', expiresAt: null, revokedAt: days(-3) }] });

      expect(codes(f)).toEqual(['sign_off_revoked']);
    });

    it('when the member holds a valid sign-off beside a revoked one, the valid one counts', () => {
      const f = facts({
        signOffs: [
          { trainingId: LATHE, level: 'independent', expiresAt: null, revokedAt: days(-300) },
          { trainingId: LATHE, level: 'independent', expiresAt: days(30), revokedAt: null },
        ],
      });

      expect(evaluateClearance(f, NOW).cleared).toBe(true);
    });

    it('when both a lapsed and a revoked sign-off are held, the lapsed one is named because renewing is the way back', () => {
      const f = facts({
        signOffs: [
          { trainingId: LATHE, level: 'independent', expiresAt: null, revokedAt: days(-300) },
          { trainingId: LATHE, level: 'independent', expiresAt: days(-1), revokedAt: null },
        ],
      });

      expect(codes(f)).toEqual(['sign_off_expired']);
    });

    it('when the machine needs two trainings and one is missing, only the missing one is named', () => {
      const f = withMachine({
        requiredTrainings: [
          ...facts().machine.requiredTrainings,
          { id: CHUCK, name: 'Four-jaw chuck setup', teachers: ['Ines'], nextClass: null },
        ],
      });

      const { reasons } = evaluateClearance(f, NOW);

      expect(reasons.map((r) => r.message)).toEqual(['You have no sign-off for Four-jaw chuck setup.']);
    });

    it('a sign-off that lapses at the instant of the scan counts as expired; one millisecond earlier it still holds', () => {
      const expiresAt = new Date('2026-03-12T15:00:00Z');
      const f = facts({ signOffs: [{ trainingId: LATHE, level: 'independent', expiresAt, revokedAt: null }] });

      expect(codes(f, expiresAt)).toEqual(['sign_off_expired']);
      expect(evaluateClearance(f, new Date(expiresAt.getTime() - 1)).cleared).toBe(true);
    });

    it('a one-month sign-off given on 31 January holds through the last minute of 28 February and lapses at the start of 1 March', () => {
      // Gregorian calendar: February 2026 has 28 days. Chicago is on CST (UTC−6) until 8 March 2026.
      const expiresAt = signOffExpiry(new Date('2026-01-31T18:00:00Z'), 1, TZ);
      const f = facts({ signOffs: [{ trainingId: LATHE, level: 'independent', expiresAt, revokedAt: null }] });
      const lastMinuteOfFebruary = new Date('2026-03-01T05:59:00Z');
      const startOfMarch = new Date('2026-03-01T06:00:00Z');

      expect(evaluateClearance(f, lastMinuteOfFebruary).cleared).toBe(true);
      const decision = evaluateClearance(f, startOfMarch);
      expect(decision.reasons.map((r) => r.code)).toEqual(['sign_off_expired']);
      expect(decision.reasons[0]?.message).toBe('Your sign-off for Metal lathe fundamentals lapsed on 1 March 2026.');
    });
  });

  describe('rule 3: supervision', () => {
    const supervised = [{ trainingId: LATHE, level: 'supervised' as const, expiresAt: days(90), revokedAt: null }];

    it('when the member holds only a supervised sign-off and no one is on duty, the lathe refuses with supervisor_required', () => {
      const decision = evaluateClearance(facts({ signOffs: supervised }), NOW);

      expect(decision.reasons).toEqual([
        {
          code: 'supervisor_required',
          rule: 3,
          message:
            'Your sign-off for Metal lathe fundamentals lets you work only while a supervisor is on duty, and no one is on duty now.',
          nextStep: 'Ask an instructor or admin to go on duty at a station, then scan again.',
        },
      ]);
    });

    it('when a supervisor is on duty, a supervised sign-off is enough', () => {
      expect(evaluateClearance(facts({ signOffs: supervised, supervisorOnDuty: { firstName: 'Ines' } }), NOW).cleared).toBe(true);
    });

    it('when the member is an instructor, they supervise themself', () => {
      const f = { ...withMember({ role: 'instructor' }), signOffs: supervised };

      expect(evaluateClearance(f, NOW).cleared).toBe(true);
    });

    it('when the member holds both levels, the independent one counts', () => {
      const f = facts({ signOffs: [...supervised, { trainingId: LATHE, level: 'independent', expiresAt: days(10), revokedAt: null }] });

      expect(evaluateClearance(f, NOW).cleared).toBe(true);
    });

    it('when the independent sign-off has lapsed and a supervised one still holds, a supervisor is needed', () => {
      const f = facts({ signOffs: [...supervised, { trainingId: LATHE, level: 'independent', expiresAt: days(-1), revokedAt: null }] });

      expect(codes(f)).toEqual(['supervisor_required']);
    });
  });

  describe('rule 4: tag-outs and maintenance', () => {
    it('when the lathe is tagged out, the lathe refuses with tagged_out and gives the reason on the tag', () => {
      const [reason] = evaluateClearance(withMachine({ taggedOut: { reason: 'Cross-slide gib is loose.', since: new Date(NOW.getTime() - 3_600_000) } }), NOW).reasons;

      expect(reason).toEqual({
        code: 'tagged_out',
        rule: 4,
        message: 'Lathe 1 is tagged out: Cross-slide gib is loose.',
        nextStep: 'Use another machine. Only an admin or the person who tagged it out can clear the tag.',
      });
    });

    it('when blocking maintenance tasks are overdue, each one is named', () => {
      const f = withMachine({ overdueBlockingTasks: [{ name: 'Change the headstock oil' }, { name: 'Check the way wipers' }] });

      expect(evaluateClearance(f, NOW).reasons.map((r) => [r.code, r.message])).toEqual([
        ['maintenance_overdue', 'Maintenance is overdue on Lathe 1: Change the headstock oil.'],
        ['maintenance_overdue', 'Maintenance is overdue on Lathe 1: Check the way wipers.'],
      ]);
    });
  });

  describe('rule 5: machine in use', () => {
    it('when someone else has a session running, the lathe says who is on it and since when', () => {
      const f = facts({ runningSession: { memberId: 'member-odile', memberFirstName: 'Odile', startedAt: minutes(-55) } });

      expect(evaluateClearance(f, NOW).reasons).toEqual([
        {
          code: 'machine_in_use',
          rule: 5,
          message: 'Odile has been working on Lathe 1 since 9:05.',
          nextStep: 'Wait until Odile ends the session, or choose another machine.',
        },
      ]);
    });

    it('when the running session is the member’s own, the machine counts as theirs', () => {
      const f = facts({ runningSession: { memberId: 'member-wren', memberFirstName: 'Wren', startedAt: minutes(-5) } });

      expect(evaluateClearance(f, NOW).cleared).toBe(true);
    });
  });

  describe('rule 6: reservations about to start', () => {
    const reservation = (startsAt: Date, more: Partial<{ memberId: string; released: boolean; heldUntil: Date }> = {}) => ({
      memberId: 'member-odile',
      released: false,
      startsAt,
      ...more,
    });

    it('when someone else’s reservation starts in ten minutes, the lathe refuses with reservation_soon', () => {
      const decision = evaluateClearance(facts({ upcomingReservations: [reservation(minutes(10))] }), NOW);

      expect(decision.reasons).toEqual([
        {
          code: 'reservation_soon',
          rule: 6,
          message: 'Someone else has reserved Lathe 1 from 10:10.',
          nextStep: 'Choose another machine, or reserve a time of your own in the web app.',
        },
      ]);
    });

    it('the window includes its last minute and nothing beyond it', () => {
      expect(codes(facts({ upcomingReservations: [reservation(minutes(15))] }))).toEqual(['reservation_soon']);
      expect(evaluateClearance(facts({ upcomingReservations: [reservation(new Date(minutes(15).getTime() + 1))] }), NOW).cleared).toBe(true);
    });

    it('uses the machine’s own protection window when it has one', () => {
      const f = { ...withMachine({ protectionMinutes: 30 }), upcomingReservations: [reservation(minutes(25))] };

      expect(codes(f)).toEqual(['reservation_soon']);
    });

    it('ignores the member’s own reservation, released ones and ones that have already started', () => {
      const f = facts({
        upcomingReservations: [
          reservation(minutes(5), { memberId: 'member-wren' }),
          reservation(minutes(5), { released: true }),
          reservation(minutes(-1)),
        ],
      });

      expect(evaluateClearance(f, NOW).cleared).toBe(true);
    });

    // product.md: a reservation not checked into by its start plus the grace is released; until
    // then, and through a checked-in reservation, the machine stays its holder's.
    it('a reservation that has begun protects the machine until it is held, and not after', () => {
      expect(codes(facts({ upcomingReservations: [reservation(minutes(-5), { heldUntil: minutes(10) })] }))).toEqual(['reservation_soon']);
      expect(codes(facts({ upcomingReservations: [reservation(minutes(-5), { heldUntil: minutes(0) })] }))).toEqual(['reservation_soon']);
      expect(evaluateClearance(facts({ upcomingReservations: [reservation(minutes(-5), { heldUntil: minutes(-1) })] }), NOW).cleared).toBe(true);
    });
  });

  describe('rule 7: opening hours', () => {
    const closed = { open: false, closesAt: new Date('2026-03-12T02:00:00Z'), opensAt: new Date('2026-03-12T22:00:00Z') };

    it('when the shop is closed, a member is refused with shop_closed and told when it opens', () => {
      expect(evaluateClearance(facts({ shopHours: closed }), NOW).reasons).toEqual([
        {
          code: 'shop_closed',
          rule: 7,
          message: 'The shop closed at Wednesday 11 March, 21:00.',
          nextStep: 'Come back when the shop opens, 17:00 today.',
        },
      ]);
    });

    it('when a closure covers today, the member is told its reason and the next opening', () => {
      // Saturday 14 March 2026, 9:00 CDT (IANA tz database: UTC−5 after 8 March).
      const closure = { open: false, opensAt: new Date('2026-03-14T14:00:00Z'), closesAt: null, closure: { reason: 'Winter deep clean' } };

      expect(evaluateClearance(facts({ shopHours: closure }), NOW).reasons).toEqual([
        {
          code: 'shop_closed',
          rule: 7,
          message: 'The shop is closed today: Winter deep clean.',
          nextStep: 'Come back when the shop opens, Saturday 9:00.',
        },
      ]);
      expect(evaluateClearance(facts({ shopHours: { ...closure, closure: { reason: 'Stocktaking!' } } }), NOW).reasons[0]?.message).toBe(
        'The shop is closed today: Stocktaking!',
      );
    });

    it('when the shop is closed and no hours are known, the member is told to come back during opening hours', () => {
      expect(evaluateClearance(facts({ shopHours: { open: false } }), NOW).reasons[0]).toMatchObject({
        message: 'The shop is closed now.',
        nextStep: 'Come back during opening hours.',
      });
    });

    it('instructors and admins may work outside opening hours', () => {
      expect(evaluateClearance({ ...withMember({ role: 'instructor' }), shopHours: closed }, NOW).cleared).toBe(true);
      expect(evaluateClearance({ ...withMember({ role: 'admin' }), shopHours: closed }, NOW).cleared).toBe(true);
    });
  });

  describe('rule 8: tool crib and balance', () => {
    const overdue = [{ itemName: 'telescoping bore gauge set', dueAt: days(-4) }];

    it('with both policies off, overdue tools and a balance do not block', () => {
      const f = facts({ policies: { overdueCheckoutBlockDays: null, overdueCheckouts: overdue, balanceLimitCents: null, balanceCents: 99_000 } });

      expect(evaluateClearance(f, NOW).cleared).toBe(true);
    });

    it('when a tool is overdue past the shop’s limit, the lathe refuses with crib_overdue', () => {
      const f = facts({ policies: { overdueCheckoutBlockDays: 3, overdueCheckouts: overdue, balanceLimitCents: null, balanceCents: 0 } });

      expect(evaluateClearance(f, NOW).reasons).toEqual([
        {
          code: 'crib_overdue',
          rule: 8,
          message: 'The telescoping bore gauge set you borrowed was due back on 8 March 2026.',
          nextStep: 'Bring it back to the tool crib; you can start once it is checked in.',
        },
      ]);
    });

    it('a tool overdue by exactly the limit does not block yet', () => {
      const f = facts({ policies: { overdueCheckoutBlockDays: 4, overdueCheckouts: overdue, balanceLimitCents: null, balanceCents: 0 } });

      expect(evaluateClearance(f, NOW).cleared).toBe(true);
    });

    it('when the unpaid balance is past the shop’s limit, the lathe refuses with balance_due', () => {
      const f = facts({
        policies: { overdueCheckoutBlockDays: null, overdueCheckouts: [], balanceLimitCents: 2_000, balanceCents: 2_550, currency: 'USD' },
      });

      expect(evaluateClearance(f, NOW).reasons).toEqual([
        {
          code: 'balance_due',
          rule: 8,
          message: 'You owe $25.50, more than the shop’s limit of $20.00.',
          nextStep: 'Pay your balance in the web app or at the front desk, then scan again.',
        },
      ]);
    });

    it('a balance equal to the limit does not block, and without a currency amounts are plain numbers', () => {
      const policies = { overdueCheckoutBlockDays: null, overdueCheckouts: [], balanceLimitCents: 2_000, balanceCents: 2_000 };

      expect(evaluateClearance(facts({ policies }), NOW).cleared).toBe(true);
      expect(evaluateClearance(facts({ policies: { ...policies, balanceCents: 2_001 } }), NOW).reasons[0]?.message).toBe(
        'You owe 20.01, more than the shop’s limit of 20.00.',
      );
    });
  });

  it('returns every failing reason together, in rule order, with the failing rungs first', () => {
    const f = {
      ...withMember({ active: false }),
      machine: { ...facts().machine, taggedOut: { reason: 'Spindle bearing noise.', since: new Date(NOW.getTime() - 3_600_000) } },
      shopHours: { open: false },
    };

    const decision = evaluateClearance(f, NOW);

    expect(decision.cleared).toBe(false);
    expect(decision.reasons.map((r) => [r.rule, r.code])).toEqual([
      [1, 'membership_inactive'],
      [4, 'tagged_out'],
      [7, 'shop_closed'],
    ]);
    expect(decision.rungs.map((r) => [r.rule, r.passed])).toEqual([
      [1, false],
      [4, false],
      [7, false],
      [2, true],
      [3, true],
      [5, true],
      [6, true],
      [8, true],
    ]);
    expect(decision.rungs[0]?.title).toBe('Membership active and safety waiver on file');
  });

  it('offers the unknown-badge reason for the server to answer with when a badge belongs to no one', () => {
    expect(unknownBadgeReason.code).toBe(UNKNOWN_BADGE);
    expect(UNKNOWN_BADGE).toBe('unknown_badge');
  });
});
