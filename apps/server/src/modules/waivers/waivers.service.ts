import type { WaiverAccept, WaiverPublish, WaiverStatus, WaiverVersion } from '@chuckkey/core';
import { fullName, typedNameMatches, WAIVER_SCAN_MAX_BYTES } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { badRequest, conflict, notFound } from '../../lib/errors';
import { sniffType, type UploadRule } from '../../lib/uploads';
import { auditLog } from '../audit/audit.repository';
import { waiversRepository, type WaiverRecord, type WaiverScan, type WaiverVersionRecord } from './waivers.repository';

export const SCAN_UPLOAD: UploadRule = { field: 'scan', maxBytes: WAIVER_SCAN_MAX_BYTES, label: 'waiver scan' };
const SCAN_TYPES = ['application/pdf', 'image/jpeg', 'image/png'] as const;

function toVersion(row: WaiverVersionRecord): WaiverVersion {
  return { version: row.version, title: row.title, body: row.body, publishedAt: row.publishedAt.toISOString() };
}

function toStatus(current: WaiverVersionRecord | undefined, record: WaiverRecord | undefined): WaiverStatus {
  return {
    current: current ? toVersion(current) : null,
    record: record
      ? { id: record.id, version: record.version, method: record.method, typedName: record.typedName, recordedAt: record.recordedAt.toISOString() }
      : null,
    onFile: Boolean(current && record),
  };
}

const noWaiver = () => notFound('no_waiver', 'The shop has not published a safety waiver yet.');
const memberNotFound = () => notFound('member_not_found', 'There is no member with that id.');

export function waiversService({ db }: Deps) {
  const waivers = waiversRepository(db);

  async function statusOf(memberId: string): Promise<WaiverStatus> {
    const current = await waivers.current();
    return toStatus(current, current ? await waivers.findRecord(memberId, current.version) : undefined);
  }

  return {
    async current(): Promise<WaiverVersion> {
      const current = await waivers.current();
      if (!current) throw noWaiver();
      return toVersion(current);
    },

    /** Only the current version counts: a member who accepted an older one is asked again. */
    async status(memberId: string): Promise<WaiverStatus> {
      if (!(await waivers.findMember(memberId))) throw memberNotFound();
      return statusOf(memberId);
    },

    /** Records the member's own acceptance; answers whether a new record was made. */
    async accept(actor: Express.User, input: WaiverAccept): Promise<{ status: WaiverStatus; created: boolean }> {
      const current = await waivers.current();
      if (!current) throw noWaiver();
      if (input.version !== current.version) {
        throw conflict('outdated_version', `The waiver has changed: version ${current.version} is the one to read and accept.`, {
          version: [`Read and accept version ${current.version}.`],
        });
      }
      const name = fullName(actor.firstName, actor.lastName);
      if (!typedNameMatches(input.typedName, name)) {
        throw badRequest('name_mismatch', `Type your full name as the shop has it: ${name}.`, { typedName: [`Type your full name: ${name}.`] });
      }
      const existing = await waivers.findRecord(actor.id, current.version);
      if (existing?.method === 'accepted_online') return { status: toStatus(current, existing), created: false };
      const record = await db.transaction(async (trx) => {
        const inserted = await waiversRepository(trx).insertRecord({
          memberId: actor.id,
          version: current.version,
          recordedBy: actor.id,
          typedName: input.typedName,
        });
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'waiver.accepted',
          entity: 'waiver_record',
          entityId: inserted.id,
          memberId: actor.id,
          details: { version: current.version, typedName: input.typedName },
        });
        return inserted;
      });
      return { status: toStatus(current, record), created: true };
    },

    /** Files a signed paper copy of the current version for a member, checked by its content. */
    async uploadScan(actor: Express.User, memberId: string, data: Buffer): Promise<WaiverStatus> {
      if (!(await waivers.findMember(memberId))) throw memberNotFound();
      const current = await waivers.current();
      if (!current) throw noWaiver();
      const type = await sniffType(data, SCAN_TYPES, SCAN_UPLOAD, 'a PDF, JPEG or PNG file');
      const record = await db.transaction(async (trx) => {
        const inserted = await waiversRepository(trx).insertRecord({
          memberId,
          version: current.version,
          recordedBy: actor.id,
          scan: { data, type },
        });
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'waiver.scan_uploaded',
          entity: 'waiver_record',
          entityId: inserted.id,
          memberId,
          details: { version: current.version, type, bytes: data.length },
        });
        return inserted;
      });
      return toStatus(current, record);
    },

    async scan(memberId: string): Promise<WaiverScan> {
      const scan = await waivers.latestScan(memberId);
      if (!scan) throw notFound('no_scan', 'No signed waiver has been uploaded for this member.');
      return scan;
    },

    /** A new version: from now on every member's waiver is off file until they accept it. */
    async publish(actor: Express.User, input: WaiverPublish): Promise<WaiverVersion> {
      const row = await db.transaction(async (trx) => {
        const inserted = await waiversRepository(trx).insertNextVersion({ ...input, publishedBy: actor.id });
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'waiver.published',
          entity: 'waiver_version',
          entityId: String(inserted.version),
          details: { version: inserted.version, title: inserted.title },
        });
        return inserted;
      });
      return toVersion(row);
    },
  };
}
export type WaiversService = ReturnType<typeof waiversService>;
