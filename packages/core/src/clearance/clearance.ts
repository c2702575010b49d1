import type { Role } from '../people/roles';
import { signOffState } from '../trainings/expiry';
import type { SignOffLevel } from '../trainings/schemas';
import type { ClearanceCode, ClearanceDecision, ClearanceReason, ClearanceRule, ClearanceRung } from './schemas';
import { clearanceRules, clearanceRuleTitles } from './schemas';

export * from './schemas';

export const DEFAULT_PROTECTION_MINUTES = 15;

export interface RequiredTraining {
  id: string;
  name: string;
  /** First names of the instructors who teach it, to say whom to ask. */
  teachers?: string[];
  nextClass?: { startsAt: Date } | null;
}

export interface ClearanceSignOff {
  trainingId: string;
  level: SignOffLevel;
  expiresAt: Date | null;
  revokedAt: Date | null;
}

/**
 * Everything the decision needs, as plain data. The server gathers it (one or two queries) and
 * decides itself whether the shop is open by its hours and closures in the shop's time zone, so
 * that this function stays pure.
 */
export interface ClearanceFacts {
  /** The shop's IANA time zone, for the times in messages. */
  timeZone: string;
  member: { id: string; firstName: string; role: Role; active: boolean; waiverOnFile: boolean };
  machine: {
    id: string;
    name: string;
    requiredTrainings: RequiredTraining[];
    /** The open tag-out: its reason and since when. */
    taggedOut: { reason: string; since: Date } | null;
    overdueBlockingTasks: { name: string }[];
    protectionMinutes?: number;
  };
  /** The member's sign-offs for the machine's required trainings, in any state. */
  signOffs: ClearanceSignOff[];
  supervisorOnDuty: { firstName: string } | null;
  runningSession: { memberId: string; memberFirstName: string; startedAt: Date } | null;
  /**
   * `heldUntil`: a reservation that has begun goes on protecting the machine until then (the end of
   * a checked-in one, the end of the no-show grace of one not checked in yet); without it, a
   * reservation protects the machine only until it starts.
   */
  upcomingReservations: { memberId: string; startsAt: Date; released: boolean; heldUntil?: Date }[];
  /** As `shopHoursAt` in shop/hours.ts answers it; `closure` is the closure covering today, if one does. */
  shopHours: { open: boolean; opensAt?: Date | null; closesAt?: Date | null; closure?: { reason: string } | null };
  /** Both limits are off (null) unless the shop sets them. */
  policies: {
    overdueCheckoutBlockDays: number | null;
    overdueCheckouts: { itemName: string; dueAt: Date }[];
    balanceLimitCents: number | null;
    balanceCents: number;
    /** ISO 4217 code for showing amounts; without it amounts are shown as plain numbers. */
    currency?: string;
  };
}

const MINUTE = 60_000;
const DAY = 86_400_000;

/**
 * Whether a member may start on a machine at `now`: rules 1–8 of the design, every failing one
 * with its reasons and the next step, and the whole rule ladder for the station to show.
 */
export function evaluateClearance(facts: ClearanceFacts, now: Date): ClearanceDecision {
  const say = new Wording(facts.timeZone, now);
  const checks: Record<ClearanceRule, ClearanceReason[]> = {
    1: membership(facts),
    2: signOffs(facts, now, say),
    3: supervision(facts, now),
    4: machineInService(facts),
    5: machineFree(facts, say),
    6: reservations(facts, now, say),
    7: shopOpen(facts, say),
    8: cribAndBalance(facts, now, say),
  };
  const ladder: ClearanceRung[] = clearanceRules.map((rule) => ({
    rule,
    title: clearanceRuleTitles[rule],
    passed: checks[rule].length === 0,
    reasons: checks[rule],
  }));
  const reasons = ladder.flatMap((rung) => rung.reasons);
  return {
    cleared: reasons.length === 0,
    reasons,
    rungs: [...ladder.filter((r) => !r.passed), ...ladder.filter((r) => r.passed)],
  };
}

function reason(rule: ClearanceRule, code: ClearanceCode, message: string, nextStep: string): ClearanceReason {
  return { code, rule, message, nextStep };
}

const isSupervisor = (role: Role) => role === 'instructor' || role === 'admin';

function membership({ member }: ClearanceFacts): ClearanceReason[] {
  const out: ClearanceReason[] = [];
  if (!member.active) {
    out.push(reason(1, 'membership_inactive', 'Your membership is not active.', 'Ask an admin to renew or reactivate your membership.'));
  }
  if (!member.waiverOnFile) {
    out.push(
      reason(1, 'waiver_missing', 'There is no safety waiver on file for you.', 'Accept the safety waiver on your profile in the web app, or ask an admin.'),
    );
  }
  return out;
}

/** The member's sign-offs for one training that hold at `now`, revoked and lapsed ones left out. */
function validSignOffs(facts: ClearanceFacts, trainingId: string, now: Date): ClearanceSignOff[] {
  return facts.signOffs.filter((s) => s.trainingId === trainingId && ['valid', 'expiring'].includes(signOffState(s, now)));
}

function signOffs(facts: ClearanceFacts, now: Date, say: Wording): ClearanceReason[] {
  return facts.machine.requiredTrainings.flatMap((training) => {
    if (validSignOffs(facts, training.id, now).length > 0) return [];
    const held = facts.signOffs.filter((s) => s.trainingId === training.id);
    const ask = `${teachersOf(training)} about ${training.name}`;
    const lapsed = held.filter((s) => signOffState(s, now) === 'expired');
    // A lapsed sign-off only needs renewing, so it is named before a revoked one.
    if (lapsed.length > 0) {
      const lastExpiry = Math.max(...lapsed.map((s) => s.expiresAt?.getTime() ?? 0));
      return [
        reason(
          2,
          'sign_off_expired',
          `Your sign-off for ${training.name} lapsed on ${say.date(new Date(lastExpiry))}.`,
          `Ask ${ask} to renew it; ${say.nextClass(training)}.`,
        ),
      ];
    }
    if (held.length > 0) {
      return [
        reason(
          2,
          'sign_off_revoked',
          `Your sign-off for ${training.name} was withdrawn by an instructor.`,
          `Talk to ${ask} before you use this machine again; ${say.nextClass(training)}.`,
        ),
      ];
    }
    return [
      reason(2, 'sign_off_missing', `You have no sign-off for ${training.name}.`, `Ask ${ask}; ${say.nextClass(training)}.`),
    ];
  });
}

function supervision(facts: ClearanceFacts, now: Date): ClearanceReason[] {
  // An instructor or admin is the supervisor for their own work.
  if (facts.supervisorOnDuty || isSupervisor(facts.member.role)) return [];
  const supervisedOnly = facts.machine.requiredTrainings.filter((training) => {
    const valid = validSignOffs(facts, training.id, now);
    return valid.length > 0 && valid.every((s) => s.level === 'supervised');
  });
  if (supervisedOnly.length === 0) return [];
  return [
    reason(
      3,
      'supervisor_required',
      `Your sign-off for ${listOf(supervisedOnly.map((t) => t.name), 'and')} lets you work only while a supervisor is on duty, and no one is on duty now.`,
      'Ask an instructor or admin to go on duty at a station, then scan again.',
    ),
  ];
}

function machineInService({ machine }: ClearanceFacts): ClearanceReason[] {
  const out: ClearanceReason[] = [];
  if (machine.taggedOut) {
    out.push(
      reason(
        4,
        'tagged_out',
        `${machine.name} is tagged out: ${machine.taggedOut.reason}`,
        'Use another machine. Only an admin or the person who tagged it out can clear the tag.',
      ),
    );
  }
  for (const task of machine.overdueBlockingTasks) {
    out.push(
      reason(
        4,
        'maintenance_overdue',
        `Maintenance is overdue on ${machine.name}: ${task.name}.`,
        'Tell an admin or the supervisor on duty; the machine can be used again once the task is done.',
      ),
    );
  }
  return out;
}

function machineFree({ member, machine, runningSession }: ClearanceFacts, say: Wording): ClearanceReason[] {
  if (!runningSession || runningSession.memberId === member.id) return [];
  const who = runningSession.memberFirstName;
  return [
    reason(
      5,
      'machine_in_use',
      `${who} has been working on ${machine.name} since ${say.time(runningSession.startedAt)}.`,
      `Wait until ${who} ends the session, or choose another machine.`,
    ),
  ];
}

function reservations({ member, machine, upcomingReservations }: ClearanceFacts, now: Date, say: Wording): ClearanceReason[] {
  const windowEnd = now.getTime() + (machine.protectionMinutes ?? DEFAULT_PROTECTION_MINUTES) * MINUTE;
  const soon = upcomingReservations
    .filter((r) => r.memberId !== member.id && !r.released)
    .filter((r) => (r.heldUntil ?? r.startsAt).getTime() >= now.getTime() && r.startsAt.getTime() <= windowEnd)
    .sort((a, b) => a.startsAt.getTime() - b.startsAt.getTime());
  const first = soon[0];
  if (!first) return [];
  return [
    reason(
      6,
      'reservation_soon',
      `Someone else has reserved ${machine.name} from ${say.time(first.startsAt)}.`,
      'Choose another machine, or reserve a time of your own in the web app.',
    ),
  ];
}

function shopOpen({ member, shopHours }: ClearanceFacts, say: Wording): ClearanceReason[] {
  if (shopHours.open || isSupervisor(member.role)) return [];
  const message = shopHours.closure
    ? `The shop is closed today: ${sentence(shopHours.closure.reason)}`
    : shopHours.closesAt
      ? `The shop closed at ${say.when(shopHours.closesAt)}.`
      : 'The shop is closed now.';
  const nextStep = shopHours.opensAt
    ? `Come back when the shop opens, ${say.when(shopHours.opensAt)}.`
    : 'Come back during opening hours.';
  return [reason(7, 'shop_closed', message, nextStep)];
}

function cribAndBalance({ policies }: ClearanceFacts, now: Date, say: Wording): ClearanceReason[] {
  const out: ClearanceReason[] = [];
  const blockDays = policies.overdueCheckoutBlockDays;
  if (blockDays !== null) {
    for (const checkout of policies.overdueCheckouts) {
      if (now.getTime() - checkout.dueAt.getTime() > blockDays * DAY) {
        out.push(
          reason(
            8,
            'crib_overdue',
            `The ${checkout.itemName} you borrowed was due back on ${say.date(checkout.dueAt)}.`,
            'Bring it back to the tool crib; you can start once it is checked in.',
          ),
        );
      }
    }
  }
  if (policies.balanceLimitCents !== null && policies.balanceCents > policies.balanceLimitCents) {
    out.push(
      reason(
        8,
        'balance_due',
        `You owe ${money(policies.balanceCents, policies.currency)}, more than the shop’s limit of ${money(policies.balanceLimitCents, policies.currency)}.`,
        'Pay your balance in the web app or at the front desk, then scan again.',
      ),
    );
  }
  return out;
}

function money(cents: number, currency: string | undefined): string {
  const amount = cents / 100;
  return currency
    ? new Intl.NumberFormat('en', { style: 'currency', currency, currencyDisplay: 'narrowSymbol' }).format(amount)
    : amount.toFixed(2);
}

/** An admin's wording ends with a full stop, whether or not they typed one. */
function sentence(text: string): string {
  const trimmed = text.trim();
  return /[.!?]$/.test(trimmed) ? trimmed : `${trimmed}.`;
}

/** "Tobias", "Tobias or Bettina", "Tobias, Bettina or Ines". */
function listOf(items: string[], joiner: 'and' | 'or'): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} ${joiner} ${items[items.length - 1]}`;
}

function teachersOf(training: RequiredTraining): string {
  return training.teachers && training.teachers.length > 0 ? listOf(training.teachers, 'or') : 'an instructor';
}

/** Times and dates in the shop's time zone, worded simply: "9:00 today", "Saturday 9:00", "14 March". */
/**
 * Building an Intl.DateTimeFormat costs far more than using one, and a decision is made on every
 * scan: one per time zone, made when a message first needs a time.
 */
const dateFormats = new Map<string, Intl.DateTimeFormat>();
function dateFormat(timeZone: string): Intl.DateTimeFormat {
  let format = dateFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-GB', {
      timeZone,
      weekday: 'long',
      day: 'numeric',
      month: 'long',
      year: 'numeric',
      hour: 'numeric',
      minute: '2-digit',
      hourCycle: 'h23',
    });
    dateFormats.set(timeZone, format);
  }
  return format;
}

/** The English month names the en-GB format writes, in order, to number a month from its name. */
const monthNames = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];

interface LocalParts {
  weekday: string;
  day: string;
  month: string;
  year: string;
  hour: string;
  minute: string;
  /** Days since 1970-01-01 of the date on the shop's calendar, to count calendar days between two instants. */
  dayNumber: number;
}

/**
 * Each instant is read off the shop's wall clock once (formatToParts is the costly part of wording
 * a time). The instants scans word recur from scan to scan (the shop's opening time, a
 * reservation's start, a sign-off's expiry), so the readings are kept across decisions; a time
 * zone's rules do not change while the process runs. The cache is emptied when it grows large.
 */
const wallReadings = new Map<string, LocalParts>();
const WALL_READINGS_KEPT = 2_000;

function wallReading(timeZone: string, date: Date): LocalParts {
  const key = `${timeZone} ${date.getTime()}`;
  const known = wallReadings.get(key);
  if (known) return known;
  const found: Partial<Record<Intl.DateTimeFormatPartTypes, string>> = {};
  for (const part of dateFormat(timeZone).formatToParts(date)) found[part.type] = part.value;
  const parts: LocalParts = {
    weekday: found.weekday ?? '',
    day: found.day ?? '',
    month: found.month ?? '',
    year: found.year ?? '',
    hour: String(Number(found.hour ?? '0')),
    minute: found.minute ?? '',
    dayNumber: Date.UTC(Number(found.year), monthNames.indexOf(found.month ?? ''), Number(found.day)) / DAY,
  };
  if (wallReadings.size >= WALL_READINGS_KEPT) wallReadings.clear();
  wallReadings.set(key, parts);
  return parts;
}

class Wording {
  constructor(
    private readonly timeZone: string,
    private readonly now: Date,
  ) {}

  private local(date: Date): LocalParts {
    return wallReading(this.timeZone, date);
  }

  private daysAhead(date: Date): number {
    return this.local(date).dayNumber - this.local(this.now).dayNumber;
  }

  /** "14:05", with the day added when it is not today. */
  time(date: Date): string {
    return this.daysAhead(date) === 0 ? this.clock(date) : this.when(date);
  }

  /** "9:00 today", "Saturday 9:00" within the week, otherwise "Saturday 14 March, 9:00". */
  when(date: Date): string {
    const p = this.local(date);
    const days = this.daysAhead(date);
    if (days === 0) return `${this.clock(date)} today`;
    if (days > 0 && days < 7) return `${p.weekday} ${this.clock(date)}`;
    return `${p.weekday} ${p.day} ${p.month}${p.year === this.local(this.now).year ? '' : ` ${p.year}`}, ${this.clock(date)}`;
  }

  /** "14 March 2026". */
  date(date: Date): string {
    const p = this.local(date);
    return `${p.day} ${p.month} ${p.year}`;
  }

  nextClass(training: RequiredTraining): string {
    return training.nextClass ? `the next class is ${this.when(training.nextClass.startsAt)}` : 'no class is on the calendar yet';
  }

  private clock(date: Date): string {
    const p = this.local(date);
    return `${p.hour}:${p.minute}`;
  }
}
