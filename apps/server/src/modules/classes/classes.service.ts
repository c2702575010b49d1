import {
  can,
  CLASS_LIST_DEFAULT_WEEKS,
  classRrule,
  outsideHours,
  weeklyOccurrences,
  type ClassCreate,
  type ClassDetail,
  type ClassList,
  type ClassListQuery,
  type ClassMembersInput,
} from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { AppError, badRequest, conflict, EXCLUSION_VIOLATION, notFound, pgCode } from '../../lib/errors';
import { auditLog } from '../audit/audit.repository';
import { reservationsRepository } from '../reservations/reservations.repository';
import { shopRepository } from '../shop/shop.repository';
import { classesRepository, type ClassMemberRecord, type ClassRecord, type OccurrenceRecord } from './classes.repository';

const MINUTE = 60_000;
const DAY = 86_400_000;

const classNotFound = () => notFound('class_not_found', 'There is no class with that id.');
const occurrenceNotFound = () => notFound('occurrence_not_found', 'That class has no meeting with that id.');
const notYours = () => new AppError(403, 'not_yours', 'Only the instructor who holds this class, or an admin, can cancel it.');
const classCancelled = () => conflict('class_cancelled', 'This class has been cancelled.');

/** "Saturday 12 December 2026" on the shop's calendar, for naming the meeting that was refused. */
function meetingDate(instant: Date, timeZone: string): string {
  return new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'long', day: 'numeric', month: 'long', year: 'numeric' }).format(instant).replace(',', '');
}

/** Members' names are for those who run classes; a member learns only whether they are in it and how full it is. */
const seesMembers = (actor: Express.User) => can(actor.role, 'manage:class:any');

function toDetail(row: ClassRecord, occurrences: OccurrenceRecord[], members: ClassMemberRecord[], actor: Express.User): ClassDetail {
  return {
    id: row.id,
    title: row.title,
    machineId: row.machineId,
    machineName: row.machineName,
    trainingId: row.trainingId,
    trainingName: row.trainingName,
    instructor: { id: row.instructorId, firstName: row.instructorFirstName },
    weeks: row.weeks,
    rrule: row.rrule,
    capacity: row.capacity,
    cancelledAt: row.cancelledAt ? row.cancelledAt.toISOString() : null,
    occurrences: occurrences.map((o) => ({ reservationId: o.reservationId, startsAt: o.startsAt.toISOString(), endsAt: o.endsAt.toISOString(), status: o.status })),
    ...(seesMembers(actor) ? { members: members.map((m) => ({ id: m.id, firstName: m.firstName, lastName: m.lastName })) } : {}),
    memberCount: members.length,
    booked: members.some((m) => m.id === actor.id),
  };
}

/**
 * Classes: an instructor's hold of a machine, once or weekly. Every meeting is a reservation of
 * kind 'class', so the reservations' exclusion constraint alone decides an overlap, and a class
 * is stored whole or not at all.
 */
export function classesService(deps: Deps) {
  const { db, live } = deps;

  async function detail(id: string, actor: Express.User, trx = db): Promise<ClassDetail> {
    const repository = classesRepository(trx);
    const row = await repository.find(id);
    if (!row) throw classNotFound();
    // One after the other: inside a transaction both would wait for its one connection anyway.
    const occurrences = await repository.occurrences([id]);
    const members = await repository.members([id]);
    return toDetail(row, occurrences, members, actor);
  }

  async function checkMembers(repository: ReturnType<typeof classesRepository>, memberIds: readonly string[], capacity: number | null): Promise<void> {
    if (capacity !== null && memberIds.length > capacity) {
      throw badRequest('over_capacity', `The class has room for ${capacity} members; ${memberIds.length} were given.`, {
        memberIds: [`At most ${capacity} members.`],
      });
    }
    const known = await repository.activeMembers(memberIds);
    const unknown = memberIds.filter((id) => !known.has(id));
    if (unknown.length > 0) {
      throw badRequest('member_not_found', 'Some of the members given are not active members of the shop.', { memberIds: unknown.map((id) => `No active member ${id}.`) });
    }
  }

  return {
    async create(actor: Express.User, input: ClassCreate, now = new Date()): Promise<ClassDetail> {
      if (input.start.getTime() <= now.getTime()) {
        throw badRequest('in_the_past', 'The first meeting must start in the future.', { start: ['Choose a start in the future.'] });
      }
      const created = await db.transaction(async (trx) => {
        const repository = classesRepository(trx);
        const machine = await reservationsRepository(trx).machine(input.machineId);
        if (!machine) throw notFound('machine_not_found', 'There is no machine with that id.');
        if (input.trainingId && !(await repository.trainingExists(input.trainingId))) {
          throw badRequest('training_not_found', 'There is no training with that id.', { trainingId: ['Choose a training, or none.'] });
        }
        await checkMembers(repository, input.memberIds, input.capacity);

        const shop = shopRepository(trx);
        const { timeZone } = await shop.get();
        const meetings = weeklyOccurrences(input, input.weeks, timeZone);
        // Yesterday's closures too: a closure is whole days of the shop's calendar, which may be behind UTC.
        const weekly = await shop.weeklyHours();
        const closures = await shop.closuresFrom(new Date(input.start.getTime() - DAY).toISOString().slice(0, 10));
        for (const meeting of meetings) {
          const reason = outsideHours({ timeZone, hours: { weekly, closures } }, meeting);
          if (reason) {
            throw new AppError(409, 'outside_hours', `The meeting on ${meetingDate(meeting.start, timeZone)} is outside the shop's hours. ${reason}`, {
              extensions: { occurrence: meeting.start.toISOString() },
            });
          }
        }

        const rrule = classRrule(input.weeks);
        const classId = await repository.insertClass({
          title: input.title,
          machineId: machine.id,
          trainingId: input.trainingId,
          instructorId: actor.id,
          start: input.start,
          end: input.end,
          weeks: input.weeks,
          rrule,
          capacity: input.capacity,
        });
        for (const meeting of meetings) {
          try {
            await repository.insertOccurrence({
              classId,
              machineId: machine.id,
              instructorId: actor.id,
              start: meeting.start,
              end: meeting.end,
              blockedUntil: new Date(meeting.end.getTime() + machine.rules.bufferMinutes * MINUTE),
            });
          } catch (error) {
            // The failed insert aborts the transaction, so nothing of the class is stored.
            if (pgCode(error) === EXCLUSION_VIOLATION) {
              throw new AppError(409, 'overlap', `The ${machine.name} is already reserved during the meeting on ${meetingDate(meeting.start, timeZone)}. No meeting of the class was stored.`, {
                extensions: { occurrence: meeting.start.toISOString() },
              });
            }
            throw error;
          }
        }
        await repository.addMembers(classId, input.memberIds, actor.id);
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'class.created',
          entity: 'class',
          entityId: classId,
          details: {
            title: input.title,
            machineId: machine.id,
            machineName: machine.name,
            trainingId: input.trainingId,
            start: input.start.toISOString(),
            end: input.end.toISOString(),
            weeks: input.weeks,
            rrule,
            capacity: input.capacity,
            memberIds: input.memberIds,
          },
        });
        return detail(classId, actor, trx);
      });
      live.machineChanged(created.machineId);
      return created;
    },

    async get(actor: Express.User, id: string): Promise<ClassDetail> {
      return detail(id, actor);
    },

    /** Classes with a meeting in the range (from now for eight weeks unless asked), each with its meetings in it. */
    async list(actor: Express.User, query: ClassListQuery, now = new Date()): Promise<ClassList> {
      const from = query.from ?? now;
      const to = query.to ?? new Date(from.getTime() + CLASS_LIST_DEFAULT_WEEKS * 7 * DAY);
      if (to.getTime() <= from.getTime()) throw badRequest('validation_failed', 'The end of the range must come after its start.', { to: ['The end of the range must come after its start.'] });
      const repository = classesRepository(db);
      const rows = await repository.inRange(from, to);
      const ids = rows.map((row) => row.id);
      const [occurrences, members] = await Promise.all([repository.occurrences(ids, { from, to }), repository.members(ids)]);
      const classes = rows
        .map((row) =>
          toDetail(
            row,
            occurrences.filter((o) => o.classId === row.id),
            members.filter((m) => m.classId === row.id),
            actor,
          ),
        )
        .sort((a, b) => (a.occurrences[0]?.startsAt ?? '').localeCompare(b.occurrences[0]?.startsAt ?? ''));
      return { from: from.toISOString(), to: to.toISOString(), classes };
    },

    /** Replaces the class's members with the list given. */
    async setMembers(actor: Express.User, id: string, input: ClassMembersInput): Promise<ClassDetail> {
      const updated = await db.transaction(async (trx) => {
        const repository = classesRepository(trx);
        const row = await repository.findForUpdate(id);
        if (!row) throw classNotFound();
        if (row.cancelledAt) throw classCancelled();
        await checkMembers(repository, input.memberIds, row.capacity);
        const before = (await repository.members([id])).map((m) => m.id);
        const wanted = new Set(input.memberIds);
        const removed = before.filter((memberId) => !wanted.has(memberId));
        const added = input.memberIds.filter((memberId) => !before.includes(memberId));
        await repository.removeMembers(id, removed);
        await repository.addMembers(id, added, actor.id);
        if (added.length > 0 || removed.length > 0) {
          await auditLog(trx).record({ actorId: actor.id, action: 'class.members_changed', entity: 'class', entityId: id, details: { added, removed } });
        }
        return detail(id, actor, trx);
      });
      // A booked member may start at the class's machine during its hold (rule 6), so stations re-read it.
      live.machineChanged(updated.machineId);
      return updated;
    },

    /** The holder or an admin cancels the class: its meetings still to come free the machine. */
    async cancel(actor: Express.User, id: string, now = new Date()): Promise<void> {
      const machineId = await db.transaction(async (trx) => {
        const repository = classesRepository(trx);
        const row = await repository.findForUpdate(id);
        if (!row) throw classNotFound();
        if (row.instructorId !== actor.id && !can(actor.role, 'cancel:class:any')) throw notYours();
        if (row.cancelledAt) throw classCancelled();
        const meetings = await repository.cancelFuture(id, now);
        await repository.markCancelled(id, now);
        await auditLog(trx).record({ actorId: actor.id, action: 'class.cancelled', entity: 'class', entityId: id, details: { title: row.title, machineId: row.machineId, meetingsCancelled: meetings } });
        return row.machineId;
      });
      live.machineChanged(machineId);
    },

    /** The holder or an admin cancels one meeting still to come. */
    async cancelOccurrence(actor: Express.User, id: string, reservationId: string, now = new Date()): Promise<void> {
      const machineId = await db.transaction(async (trx) => {
        const repository = classesRepository(trx);
        const row = await repository.findForUpdate(id);
        if (!row) throw classNotFound();
        if (row.instructorId !== actor.id && !can(actor.role, 'cancel:class:any')) throw notYours();
        const meeting = await repository.occurrenceForUpdate(id, reservationId);
        if (!meeting) throw occurrenceNotFound();
        if (meeting.status !== 'active' || meeting.endsAt.getTime() <= now.getTime()) {
          throw conflict('not_cancellable', 'Only a meeting that is still to come, and not checked into, can be cancelled.');
        }
        await repository.cancelOccurrence(reservationId, now);
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'class.occurrence_cancelled',
          entity: 'class',
          entityId: id,
          details: { reservationId, title: row.title, start: meeting.startsAt.toISOString(), end: meeting.endsAt.toISOString() },
        });
        return row.machineId;
      });
      live.machineChanged(machineId);
    },
  };
}
