import type { ReservationStatus } from '@chuckkey/core';
import type { Db } from '../../lib/db';

export interface ClassRecord {
  id: string;
  title: string;
  machineId: string;
  machineName: string;
  trainingId: string | null;
  trainingName: string | null;
  instructorId: string;
  instructorFirstName: string;
  startsAt: Date;
  endsAt: Date;
  weeks: number;
  rrule: string | null;
  capacity: number | null;
  cancelledAt: Date | null;
}

export interface OccurrenceRecord {
  reservationId: string;
  classId: string;
  machineId: string;
  startsAt: Date;
  endsAt: Date;
  status: ReservationStatus;
}

export interface ClassMemberRecord {
  classId: string;
  id: string;
  firstName: string;
  lastName: string;
}

const classColumns = {
  id: 'c.id',
  title: 'c.title',
  machineId: 'c.machine_id',
  machineName: 'm.name',
  trainingId: 'c.training_id',
  trainingName: 't.name',
  instructorId: 'c.instructor_id',
  instructorFirstName: 'i.first_name',
  startsAt: 'c.starts_at',
  endsAt: 'c.ends_at',
  weeks: 'c.weeks',
  rrule: 'c.rrule',
  capacity: 'c.capacity',
  cancelledAt: 'c.cancelled_at',
} as const;

const occurrenceColumns = {
  reservationId: 'r.id',
  classId: 'r.class_id',
  machineId: 'r.machine_id',
  startsAt: 'r.starts_at',
  endsAt: 'r.ends_at',
  status: 'r.status',
} as const;

/** Pass a transaction as `db` to make several calls one change. */
export function classesRepository(db: Db) {
  const classes = () =>
    db('classes as c')
      .join('machines as m', 'm.id', 'c.machine_id')
      .join('members as i', 'i.id', 'c.instructor_id')
      .leftJoin('trainings as t', 't.id', 'c.training_id');

  return {
    async trainingExists(trainingId: string): Promise<boolean> {
      return (await db('trainings').first('id').where({ id: trainingId })) !== undefined;
    },

    /** Which of the ids are active members; the others cannot be booked into a class. */
    async activeMembers(ids: readonly string[]): Promise<Set<string>> {
      if (ids.length === 0) return new Set();
      const rows: { id: string }[] = await db('members').whereIn('id', ids).where({ active: true }).select('id');
      return new Set(rows.map((row) => row.id));
    },

    async insertClass(row: {
      title: string;
      machineId: string;
      trainingId: string | null;
      instructorId: string;
      start: Date;
      end: Date;
      weeks: number;
      rrule: string | null;
      capacity: number | null;
    }): Promise<string> {
      const [inserted] = await db('classes')
        .insert({
          title: row.title,
          machine_id: row.machineId,
          training_id: row.trainingId,
          instructor_id: row.instructorId,
          starts_at: row.start,
          ends_at: row.end,
          weeks: row.weeks,
          rrule: row.rrule,
          capacity: row.capacity,
        })
        .returning<{ id: string }[]>('id');
      if (!inserted) throw new Error('class insert returned no row');
      return inserted.id;
    },

    /** One meeting's hold of the machine; fails with SQLSTATE 23P01 when it overlaps a live claim. */
    async insertOccurrence(row: { classId: string; machineId: string; instructorId: string; start: Date; end: Date; blockedUntil: Date }): Promise<void> {
      await db('reservations').insert({
        class_id: row.classId,
        kind: 'class',
        machine_id: row.machineId,
        member_id: row.instructorId,
        starts_at: row.start,
        ends_at: row.end,
        blocked_until: row.blockedUntil,
      });
    },

    async find(id: string): Promise<ClassRecord | undefined> {
      return classes().where('c.id', id).first<ClassRecord | undefined>(classColumns);
    },

    /** Locks the class until the transaction ends, so changes of its members or meetings run one after another. */
    async findForUpdate(id: string): Promise<ClassRecord | undefined> {
      await db('classes').where({ id }).forUpdate().first('id');
      return this.find(id);
    },

    /** Classes not cancelled with a meeting overlapping [from, to), by their first meeting in it. */
    async inRange(from: Date, to: Date): Promise<ClassRecord[]> {
      return classes()
        .whereNull('c.cancelled_at')
        .whereExists((meeting) => {
          meeting.select(db.raw('1')).from('reservations as r').whereRaw('r.class_id = c.id').where('r.starts_at', '<', to).where('r.ends_at', '>', from);
        })
        .orderBy([{ column: 'c.starts_at' }, { column: 'c.id' }])
        .select(classColumns);
    },

    /** The classes' meetings, earliest first; within [from, to) when a range is given. */
    async occurrences(classIds: readonly string[], range?: { from: Date; to: Date }): Promise<OccurrenceRecord[]> {
      if (classIds.length === 0) return [];
      const query = db('reservations as r').whereIn('r.class_id', classIds);
      if (range) query.where('r.starts_at', '<', range.to).where('r.ends_at', '>', range.from);
      return query.orderBy('r.starts_at').select(occurrenceColumns);
    },

    async occurrenceForUpdate(classId: string, reservationId: string): Promise<OccurrenceRecord | undefined> {
      return db('reservations as r').where({ 'r.id': reservationId, 'r.class_id': classId }).forUpdate().first<OccurrenceRecord | undefined>(occurrenceColumns);
    },

    async members(classIds: readonly string[]): Promise<ClassMemberRecord[]> {
      if (classIds.length === 0) return [];
      return db('class_members as cm')
        .join('members as p', 'p.id', 'cm.member_id')
        .whereIn('cm.class_id', classIds)
        .orderBy([{ column: 'p.last_name' }, { column: 'p.first_name' }, { column: 'p.id' }])
        .select({ classId: 'cm.class_id', id: 'p.id', firstName: 'p.first_name', lastName: 'p.last_name' });
    },

    async addMembers(classId: string, memberIds: readonly string[], addedBy: string): Promise<void> {
      if (memberIds.length === 0) return;
      await db('class_members')
        .insert(memberIds.map((memberId) => ({ class_id: classId, member_id: memberId, added_by: addedBy })))
        .onConflict(['class_id', 'member_id'])
        .ignore();
    },

    async removeMembers(classId: string, memberIds: readonly string[]): Promise<void> {
      if (memberIds.length === 0) return;
      await db('class_members').where({ class_id: classId }).whereIn('member_id', memberIds).delete();
    },

    /** Cancels the class's meetings still to come and not checked into; answers how many. */
    async cancelFuture(classId: string, now: Date): Promise<number> {
      return db('reservations').where({ class_id: classId, status: 'active' }).where('ends_at', '>', now).update({ status: 'cancelled', cancelled_at: now });
    },

    async cancelOccurrence(reservationId: string, now: Date): Promise<void> {
      await db('reservations').where({ id: reservationId }).update({ status: 'cancelled', cancelled_at: now });
    },

    async markCancelled(classId: string, now: Date): Promise<void> {
      await db('classes').where({ id: classId }).update({ cancelled_at: now });
    },
  };
}
