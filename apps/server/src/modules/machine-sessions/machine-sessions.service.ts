import {
  badgeCodeSchema,
  checkInOpen,
  dayRailBounds,
  evaluateClearance,
  HEARTBEAT_SILENCE_MINUTES,
  OFFLINE_END_MAX_HOURS,
  shopHoursAt,
  unknownBadgeReason,
  type ClearanceFacts,
  type ScanReservation as ScanReservationAnswer,
  type SessionEnd,
  type SessionEnded,
  type SessionStart,
  type SessionStarted,
  type StationScanResult,
  type StationState,
} from '@chuckkey/core';
import { badgeCodeHash } from '@chuckkey/db';
import type { Deps } from '../../lib/deps';
import { AppError, badRequest, conflict, notFound, pgCode, UNIQUE_VIOLATION } from '../../lib/errors';
import { badgesService } from '../badges/badges.service';
import type { DenialRecorder } from '../reports/denial-recorder';
import { denialsOfScan } from '../reports/denials-of-scan';
import { releaseReservation } from '../reservations/reservation-release';
import { reservationsRepository } from '../reservations/reservations.repository';
import { grantToken, grantValid } from '../../lib/tokens';
import { stationsRepository, type StationRecord } from '../stations/stations.repository';
import { machineSessionsRepository, type EndedBy, type ScanFacts, type ScanReservation, type SessionRecord } from './machine-sessions.repository';

const SUPERVISING_ROLES = new Set(['instructor', 'admin']);
const HOUR_MS = 3_600_000;
/** A station's clock may run a little ahead of the server's; an end "from the future" within this is taken as now. */
const CLOCK_SKEW_MS = 60_000;

export const notAMachineStation = () =>
  new AppError(403, 'not_a_machine_station', 'This station is not at a machine. Badges are scanned for machine work at the machine’s own station.');

export const machineNotFound = () =>
  notFound('machine_not_found', 'This station’s machine no longer exists. An admin can set the station up again.');

export const machineInUse = () =>
  conflict('machine_in_use', 'Someone else started a session on this machine a moment ago. Scan again to see who.');

function machineOf(station: StationRecord): string {
  if (station.kind !== 'machine' || !station.machineId) throw notAMachineStation();
  return station.machineId;
}

/** The badge's hash, or null for text that cannot be a badge code (it then finds no one). */
function hashOf(badge: string): string | null {
  const parsed = badgeCodeSchema.safeParse(badge);
  return parsed.success ? badgeCodeHash(parsed.data) : null;
}

/**
 * The balance facts are empty because the shop keeps no balances yet; the rule for them is
 * already in the decision. The open tag-out and the overdue blocking maintenance tasks (rule 4),
 * the reservations, and the shop's overdue-tool policy with the member's overdue crib tools (rule 8) are read with the other
 * facts. Whether the shop is open comes from its hours and closures, in its
 * time zone.
 *
 * Rule 6 protects the machine for its check-in window before a reservation starts (10 minutes
 * unless an admin sets another), not the 15 minutes the rule falls back to: that is the time in
 * which the holder can claim the machine at the station. A longer protection would leave the
 * machine idle for minutes in which neither a walk-up nor the holder may start, and one setting
 * that admins already see is easier to reason about than two.
 */
function clearanceFacts(facts: ScanFacts & { member: NonNullable<ScanFacts['member']> }, timeZone: string, now: Date): ClearanceFacts {
  return {
    timeZone,
    member: facts.member,
    machine: {
      id: facts.machine.id,
      name: facts.machine.name,
      requiredTrainings: facts.requiredTrainings.map((t) => ({ id: t.id, name: t.name, teachers: t.teachers, nextClass: t.nextClass && { startsAt: t.nextClass } })),
      taggedOut: facts.taggedOut,
      overdueBlockingTasks: facts.overdueBlockingTasks,
      protectionMinutes: facts.machine.checkInMinutes,
    },
    signOffs: facts.signOffs,
    supervisorOnDuty: facts.supervisorOnDuty,
    runningSession: facts.runningSession,
    // Only active and checked-in reservations are read, so none of them has been released. One
    // checked into holds the machine to its end; one not yet, to the end of its no-show grace.
    // A member booked into a class counts its hold as their own, as its instructor does (rule 6).
    upcomingReservations: facts.reservations.map((r) => ({
      memberId: r.bookedInClass ? facts.member.id : r.memberId,
      startsAt: r.startsAt,
      released: false,
      heldUntil: r.status === 'checked_in' ? r.endsAt : new Date(r.startsAt.getTime() + facts.machine.noShowGraceMinutes * 60_000),
    })),
    shopHours: shopHoursAt(facts.weeklyHours, facts.closures, timeZone, now),
    policies: { overdueCheckoutBlockDays: facts.overdueCheckoutBlockDays, overdueCheckouts: facts.overdueCheckouts, balanceLimitCents: null, balanceCents: 0 },
  };
}

/**
 * The reservation a station should speak of: of those the facts hold (starting no later than the
 * check-in window ahead), the earliest one not yet over.
 */
function nextReservation(facts: ScanFacts, now: Date): ScanReservation | null {
  return facts.reservations.find((r) => r.endsAt.getTime() > now.getTime()) ?? null;
}

function scanReservation(facts: ScanFacts, memberId: string | null, now: Date): ScanReservationAnswer | null {
  const next = nextReservation(facts, now);
  if (!next) return null;
  const own = memberId !== null && next.memberId === memberId;
  return {
    id: next.id,
    startsAt: next.startsAt.toISOString(),
    endsAt: next.endsAt.toISOString(),
    own,
    memberFirstName: next.memberFirstName,
    canCheckIn: own && next.status === 'active' && checkInOpen(next.startsAt, now, facts.machine),
  };
}

const toEnded = (session: SessionRecord): SessionEnded => ({
  id: session.id,
  startedAt: session.startedAt.toISOString(),
  endedAt: (session.endedAt ?? new Date()).toISOString(),
  hours: session.hours ?? 0,
});

/** A station may show the photo of a member who just scanned there, for five minutes. */
export const STATION_PHOTO_MINUTES = 5;
const photoSubject = (stationId: string, memberId: string) => `station-photo.${stationId}.${memberId}`;

export function stationPhotoGrant(secret: string, stationId: string, memberId: string, now: Date): string {
  return grantToken(secret, photoSubject(stationId, memberId), new Date(now.getTime() + STATION_PHOTO_MINUTES * 60_000));
}

export function stationPhotoAllowed(secret: string, stationId: string, memberId: string, token: string, now: Date): boolean {
  return grantValid(secret, photoSubject(stationId, memberId), token, now);
}

/** `denials` records refused scans for the usage review; without it (background jobs) none are kept. */
export function machineSessionsService(deps: Deps, { denials }: { denials?: DenialRecorder } = {}) {
  const { db, live } = deps;
  const sessions = machineSessionsRepository(db);
  const badges = badgesService(deps);

  async function load(machineId: string, codeHash: string | null, now: Date): Promise<ScanFacts> {
    const facts = await sessions.facts(machineId, codeHash, now);
    if (!facts) throw machineNotFound();
    return facts;
  }

  async function decide(station: StationRecord, badge: string, now: Date) {
    const facts = await load(machineOf(station), hashOf(badge), now);
    if (!facts.member) return { facts, member: null, decision: null };
    const decision = evaluateClearance(clearanceFacts({ ...facts, member: facts.member }, facts.timeZone, now), now);
    return { facts, member: facts.member, decision };
  }

  function scanResult(station: StationRecord, facts: ScanFacts, now: Date): StationScanResult {
    const member = facts.member;
    const decision = member ? evaluateClearance(clearanceFacts({ ...facts, member }, facts.timeZone, now), now) : null;
    // Queued only: the answer does not wait on the write.
    denials?.record(denialsOfScan(station.id, facts, decision, now));
    const running = facts.runningSession;
    const common = {
      requiresPin: facts.machine.requiresPin,
      safetyChecklist: facts.machine.safetyChecklist,
    };
    if (!member || !decision) {
      return {
        member: null,
        cleared: false,
        reasons: [unknownBadgeReason],
        rungs: [],
        canSupervise: false,
        runningSession: running ? { id: running.id, memberFirstName: running.memberFirstName, startedAt: running.startedAt.toISOString(), own: false } : null,
        nextReservation: scanReservation(facts, null, now),
        ...common,
      };
    }
    return {
      member: {
        id: member.id,
        firstName: member.firstName,
        role: member.role,
        hasPhoto: member.hasPhoto,
        photoToken: member.hasPhoto ? stationPhotoGrant(deps.config.SESSION_SECRET, station.id, member.id, now) : null,
      },
      cleared: decision.cleared,
      reasons: decision.reasons,
      rungs: decision.rungs,
      canSupervise: member.active && SUPERVISING_ROLES.has(member.role),
      runningSession: running
        ? { id: running.id, memberFirstName: running.memberFirstName, startedAt: running.startedAt.toISOString(), own: running.memberId === member.id }
        : null,
      nextReservation: scanReservation(facts, member.id, now),
      ...common,
    };
  }

  return {
    async scan(station: StationRecord, badge: string, now: Date): Promise<StationScanResult> {
      return scanResult(station, await load(machineOf(station), hashOf(badge), now), now);
    },

    /**
     * A scan in one round trip: finds the paired station by its device token hash together with the
     * facts. Undefined when no paired station holds the token.
     */
    async scanByDevice(deviceTokenHash: string, badge: string | null, now: Date): Promise<{ station: StationRecord; result: StationScanResult | null } | undefined> {
      const found = await sessions.stationFacts(deviceTokenHash, badge === null ? null : hashOf(badge), now);
      if (!found) return undefined;
      return {
        station: found.station,
        result: badge === null || found.station.kind !== 'machine' || !found.facts ? null : scanResult(found.station, found.facts, now),
      };
    },

    async start(station: StationRecord, input: SessionStart, now: Date): Promise<SessionStarted> {
      const { facts, member, decision } = await decide(station, input.badge, now);
      if (!member || !decision) {
        throw new AppError(409, 'not_cleared', unknownBadgeReason.message, { extensions: { reasons: [unknownBadgeReason] } });
      }
      if (!decision.cleared) {
        throw new AppError(409, 'not_cleared', decision.reasons.map((r) => r.message).join(' '), { extensions: { reasons: decision.reasons } });
      }
      const confirmed = new Set(input.checklist);
      const missing = facts.machine.safetyChecklist.filter((item) => !confirmed.has(item.id));
      if (missing.length > 0) {
        throw badRequest('checklist_incomplete', 'Confirm every safety item before you start.', { checklist: missing.map((item) => item.label) });
      }
      if (facts.machine.requiresPin && !(input.pin && (await badges.verifyPin(member.id, input.pin)))) {
        throw new AppError(401, 'wrong_pin', 'That PIN is not right. Try again.');
      }
      try {
        const session = await sessions.start({
          machineId: facts.machine.id,
          memberId: member.id,
          stationId: station.id,
          checklist: facts.machine.safetyChecklist,
        });
        live.machineChanged(session.machineId);
        return { id: session.id, startedAt: session.startedAt.toISOString(), member: { id: member.id, firstName: member.firstName } };
      } catch (error) {
        if (pgCode(error) === UNIQUE_VIOLATION) throw machineInUse();
        throw error;
      }
    },

    async end(station: StationRecord, sessionId: string, input: SessionEnd, now: Date): Promise<SessionEnded> {
      const machineId = machineOf(station);
      // Who holds the badge is settled before the transaction: it reads another table and hashes nothing slow.
      const holder = input.badge ? await badges.findMemberByCode(input.badge) : null;
      const { ended, changed } = await db.transaction(async (trx) => {
        const repo = machineSessionsRepository(trx);
        const session = await repo.findForUpdate(sessionId);
        if (!session || session.machineId !== machineId) throw notFound('session_not_found', 'There is no such session on this machine.');
        if (session.endIdempotencyKey === input.idempotencyKey) return { ended: toEnded(session), changed: false };
        if (session.endedAt) throw conflict('already_ended', 'This session has already ended.');
        if (await repo.findByEndKey(input.idempotencyKey)) {
          throw conflict('idempotency_key_reused', 'That idempotency key already ended another session. Send a new key for each end.');
        }

        let endedBy: EndedBy = 'member';
        if (input.badge) {
          if (holder?.id === session.memberId) endedBy = 'member';
          else if (holder && holder.active && SUPERVISING_ROLES.has(holder.role)) endedBy = holder.role === 'admin' ? 'admin' : 'supervisor';
          else throw new AppError(403, 'not_allowed', 'Only the member on the machine or a supervisor can end this session.');
        }

        const endedAt = input.endedAt ? new Date(input.endedAt) : now;
        if (endedAt.getTime() > now.getTime() + CLOCK_SKEW_MS) {
          throw badRequest('invalid_end_time', 'The end time is in the future.', { endedAt: ['The end time is in the future.'] });
        }
        if (endedAt.getTime() < session.startedAt.getTime()) {
          throw badRequest('invalid_end_time', 'The end time is before the session started.', { endedAt: ['The end time is before the start.'] });
        }
        if (now.getTime() - endedAt.getTime() > OFFLINE_END_MAX_HOURS * HOUR_MS) {
          throw badRequest('invalid_end_time', `An end time more than ${OFFLINE_END_MAX_HOURS} hours old is not taken. Ask an admin to correct the session.`, {
            endedAt: [`More than ${OFFLINE_END_MAX_HOURS} hours ago.`],
          });
        }
        const clamped = endedAt.getTime() > now.getTime() ? now : endedAt;
        const ended = toEnded(await repo.end(session.id, { endedAt: clamped, endedBy, idempotencyKey: input.idempotencyKey }));
        // The holder who stops while their checked-in reservation still runs is done with it: the rest
        // of the slot goes back to the shop. A supervisor stopping someone does not give their time away.
        if (endedBy === 'member') {
          const held = await reservationsRepository(trx).checkedInRunningForUpdate(machineId, session.memberId, clamped);
          if (held) await releaseReservation(trx, held, session.memberId, clamped, 'session_end');
        }
        return { ended, changed: true };
      });
      // A replayed end changed nothing, so there is nothing to announce.
      if (changed) live.machineChanged(machineId);
      return ended;
    },

    async state(station: StationRecord, now: Date): Promise<StationState> {
      const facts = await load(machineOf(station), null, now);
      const running = facts.runningSession;
      // The idle screen names the next reservation however far ahead it is, not only those the
      // scan looks at, so the state reads it on its own.
      const rail = dayRailBounds(now, facts.timeZone);
      const [next, today] = await Promise.all([sessions.nextReservation(facts.machine.id, now), sessions.reservationsBetween(facts.machine.id, rail.start, rail.end)]);
      return {
        machine: { id: facts.machine.id, name: facts.machine.name, category: facts.machine.category, requiresPin: facts.machine.requiresPin },
        runningSession: running
          ? { id: running.id, memberId: running.memberId, memberFirstName: running.memberFirstName, startedAt: running.startedAt.toISOString() }
          : null,
        supervisorOnDuty: facts.supervisorOnDuty,
        nextReservation: next
          ? { startsAt: next.startsAt.toISOString(), endsAt: next.endsAt.toISOString(), memberId: next.memberId, memberFirstName: next.memberFirstName }
          : null,
        today: today.map((r) => ({ startsAt: r.startsAt.toISOString(), endsAt: r.endsAt.toISOString(), kind: r.kind, memberFirstName: r.memberFirstName })),
        taggedOut: facts.taggedOut ? { reason: facts.taggedOut.reason, since: facts.taggedOut.since.toISOString() } : null,
      };
    },

    /**
     * Ends the sessions of stations silent for HEARTBEAT_SILENCE_MINUTES before `now`, at their last
     * contact: the member most likely stopped then, and the meter should not count the silence.
     * Their machines, and those of every station that has just gone silent, show offline now.
     */
    async closeSilentSessions(now: Date): Promise<{ id: string; machineId: string; endedAt: Date }[]> {
      const cutoff = new Date(now.getTime() - HEARTBEAT_SILENCE_MINUTES * 60_000);
      const closed = await sessions.closeSilent(cutoff);
      const silenced = await stationsRepository(db).markSilent(cutoff);
      for (const machineId of new Set([...closed.map((session) => session.machineId), ...silenced])) live.machineChanged(machineId);
      return closed;
    },
  };
}
export type MachineSessionsService = ReturnType<typeof machineSessionsService>;
