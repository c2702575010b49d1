import type {
  SignOff,
  StationDutyResult,
  StationInstructorResult,
  StationMemberLookupResult,
  StationSelf,
  StationSignOff,
} from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { AppError, badRequest, notFound } from '../../lib/errors';
import { hashToken, randomToken } from '../../lib/tokens';
import { auditLog } from '../audit/audit.repository';
import { badgesService } from '../badges/badges.service';
import { dutyService } from '../duty/duty.service';
import { membersRepository, toUser } from '../members/members.repository';
import { shopRepository } from '../shop/shop.repository';
import { signOffsService } from '../sign-offs/sign-offs.service';
import { stationsRepository, type StationRecord } from '../stations/stations.repository';
import { pairingCodeHash } from '../stations/stations.service';
import { trainingsRepository } from '../trainings/trainings.repository';

/**
 * A 4-digit PIN has only 10,000 values, so tries are limited where the PIN is typed: per
 * instructor wherever they try, and per station for whoever tries there (several instructors
 * share a station, so it allows a few more). Common practice, no published source for the numbers.
 */
export const PIN_WINDOW_MINUTES = 15;
export const PIN_FAILURES_PER_INSTRUCTOR = 5;
export const PIN_FAILURES_PER_STATION = 10;

const TEACHING_ROLES = new Set(['instructor', 'admin']);

export function stationService(deps: Deps) {
  const { config, db } = deps;
  const stations = stationsRepository(db);
  const badges = badgesService(deps);
  const members = membersRepository(db);
  const signOffs = signOffsService(deps);

  /** The instructor or admin holding this badge, once their PIN is right. */
  async function verifyInstructor(station: StationRecord, badge: string, pin: string): Promise<Express.User> {
    const holder = await badges.findMemberByCode(badge);
    if (!holder) throw new AppError(401, 'unknown_badge', 'This badge is not known here. Scan it again, or ask an admin for a new card.');
    if (!holder.active || !TEACHING_ROLES.has(holder.role)) {
      throw new AppError(403, 'not_instructor', 'Only an instructor or an admin can do this at a station.');
    }
    const failures = await stations.recentPinFailures(station.id, holder.id, PIN_WINDOW_MINUTES);
    if (failures.member >= PIN_FAILURES_PER_INSTRUCTOR || failures.station >= PIN_FAILURES_PER_STATION) {
      throw new AppError(429, 'too_many_pin_attempts', `Too many wrong PINs. Wait ${PIN_WINDOW_MINUTES} minutes, then try again.`, {
        headers: { 'Retry-After': String(PIN_WINDOW_MINUTES * 60) },
      });
    }
    if (!(await stations.hasPin(holder.id))) {
      throw new AppError(401, 'pin_not_set', 'You have no PIN yet. Set one under Profile in the web app, then try again.');
    }
    const right = await badges.verifyPin(holder.id, pin);
    await stations.recordPinAttempt(station.id, holder.id, right);
    if (!right) throw new AppError(401, 'wrong_pin', 'That PIN is not right. Try again.');
    const record = await members.findById(holder.id);
    if (!record) throw new AppError(401, 'unknown_badge', 'This badge is not known here.');
    return toUser(record);
  }

  return {
    /** Uses the code and hands back the device token; only its SHA-256 is kept. */
    async pair(pairingCode: string): Promise<{ token: string; stationId: string }> {
      const token = randomToken();
      const paired = await db.transaction(async (trx) => {
        const station = await stationsRepository(trx).pair(pairingCodeHash(config.SESSION_SECRET, pairingCode), hashToken(token));
        if (!station) return undefined;
        await auditLog(trx).record({ actorId: null, action: 'station.paired', entity: 'station', entityId: station.id });
        return station;
      });
      // One answer for a wrong, expired or used code, so trying codes tells nothing about them.
      if (!paired) throw badRequest('invalid_pairing_code', 'That pairing code is wrong, expired or already used. Ask an admin for a new one.');
      // A freshly paired station reports on its machine from now on (it may have shown offline).
      if (paired.machineId) deps.live.machineChanged(paired.machineId);
      return { token, stationId: paired.id };
    },

    async self(stationId: string): Promise<StationSelf> {
      const station = await stations.findById(stationId);
      if (!station) throw notFound('station_not_found', 'There is no station with that id.');
      const shop = await shopRepository(db).get();
      return {
        id: station.id,
        kind: station.kind,
        name: station.name,
        shopName: shop.name,
        machine:
          station.machineId && station.machineName && station.machineCategory
            ? { id: station.machineId, name: station.machineName, category: station.machineCategory, requiresPin: Boolean(station.machineRequiresPin) }
            : null,
      };
    },

    async instructor(station: StationRecord, badge: string, pin: string): Promise<StationInstructorResult> {
      const instructor = await verifyInstructor(station, badge, pin);
      const trainings = (await trainingsRepository(db).list()).filter((training) => training.active);
      // The trainings this machine requires come first: they are what is taught at it.
      const here = (machineIds: string[]) => (station.machineId && machineIds.includes(station.machineId) ? 0 : 1);
      trainings.sort((a, b) => here(a.machineIds) - here(b.machineIds));
      return { instructor: { id: instructor.id, firstName: instructor.firstName }, trainings };
    },

    async lookupMember(badge: string): Promise<StationMemberLookupResult> {
      const holder = await badges.findMemberByCode(badge);
      if (!holder) return { member: null, reason: 'unknown_badge' };
      if (!holder.active) return { member: null, reason: 'member_inactive' };
      return { member: { id: holder.id, firstName: holder.firstName, role: holder.role } };
    },

    /** An instructor or admin goes on duty, or off it, with their badge and PIN. */
    async duty(station: StationRecord, badge: string, pin: string): Promise<StationDutyResult> {
      const supervisor = await verifyInstructor(station, badge, pin);
      return dutyService(deps).toggle(supervisor);
    },

    /** The instructor's badge and PIN are checked again: the station keeps no signed-in person. */
    async signOff(station: StationRecord, input: StationSignOff): Promise<SignOff> {
      const instructor = await verifyInstructor(station, input.instructorBadge, input.pin);
      const member = await badges.findMemberByCode(input.memberBadge);
      if (!member) throw notFound('member_not_found', 'No member holds a badge with that code. Scan the member’s badge again.');
      return signOffs.create(
        instructor,
        { memberId: member.id, trainingId: input.trainingId, level: input.level, checklist: input.checklist, note: input.note },
        'station',
      );
    },
  };
}
export type StationService = ReturnType<typeof stationService>;
