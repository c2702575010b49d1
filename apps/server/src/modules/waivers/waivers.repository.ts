import type { Db } from '../../lib/db';

export interface WaiverVersionRecord {
  version: number;
  title: string;
  body: string;
  publishedAt: Date;
}

export interface WaiverRecord {
  id: string;
  version: number;
  method: 'accepted_online' | 'uploaded_scan';
  typedName: string | null;
  recordedAt: Date;
}

export interface WaiverScan {
  version: number;
  scan: Buffer;
  scanType: string;
  recordedAt: Date;
}

const versionColumns = { version: 'version', title: 'title', body: 'body', publishedAt: 'published_at' } as const;
const recordColumns = { id: 'id', version: 'version', method: 'method', typedName: 'typed_name', recordedAt: 'recorded_at' } as const;
const returning = (columns: Record<string, string>) => Object.entries(columns).map(([alias, column]) => `${column} as ${alias}`);

/** Pass a transaction as `db` to make several calls one change. */
export function waiversRepository(db: Db) {
  return {
    async current(): Promise<WaiverVersionRecord | undefined> {
      return db('waiver_versions').first(versionColumns).orderBy('version', 'desc');
    },

    /** Publishes the next version number; call inside a transaction. */
    async insertNextVersion(fields: { title: string; body: string; publishedBy: string }): Promise<WaiverVersionRecord> {
      // Two admins publishing at once would otherwise both take the same next number.
      await db.raw('lock table waiver_versions in share row exclusive mode');
      const row = await db('waiver_versions').max<{ max: number | null }>({ max: 'version' }).first();
      const [inserted] = await db('waiver_versions')
        .insert({ version: Number(row?.max ?? 0) + 1, title: fields.title, body: fields.body, published_by: fields.publishedBy })
        .returning(returning(versionColumns));
      return inserted as WaiverVersionRecord;
    },

    async findMember(id: string): Promise<{ id: string; firstName: string; lastName: string } | undefined> {
      return db('members').first({ id: 'id', firstName: 'first_name', lastName: 'last_name' }).where({ id });
    },

    /** The member's newest record for a version: online acceptance or filed scan. */
    async findRecord(memberId: string, version: number): Promise<WaiverRecord | undefined> {
      return db('waiver_records')
        .first(recordColumns)
        .where({ member_id: memberId, version })
        .orderBy([{ column: 'recorded_at', order: 'desc' }, { column: 'id', order: 'desc' }]);
    },

    async insertRecord(fields: {
      memberId: string;
      version: number;
      recordedBy: string;
      typedName?: string;
      scan?: { data: Buffer; type: string };
    }): Promise<WaiverRecord> {
      const [row] = await db('waiver_records')
        .insert({
          member_id: fields.memberId,
          version: fields.version,
          method: fields.scan ? 'uploaded_scan' : 'accepted_online',
          typed_name: fields.typedName ?? null,
          recorded_by: fields.recordedBy,
          scan: fields.scan?.data ?? null,
          scan_type: fields.scan?.type ?? null,
        })
        .returning(returning(recordColumns));
      return row as WaiverRecord;
    },

    async latestScan(memberId: string): Promise<WaiverScan | undefined> {
      return db('waiver_records')
        .first({ version: 'version', scan: 'scan', scanType: 'scan_type', recordedAt: 'recorded_at' })
        .where({ member_id: memberId, method: 'uploaded_scan' })
        .orderBy([{ column: 'recorded_at', order: 'desc' }, { column: 'id', order: 'desc' }]);
    },
  };
}
export type WaiversRepository = ReturnType<typeof waiversRepository>;
