import {
  can,
  fullName,
  type Incident,
  type IncidentKind,
  type IncidentNote,
  type IncidentPhoto,
  type IncidentReport,
  type IncidentStatus,
  type IncidentSummary,
} from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { badRequest, notFound } from '../../lib/errors';
import { auditLog } from '../audit/audit.repository';
import { shopRepository } from '../shop/shop.repository';
import type { CheckedPhoto } from './incident-uploads';
import { injuryMail } from './incident-mail';
import { incidentsRepository, type IncidentNoteRow, type IncidentRow } from './incidents.repository';

// Someone else's report answers as an unknown one does, so ids tell a member nothing.
const incidentNotFound = () => notFound('incident_not_found', 'There is no incident report with that id.');

const person = (id: string | null, firstName: string | null, lastName: string | null) =>
  id && firstName !== null && lastName !== null ? { id, name: fullName(firstName, lastName) } : null;

const toSummary = (row: IncidentRow): IncidentSummary => ({
  id: row.id,
  occurredAt: row.occurredAt.toISOString(),
  kind: row.kind,
  status: row.status,
  area: row.areaId && row.areaName !== null ? { id: row.areaId, name: row.areaName } : null,
  location: row.location,
  machine: row.machineId && row.machineName !== null ? { id: row.machineId, name: row.machineName } : null,
  reportedBy: person(row.reporterId, row.reporterFirstName, row.reporterLastName),
  reportedAt: row.reportedAt.toISOString(),
  photoCount: row.photoCount,
});

const toNote = (row: IncidentNoteRow): IncidentNote => ({
  id: row.id,
  author: person(row.authorId, row.authorFirstName, row.authorLastName),
  at: row.at.toISOString(),
  note: row.note,
});

/**
 * Incident reports: anyone signed in reports what happened; admins read every report, move it
 * through open → under review → closed and add follow-up notes. An injury mails every active
 * admin once the report is stored.
 */
export function incidentsService({ db, config, logger, mailer }: Deps) {
  const canReadAny = (actor: Express.User) => can(actor.role, 'read:incident:any');

  async function visible(actor: Express.User, id: string): Promise<IncidentRow> {
    const row = await incidentsRepository(db).find(id);
    if (!row) throw incidentNotFound();
    if (!canReadAny(actor) && row.reporterId !== actor.id) throw incidentNotFound();
    return row;
  }

  async function detail(row: IncidentRow): Promise<Incident> {
    const repository = incidentsRepository(db);
    const [photos, notes] = await Promise.all([repository.photos(row.id), repository.notes(row.id)]);
    return {
      ...toSummary(row),
      description: row.description,
      firstAid: row.firstAid,
      photos: photos.map((photo): IncidentPhoto => ({ n: photo.position, contentType: photo.contentType as IncidentPhoto['contentType'], size: photo.size })),
      notes: notes.map(toNote),
    };
  }

  /** Mails every active admin; a failed hand-off is logged and never undoes the report. */
  async function mailAdmins(row: IncidentRow): Promise<void> {
    try {
      const [admins, shop] = await Promise.all([incidentsRepository(db).activeAdmins(), shopRepository(db).get()]);
      const results = await Promise.allSettled(admins.map((admin) => mailer.send(injuryMail(admin, row, shop, config.publicUrl))));
      for (const result of results) {
        if (result.status === 'rejected') logger.error({ err: result.reason, incidentId: row.id }, 'injury mail not sent');
      }
    } catch (error) {
      logger.error({ err: error, incidentId: row.id }, 'injury mail not sent');
    }
  }

  return {
    async report(actor: Express.User, report: IncidentReport, photos: CheckedPhoto[]): Promise<Incident> {
      const id = await db.transaction(async (trx) => {
        const repository = incidentsRepository(trx);
        if (report.areaId && !(await repository.areaExists(report.areaId))) {
          throw badRequest('unknown_area', 'There is no such area.', { areaId: ['Choose an area from the list.'] });
        }
        if (report.machineId && !(await repository.machineExists(report.machineId))) {
          throw badRequest('unknown_machine', 'There is no such machine.', { machineId: ['Choose a machine from the list.'] });
        }
        const inserted = await repository.insert(report, actor.id, photos);
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'incident.reported',
          entity: 'incident',
          entityId: inserted,
          details: { kind: report.kind, machineId: report.machineId ?? null, photos: photos.length },
        });
        return inserted;
      });
      const row = await incidentsRepository(db).find(id);
      if (!row) throw incidentNotFound();
      if (row.kind === 'injury') await mailAdmins(row);
      return detail(row);
    },

    async list(filters: { status?: IncidentStatus; kind?: IncidentKind }): Promise<IncidentSummary[]> {
      return (await incidentsRepository(db).list(filters)).map(toSummary);
    },

    async get(actor: Express.User, id: string): Promise<Incident> {
      return detail(await visible(actor, id));
    },

    async photo(actor: Express.User, id: string, n: number): Promise<{ image: Buffer; contentType: string }> {
      await visible(actor, id);
      const photo = await incidentsRepository(db).photo(id, n);
      if (!photo) throw notFound('photo_not_found', `This report has no photo ${n}.`);
      return photo;
    },

    async setStatus(actor: Express.User, id: string, status: IncidentStatus): Promise<Incident> {
      await db.transaction(async (trx) => {
        const repository = incidentsRepository(trx);
        const before = await repository.statusForUpdate(id);
        if (!before) throw incidentNotFound();
        if (before === status) return;
        await repository.setStatus(id, status);
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'incident.status_changed',
          entity: 'incident',
          entityId: id,
          details: { before, after: status },
        });
      });
      return detail(await visible(actor, id));
    },

    async addNote(actor: Express.User, id: string, note: string): Promise<IncidentNote> {
      const noteId = await db.transaction(async (trx) => {
        const repository = incidentsRepository(trx);
        if (!(await repository.statusForUpdate(id))) throw incidentNotFound();
        const added = await repository.addNote(id, actor.id, note);
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'incident.note_added',
          entity: 'incident',
          entityId: id,
          details: { noteId: added },
        });
        return added;
      });
      const added = (await incidentsRepository(db).notes(id)).find((row) => row.id === noteId);
      if (!added) throw incidentNotFound();
      return toNote(added);
    },
  };
}
