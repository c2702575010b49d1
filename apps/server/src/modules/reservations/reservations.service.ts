import {
  can,
  quotaWeeks,
  reservationRefusal,
  RESERVATION_LIST_PAGE_SIZE,
  toCsv,
  type Availability,
  type AvailabilityQuery,
  type MyReservation,
  type MyReservations,
  type Reservation,
  type MachineReservationRules,
  type ReservationCreate,
  type ReservationList,
  type ReservationListItem,
  type ReservationListQuery,
  type ReservationRulesInput,
} from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { AppError, conflict, EXCLUSION_VIOLATION, notFound, pgCode } from '../../lib/errors';
import { auditLog } from '../audit/audit.repository';
import { shopRepository } from '../shop/shop.repository';
import { reservationMail } from './reservation-mail';
import { releaseReservation } from './reservation-release';
import { reservationsRepository, type ReservationListRecord, type ReservationRecord } from './reservations.repository';

const MINUTE = 60_000;
const DAY = 86_400_000;
/** The most rows one CSV export holds. */
const CSV_EXPORT_LIMIT = 100_000;
/** How many of a member's reservations their own list shows. */
const MINE_LIMIT = 200;

const machineNotFound = () => notFound('machine_not_found', 'There is no machine with that id.');
const reservationNotFound = () => notFound('reservation_not_found', 'There is no reservation of yours with that id.');

const toListItem = (row: ReservationListRecord): ReservationListItem => ({
  id: row.id,
  machine: { id: row.machineId, name: row.machineName },
  member: { id: row.memberId, firstName: row.memberFirstName, lastName: row.memberLastName },
  start: row.startsAt.toISOString(),
  end: row.endsAt.toISOString(),
  status: row.status,
  kind: row.kind,
});

const toReservation = (row: ReservationRecord): Reservation => ({
  id: row.id,
  machineId: row.machineId,
  start: row.startsAt.toISOString(),
  end: row.endsAt.toISOString(),
  status: row.status,
});

/**
 * Reservations of machine time. The rules in core judge each request; the database's exclusion
 * constraint alone decides an overlap, so two requests racing for one slot cannot both land.
 */
export function reservationsService(deps: Deps) {
  const { db, live } = deps;
  const mail = reservationMail(deps);
  return {
    async create(actor: Express.User, input: ReservationCreate, now = new Date()): Promise<Reservation> {
      const created = await db.transaction(async (trx) => {
        const repository = reservationsRepository(trx);
        const machine = await repository.machine(input.machineId);
        if (!machine) throw machineNotFound();
        await repository.lockMember(actor.id);

        const shop = shopRepository(trx);
        const { timeZone } = await shop.get();
        const weeks = quotaWeeks(input, timeZone);
        const requiredTrainings = await repository.requiredTrainings(machine.id);
        const { rules } = machine;
        // Yesterday's closures too: a closure is whole days of the shop's calendar, which may be behind UTC.
        const closuresFrom = new Date(input.start.getTime() - DAY).toISOString().slice(0, 10);
        // One after the other: a transaction's connection runs one query at a time.
        const weekly = await shop.weeklyHours();
        const closures = await shop.closuresFrom(closuresFrom);
        const signOffs = await repository.signOffs(actor.id, requiredTrainings.map((t) => t.id));
        const memberReservations = await repository.memberClaims(machine.id, actor.id, weeks[0]!.start, weeks.at(-1)!.end);
        const noShows = await repository.noShowsSince(machine.id, actor.id, new Date(now.getTime() - (rules.noShowWindowDays + rules.suspensionDays) * DAY));

        const refusal = reservationRefusal(
          {
            timeZone,
            machine: { name: machine.name, reservable: machine.reservable, rules, requiredTrainings },
            signOffs,
            hours: { weekly, closures },
            memberReservations,
            noShows,
          },
          input,
          now,
        );
        if (refusal) throw conflict(refusal.code, refusal.message);

        let row: ReservationRecord;
        try {
          row = await repository.insert({
            machineId: machine.id,
            memberId: actor.id,
            start: input.start,
            end: input.end,
            blockedUntil: new Date(input.end.getTime() + rules.bufferMinutes * MINUTE),
          });
        } catch (error) {
          if (pgCode(error) === EXCLUSION_VIOLATION) throw conflict('overlap', `The ${machine.name} is already reserved for part of that time. Choose another slot.`);
          throw error;
        }
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'reservation.created',
          entity: 'reservation',
          entityId: row.id,
          memberId: actor.id,
          details: { machineId: machine.id, machineName: machine.name, start: row.startsAt.toISOString(), end: row.endsAt.toISOString() },
        });
        return row;
      });
      live.machineChanged(created.machineId);
      await mail.send('confirmation', created.id, now);
      return toReservation(created);
    },

    /** A member cancels their own live reservation before it ends; an admin may cancel anyone's. */
    async cancel(actor: Express.User, id: string, now = new Date()): Promise<void> {
      const cancelled = await db.transaction(async (trx) => {
        const repository = reservationsRepository(trx);
        const row = await repository.findForUpdate(id);
        const mayCancel = row && (can(actor.role, 'cancel:reservation:any') || (row.memberId === actor.id && can(actor.role, 'cancel:reservation:own')));
        // Someone else's reservation reads as unknown: ids of others' reservations are never shown.
        if (!row || !mayCancel) throw reservationNotFound();
        // A class meeting belongs to its class: cancelling it there keeps the class's record whole.
        if (row.kind === 'class') throw conflict('class_meeting', 'This time is held for a class; cancel the meeting from the class instead.');
        if (row.status !== 'active' || row.endsAt.getTime() <= now.getTime()) {
          throw conflict('not_cancellable', 'Only a reservation that is still to come, and not checked into, can be cancelled.');
        }
        await repository.cancel(row.id);
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'reservation.cancelled',
          entity: 'reservation',
          entityId: row.id,
          memberId: row.memberId,
          details: { machineId: row.machineId, start: row.startsAt.toISOString(), end: row.endsAt.toISOString() },
        });
        return row;
      });
      live.machineChanged(cancelled.machineId);
      await mail.send('cancellation', cancelled.id, now);
    },

    /**
     * The holder gives back the rest of a reservation they checked into, so others may reserve or
     * walk up to the machine. Only the holder: the time is theirs to give, and an admin who wants
     * it back cancels instead, before the check-in.
     */
    async release(actor: Express.User, id: string, now = new Date()): Promise<Reservation> {
      const released = await db.transaction(async (trx) => {
        const row = await reservationsRepository(trx).findForUpdate(id);
        if (!row) throw notFound('reservation_not_found', 'There is no reservation with that id.');
        if (row.memberId !== actor.id) throw new AppError(403, 'not_yours', 'Only the member who holds this reservation can release it.');
        if (row.status !== 'checked_in' || row.endsAt.getTime() <= now.getTime()) {
          throw conflict('not_releasable', 'Only a reservation you have checked into at the station, and that has not ended, can be released.');
        }
        return releaseReservation(trx, row, actor.id, now, 'web');
      });
      live.machineChanged(released.machineId);
      return toReservation(released);
    },

    /** Upcoming: live claims not yet over, soonest first. Past: everything else, latest first. */
    async mine(actor: Express.User, now = new Date()): Promise<MyReservations> {
      const rows = await reservationsRepository(db).ofMember(actor.id, MINE_LIMIT);
      const upcoming: MyReservation[] = [];
      const past: MyReservation[] = [];
      for (const row of rows) {
        const item = { ...toReservation(row), machineName: row.machineName, kind: row.kind, classTitle: row.classTitle };
        const live = row.status === 'active' || row.status === 'checked_in';
        if (live && row.endsAt.getTime() > now.getTime()) upcoming.unshift(item);
        else past.push(item);
      }
      return { upcoming, past };
    },

    /** Whether the machine can be reserved and its booking rules, for the admins' form. */
    async rules(machineId: string): Promise<MachineReservationRules> {
      const machine = await reservationsRepository(db).machine(machineId);
      if (!machine) throw machineNotFound();
      return { machineId, reservable: machine.reservable, rules: machine.rules };
    },

    /** An admin sets whether the machine can be reserved and its rules; claims already made keep their buffer. */
    async setRules(actor: Express.User, machineId: string, input: ReservationRulesInput): Promise<MachineReservationRules> {
      return db.transaction(async (trx) => {
        const repository = reservationsRepository(trx);
        const before = await repository.machineForUpdate(machineId);
        if (!before) throw machineNotFound();
        await repository.updateRules(machineId, input);
        const after = await repository.machine(machineId);
        if (!after) throw new Error(`machine ${machineId} vanished while locked`);
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'machine.reservation_rules_changed',
          entity: 'machine',
          entityId: machineId,
          details: { before: { reservable: before.reservable, ...before.rules }, after: { reservable: after.reservable, ...after.rules } },
        });
        return { machineId, reservable: after.reservable, rules: after.rules };
      });
    },

    /** Admins' list of everyone's reservations, a page at a time. */
    async list(query: ReservationListQuery): Promise<ReservationList> {
      const { items, total } = await reservationsRepository(db).list(query, { limit: RESERVATION_LIST_PAGE_SIZE, offset: (query.page - 1) * RESERVATION_LIST_PAGE_SIZE });
      return { items: items.map(toListItem), total, page: query.page, pageSize: RESERVATION_LIST_PAGE_SIZE };
    },

    /** The same filters as the list, every match in one RFC 4180 file. */
    async exportCsv(query: ReservationListQuery): Promise<string> {
      const { items } = await reservationsRepository(db).list(query, { limit: CSV_EXPORT_LIMIT, offset: 0 });
      return toCsv(items.map(toListItem), [
        { header: 'Start', value: (r: ReservationListItem) => r.start },
        { header: 'End', value: (r) => r.end },
        { header: 'Machine', value: (r) => r.machine.name },
        { header: 'First name', value: (r) => r.member.firstName },
        { header: 'Last name', value: (r) => r.member.lastName },
        { header: 'Status', value: (r) => r.status },
        { header: 'Kind', value: (r) => r.kind },
        { header: 'Reservation id', value: (r) => r.id },
        { header: 'Machine id', value: (r) => r.machine.id },
        { header: 'Member id', value: (r) => r.member.id },
      ]);
    },

    /** The machine's taken time in a range, naming no one, and the rules a request must meet. */
    async availability(machineId: string, query: AvailabilityQuery): Promise<Availability> {
      const repository = reservationsRepository(db);
      const machine = await repository.machine(machineId);
      if (!machine) throw machineNotFound();
      const [{ timeZone }, taken] = await Promise.all([shopRepository(db).get(), repository.taken(machineId, query.from, query.to)]);
      return {
        machineId,
        reservable: machine.reservable,
        timeZone,
        from: query.from.toISOString(),
        to: query.to.toISOString(),
        rules: machine.rules,
        taken: taken.map((range) => ({
          start: range.startsAt.toISOString(),
          end: range.endsAt.toISOString(),
          blockedUntil: range.blockedUntil.toISOString(),
          kind: range.kind,
          ...(range.classTitle ? { title: range.classTitle } : {}),
        })),
      };
    },
  };
}
