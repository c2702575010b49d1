import type { IncidentKind, IncidentReport, IncidentStatus } from '@chuckkey/core';
import type { Db } from '../../lib/db';

export interface IncidentRow {
  id: string;
  occurredAt: Date;
  kind: IncidentKind;
  status: IncidentStatus;
  areaId: string | null;
  areaName: string | null;
  location: string | null;
  machineId: string | null;
  machineName: string | null;
  reporterId: string | null;
  reporterFirstName: string | null;
  reporterLastName: string | null;
  reportedAt: Date;
  photoCount: number;
  description: string;
  firstAid: string | null;
}

export interface IncidentNoteRow {
  id: string;
  authorId: string | null;
  authorFirstName: string | null;
  authorLastName: string | null;
  at: Date;
  note: string;
}

export interface IncidentPhotoInput {
  image: Buffer;
  contentType: string;
}

export interface IncidentPhotoRow {
  position: number;
  contentType: string;
  size: number;
}

/** Pass a transaction as `db` to make several calls one change. */
export function incidentsRepository(db: Db) {
  const selected = () =>
    db('incidents as i')
      .leftJoin('areas as a', 'a.id', 'i.area_id')
      .leftJoin('machines as m', 'm.id', 'i.machine_id')
      .leftJoin('members as r', 'r.id', 'i.reported_by')
      .select({
        id: 'i.id',
        occurredAt: 'i.occurred_at',
        kind: 'i.kind',
        status: 'i.status',
        areaId: 'i.area_id',
        areaName: 'a.name',
        location: 'i.location',
        machineId: 'i.machine_id',
        machineName: 'm.name',
        reporterId: 'i.reported_by',
        reporterFirstName: 'r.first_name',
        reporterLastName: 'r.last_name',
        reportedAt: 'i.reported_at',
        description: 'i.description',
        firstAid: 'i.first_aid',
      })
      .select(db.raw('(select count(*)::int from incident_photos p where p.incident_id = i.id) as "photoCount"'));

  return {
    async areaExists(id: string): Promise<boolean> {
      return Boolean(await db('areas').first('id').where({ id }));
    },

    async machineExists(id: string): Promise<boolean> {
      return Boolean(await db('machines').first('id').where({ id }));
    },

    async insert(report: IncidentReport, reportedBy: string, photos: IncidentPhotoInput[]): Promise<string> {
      const [row] = await db('incidents')
        .insert({
          occurred_at: report.occurredAt,
          area_id: report.areaId ?? null,
          location: report.location ?? null,
          machine_id: report.machineId ?? null,
          kind: report.kind,
          description: report.description,
          first_aid: report.firstAid ?? null,
          reported_by: reportedBy,
        })
        .returning<{ id: string }[]>('id');
      if (!row) throw new Error('incident insert returned no row');
      if (photos.length > 0) {
        await db('incident_photos').insert(
          photos.map((photo, index) => ({
            incident_id: row.id,
            position: index + 1,
            image: photo.image,
            content_type: photo.contentType,
            size: photo.image.length,
          })),
        );
      }
      return row.id;
    },

    async find(id: string): Promise<IncidentRow | undefined> {
      return selected().where('i.id', id).first<IncidentRow | undefined>();
    },

    /** Locks the report until the transaction ends, so two reviews run one after the other. */
    async statusForUpdate(id: string): Promise<IncidentStatus | undefined> {
      const row = await db('incidents').first<{ status: IncidentStatus } | undefined>('status').where({ id }).forUpdate();
      return row?.status;
    },

    async setStatus(id: string, status: IncidentStatus): Promise<void> {
      await db('incidents').where({ id }).update({ status, updated_at: db.fn.now() });
    },

    async list(filters: { status?: IncidentStatus; kind?: IncidentKind }): Promise<IncidentRow[]> {
      const query = selected().orderBy([
        { column: 'i.occurred_at', order: 'desc' },
        { column: 'i.id', order: 'asc' },
      ]);
      if (filters.status) query.where('i.status', filters.status);
      if (filters.kind) query.where('i.kind', filters.kind);
      return query;
    },

    async photos(incidentId: string): Promise<IncidentPhotoRow[]> {
      return db('incident_photos')
        .select({ position: 'position', contentType: 'content_type', size: 'size' })
        .where({ incident_id: incidentId })
        .orderBy('position');
    },

    async photo(incidentId: string, position: number): Promise<{ image: Buffer; contentType: string } | undefined> {
      return db('incident_photos').first({ image: 'image', contentType: 'content_type' }).where({ incident_id: incidentId, position });
    },

    async notes(incidentId: string): Promise<IncidentNoteRow[]> {
      return db('incident_notes as n')
        .leftJoin('members as a', 'a.id', 'n.author_id')
        .select({ id: 'n.id', authorId: 'n.author_id', authorFirstName: 'a.first_name', authorLastName: 'a.last_name', at: 'n.at', note: 'n.note' })
        .where('n.incident_id', incidentId)
        .orderBy([
          { column: 'n.at', order: 'asc' },
          { column: 'n.id', order: 'asc' },
        ]);
    },

    async addNote(incidentId: string, authorId: string, note: string): Promise<string> {
      const [row] = await db('incident_notes').insert({ incident_id: incidentId, author_id: authorId, note }).returning<{ id: string }[]>('id');
      if (!row) throw new Error('incident note insert returned no row');
      await db('incidents').where({ id: incidentId }).update({ updated_at: db.fn.now() });
      return row.id;
    },

    async activeAdmins(): Promise<{ email: string; firstName: string }[]> {
      return db('members').select({ email: 'email', firstName: 'first_name' }).where({ role: 'admin', active: true }).orderBy('email');
    },
  };
}
