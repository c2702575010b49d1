// Property tests of the clearance decision (fast-check property testing), against a small oracle
// written from product.md, The rules: clearance rules 1–8.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { ClearanceFacts, ClearanceSignOff } from './clearance';
import { evaluateClearance } from './clearance';
import { clearanceDecisionSchema } from './schemas';

const MINUTE = 60_000;
const DAY = 86_400_000;
const SELF = 'member-self';
const OTHER = 'member-other';
const TRAININGS = ['training-lathe', 'training-mill', 'training-mig'];

/** Which rules fail, read straight from the wording of the design, independently of the implementation. */
function failingRules(f: ClearanceFacts, now: Date): number[] {
  const t = now.getTime();
  const supervisorRole = f.member.role === 'instructor' || f.member.role === 'admin';
  const holds = (s: ClearanceSignOff) =>
    (s.revokedAt === null || s.revokedAt.getTime() > t) && (s.expiresAt === null || s.expiresAt.getTime() > t);
  const best = (trainingId: string) => {
    const held = f.signOffs.filter((s) => s.trainingId === trainingId && holds(s));
    if (held.length === 0) return 'none';
    return held.some((s) => s.level === 'independent') ? 'independent' : 'supervised';
  };
  const required = f.machine.requiredTrainings.map((r) => r.id);
  const protection = (f.machine.protectionMinutes ?? 15) * MINUTE;
  const failing = {
    1: !f.member.active || !f.member.waiverOnFile,
    2: required.some((id) => best(id) === 'none'),
    3: required.some((id) => best(id) === 'supervised') && f.supervisorOnDuty === null && !supervisorRole,
    4: f.machine.taggedOut !== null || f.machine.overdueBlockingTasks.length > 0,
    5: f.runningSession !== null && f.runningSession.memberId !== f.member.id,
    6: f.upcomingReservations.some(
      (r) => r.memberId !== f.member.id && !r.released && (r.heldUntil ?? r.startsAt).getTime() >= t && r.startsAt.getTime() <= t + protection,
    ),
    7: !f.shopHours.open && !supervisorRole,
    8:
      (f.policies.overdueCheckoutBlockDays !== null &&
        f.policies.overdueCheckouts.some((c) => t - c.dueAt.getTime() > (f.policies.overdueCheckoutBlockDays ?? 0) * DAY)) ||
      (f.policies.balanceLimitCents !== null && f.policies.balanceCents > f.policies.balanceLimitCents),
  };
  return Object.entries(failing)
    .filter(([, fails]) => fails)
    .map(([rule]) => Number(rule));
}

const failedRungs = (f: ClearanceFacts, now: Date) =>
  evaluateClearance(f, now)
    .rungs.filter((r) => !r.passed)
    .map((r) => r.rule)
    .sort((a, b) => a - b);

const nowArb = fc.date({ min: new Date('2020-01-01T00:00:00Z'), max: new Date('2035-12-31T00:00:00Z'), noInvalidDate: true });
/** Offsets from now, with the boundaries of the rules drawn often. */
const offsetArb = fc.oneof(
  fc.constantFrom(0, -1, 1, 15 * MINUTE, 15 * MINUTE + 1, -DAY, -3 * DAY - 1),
  fc.integer({ min: -60 * 24 * 90, max: 60 * 24 * 90 }).map((m) => m * MINUTE),
);
const at = (now: Date, offset: number) => new Date(now.getTime() + offset);
const roleArb = fc.constantFrom('member' as const, 'instructor' as const, 'admin' as const);
const timeZoneArb = fc.constantFrom('UTC', 'America/Chicago', 'Europe/Berlin', 'Pacific/Auckland');
const firstNameArb = fc.constantFrom('Odile', 'Tobias', 'Bettina', 'Ines', 'Wren');

/** Any facts at all, good or bad, around a random instant. */
const anyScenarioArb = fc
  .record({
    now: nowArb,
    timeZone: timeZoneArb,
    role: roleArb,
    active: fc.boolean(),
    waiverOnFile: fc.boolean(),
    required: fc.subarray(TRAININGS),
    teachers: fc.array(firstNameArb, { maxLength: 3 }),
    nextClass: fc.option(offsetArb),
    signOffs: fc.array(
      fc.record({
        trainingId: fc.constantFrom(...TRAININGS),
        level: fc.constantFrom('supervised' as const, 'independent' as const),
        expires: fc.option(offsetArb),
        revoked: fc.option(offsetArb, { freq: 3 }),
      }),
      { maxLength: 6 },
    ),
    supervisor: fc.option(firstNameArb),
    taggedOut: fc.option(fc.constant('Chuck guard cracked'), { freq: 3 }),
    tasks: fc.array(fc.constantFrom('Change the headstock oil', 'Check the way wipers'), { maxLength: 2 }),
    protectionMinutes: fc.option(fc.integer({ min: 0, max: 60 }), { nil: undefined }),
    session: fc.option(fc.record({ memberId: fc.constantFrom(SELF, OTHER), startedAt: offsetArb })),
    reservations: fc.array(
      fc.record({
        memberId: fc.constantFrom(SELF, OTHER),
        startsAt: offsetArb,
        released: fc.boolean(),
        heldFor: fc.option(fc.nat({ max: 120 * MINUTE }), { nil: undefined }),
      }),
      { maxLength: 3 },
    ),
    open: fc.boolean(),
    blockDays: fc.option(fc.integer({ min: 0, max: 10 })),
    checkouts: fc.array(fc.record({ itemName: fc.constantFrom('micrometer', 'boring bar'), dueAt: offsetArb }), { maxLength: 2 }),
    balanceLimitCents: fc.option(fc.integer({ min: 0, max: 5_000 })),
    balanceCents: fc.integer({ min: 0, max: 10_000 }),
  })
  .map((s) => {
    const facts: ClearanceFacts = {
      timeZone: s.timeZone,
      member: { id: SELF, firstName: 'Wren', role: s.role, active: s.active, waiverOnFile: s.waiverOnFile },
      machine: {
        id: 'machine-1',
        name: 'Lathe 1',
        requiredTrainings: s.required.map((id) => ({
          id,
          name: `Course ${id}`,
          teachers: s.teachers,
          nextClass: s.nextClass === null ? null : { startsAt: at(s.now, s.nextClass) },
        })),
        taggedOut: s.taggedOut === null ? null : { reason: s.taggedOut, since: at(s.now, -3_600_000) },
        overdueBlockingTasks: s.tasks.map((name) => ({ name })),
        protectionMinutes: s.protectionMinutes,
      },
      signOffs: s.signOffs.map((o) => ({
        trainingId: o.trainingId,
        level: o.level,
        expiresAt: o.expires === null ? null : at(s.now, o.expires),
        revokedAt: o.revoked === null ? null : at(s.now, o.revoked),
      })),
      supervisorOnDuty: s.supervisor === null ? null : { firstName: s.supervisor },
      runningSession:
        s.session === null
          ? null
          : { memberId: s.session.memberId, memberFirstName: 'Odile', startedAt: at(s.now, -Math.abs(s.session.startedAt)) },
      upcomingReservations: s.reservations.map(({ heldFor, ...r }) => ({
        ...r,
        startsAt: at(s.now, r.startsAt),
        ...(heldFor === undefined ? {} : { heldUntil: at(s.now, r.startsAt + heldFor) }),
      })),
      shopHours: { open: s.open, opensAt: at(s.now, 8 * 60 * MINUTE), closesAt: at(s.now, -60 * MINUTE) },
      policies: {
        overdueCheckoutBlockDays: s.blockDays,
        overdueCheckouts: s.checkouts.map((c) => ({ itemName: c.itemName, dueAt: at(s.now, c.dueAt) })),
        balanceLimitCents: s.balanceLimitCents,
        balanceCents: s.balanceCents,
      },
    };
    return { facts, now: s.now };
  });

/** Facts under which every rule holds, with harmless noise (lapsed sign-offs beside valid ones, far-off reservations). */
const goodScenarioArb = fc
  .record({
    now: nowArb,
    timeZone: timeZoneArb,
    role: roleArb,
    required: fc.subarray(TRAININGS),
    validFor: fc.option(fc.integer({ min: 1, max: 400 * DAY })),
    staleSignOffs: fc.array(fc.record({ trainingId: fc.constantFrom(...TRAININGS), ago: fc.integer({ min: 0, max: 400 * DAY }) }), {
      maxLength: 3,
    }),
    supervisor: fc.option(firstNameArb),
    ownSession: fc.boolean(),
    protectionMinutes: fc.option(fc.integer({ min: 0, max: 60 }), { nil: undefined }),
    farReservation: fc.integer({ min: 61 * MINUTE, max: 14 * DAY }),
    pastReservation: fc.integer({ min: 1, max: DAY }),
    blockDays: fc.option(fc.integer({ min: 0, max: 10 })),
    balanceLimitCents: fc.option(fc.integer({ min: 0, max: 5_000 })),
  })
  .map((s) => {
    const blockDays = s.blockDays ?? 0;
    const facts: ClearanceFacts = {
      timeZone: s.timeZone,
      member: { id: SELF, firstName: 'Wren', role: s.role, active: true, waiverOnFile: true },
      machine: {
        id: 'machine-1',
        name: 'Lathe 1',
        requiredTrainings: s.required.map((id) => ({ id, name: `Course ${id}`, teachers: ['Tobias'], nextClass: null })),
        taggedOut: null,
        overdueBlockingTasks: [],
        protectionMinutes: s.protectionMinutes,
      },
      signOffs: [
        ...s.required.map((trainingId) => ({
          trainingId,
          level: 'independent' as const,
          expiresAt: s.validFor === null ? null : at(s.now, s.validFor),
          revokedAt: null,
        })),
        ...s.staleSignOffs.map((o) => ({ trainingId: o.trainingId, level: 'independent' as const, expiresAt: at(s.now, -o.ago), revokedAt: null })),
      ],
      supervisorOnDuty: s.supervisor === null ? null : { firstName: s.supervisor },
      runningSession: s.ownSession ? { memberId: SELF, memberFirstName: 'Wren', startedAt: at(s.now, -20 * MINUTE) } : null,
      upcomingReservations: [
        { memberId: SELF, startsAt: at(s.now, 5 * MINUTE), released: false },
        { memberId: OTHER, startsAt: at(s.now, 5 * MINUTE), released: true },
        { memberId: OTHER, startsAt: at(s.now, s.farReservation), released: false },
        { memberId: OTHER, startsAt: at(s.now, -s.pastReservation), released: false },
      ],
      shopHours: { open: true },
      policies: {
        overdueCheckoutBlockDays: s.blockDays,
        overdueCheckouts: s.blockDays === null ? [] : [{ itemName: 'micrometer', dueAt: at(s.now, -blockDays * DAY) }],
        balanceLimitCents: s.balanceLimitCents,
        balanceCents: s.balanceLimitCents ?? 0,
      },
    };
    return { facts, now: s.now };
  });

type Breakage = { rule: number; apply: (f: ClearanceFacts, now: Date) => void };

/** One failing condition each, from the wording of one rule; applied to a copy of good facts. */
const breakageArb: fc.Arbitrary<Breakage> = fc.oneof(
  fc.constant<Breakage>({ rule: 1, apply: (f) => void (f.member.active = false) }),
  fc.constant<Breakage>({ rule: 1, apply: (f) => void (f.member.waiverOnFile = false) }),
  fc.constantFrom<'missing' | 'expired' | 'revoked'>('missing', 'expired', 'revoked').map<Breakage>((kind) => ({
    rule: 2,
    apply: (f, now) => {
      f.machine.requiredTrainings.push({ id: 'training-new', name: 'TIG welding safety' });
      if (kind === 'expired') f.signOffs.push({ trainingId: 'training-new', level: 'independent', expiresAt: now, revokedAt: null });
      if (kind === 'revoked') f.signOffs.push({ trainingId: 'training-new', level: 'independent', expiresAt: null, revokedAt: now });
    },
  })),
  fc.constant<Breakage>({
    rule: 3,
    apply: (f) => {
      f.member.role = 'member';
      f.supervisorOnDuty = null;
      f.machine.requiredTrainings.push({ id: 'training-new', name: 'TIG welding safety' });
      f.signOffs.push({ trainingId: 'training-new', level: 'supervised', expiresAt: null, revokedAt: null });
    },
  }),
  fc.constant<Breakage>({ rule: 4, apply: (f) => void (f.machine.taggedOut = { reason: 'Spindle bearing noise.', since: new Date(0) }) }),
  fc.constant<Breakage>({ rule: 4, apply: (f) => void f.machine.overdueBlockingTasks.push({ name: 'Change the headstock oil' }) }),
  fc.constant<Breakage>({
    rule: 5,
    apply: (f, now) => void (f.runningSession = { memberId: OTHER, memberFirstName: 'Odile', startedAt: at(now, -MINUTE) }),
  }),
  fc.double({ min: 0, max: 1, noNaN: true }).map<Breakage>((share) => ({
    rule: 6,
    apply: (f, now) => {
      const window = (f.machine.protectionMinutes ?? 15) * MINUTE;
      f.upcomingReservations.push({ memberId: OTHER, startsAt: at(now, Math.floor(share * window)), released: false });
    },
  })),
  fc.constant<Breakage>({
    rule: 7,
    apply: (f) => {
      f.member.role = 'member';
      f.shopHours = { open: false };
    },
  }),
  fc.integer({ min: 0, max: 10 }).map<Breakage>((blockDays) => ({
    rule: 8,
    apply: (f, now) => {
      f.policies.overdueCheckoutBlockDays = blockDays;
      f.policies.overdueCheckouts = [{ itemName: 'boring bar', dueAt: at(now, -blockDays * DAY - 1) }];
    },
  })),
  fc.integer({ min: 0, max: 5_000 }).map<Breakage>((limit) => ({
    rule: 8,
    apply: (f) => {
      f.policies.balanceLimitCents = limit;
      f.policies.balanceCents = limit + 1;
    },
  })),
);

describe('evaluateClearance() properties', () => {
  it('is never cleared while any rule fails, and is cleared when none does', () => {
    fc.assert(
      fc.property(anyScenarioArb, ({ facts, now }) => {
        const decision = evaluateClearance(facts, now);
        expect(decision.cleared).toBe(failingRules(facts, now).length === 0);
        expect(decision.cleared).toBe(decision.reasons.length === 0);
      }),
      { numRuns: 500 },
    );
  });

  it('names every failing rule among its reasons, and only those, with the failing rungs first', () => {
    fc.assert(
      fc.property(anyScenarioArb, ({ facts, now }) => {
        const decision = clearanceDecisionSchema.parse(evaluateClearance(facts, now));
        const expected = failingRules(facts, now);

        expect([...new Set(decision.reasons.map((r) => r.rule))]).toEqual(expected);
        expect(failedRungs(facts, now)).toEqual(expected);
        const firstPassing = decision.rungs.findIndex((r) => r.passed);
        expect(decision.rungs.slice(firstPassing === -1 ? decision.rungs.length : firstPassing).every((r) => r.passed)).toBe(true);
        for (const rung of decision.rungs) expect(rung.reasons.every((r) => r.rule === rung.rule)).toBe(true);
      }),
      { numRuns: 500 },
    );
  });

  it('clears good facts, and one failing condition added makes exactly its own rule fail', () => {
    fc.assert(
      fc.property(goodScenarioArb, breakageArb, ({ facts, now }, breakage) => {
        expect(evaluateClearance(facts, now).cleared).toBe(true);

        const broken = structuredClone(facts);
        breakage.apply(broken, now);

        expect(failingRules(broken, now)).toEqual([breakage.rule]);
        expect(failedRungs(broken, now)).toEqual([breakage.rule]);
        expect(evaluateClearance(broken, now).cleared).toBe(false);
      }),
      { numRuns: 500 },
    );
  });

  it('gives the same answer for the same facts and leaves the facts untouched', () => {
    fc.assert(
      fc.property(anyScenarioArb, ({ facts, now }) => {
        const before = structuredClone(facts);
        const nowBefore = now.getTime();

        const first = evaluateClearance(facts, now);
        const second = evaluateClearance(facts, now);

        expect(second).toEqual(first);
        expect(facts).toEqual(before);
        expect(now.getTime()).toBe(nowBefore);
      }),
    );
  });
});
