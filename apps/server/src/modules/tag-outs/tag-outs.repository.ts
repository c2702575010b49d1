import type { Db } from '../../lib/db';

export interface TagOutRecord {
  id: string;
  machineId: string;
  reason: string;
  reportedBy: string | null;
  reportedAt: Date;
  clearedAt: Date | null;
  clearedBy: string | null;
  clearNote: string | null;
}

const columns = {
  id: 'id',
  machineId: 'machine_id',
  reason: 'reason',
  reportedBy: 'reported_by',
  reportedAt: 'reported_at',
  clearedAt: 'cleared_at',
  clearedBy: 'cleared_by',
  clearNote: 'clear_note',
} as const;

/** A tag-out as the Upkeep list shows it: the machine and the people by name. */
export interface TagOutListRecord extends TagOutRecord {
  machineName: string;
  reporterFirstName: string | null;
  reporterLastName: string | null;
  clearerFirstName: string | null;
  clearerLastName: string | null;
}

/** What the admins' mail about a new tag-out is written from. */
export interface TagOutMailRecord {
  machineName: string;
  reason: string;
  reportedAt: Date;
  reporterFirstName: string | null;
  reporterLastName: string | null;
}

/** The history below the open tag-outs is capped: the newest are the ones anyone looks for. */
export const CLEARED_TAG_OUTS_LISTED = 200;

const returning = Object.entries(columns).map(([alias, column]) => `${column} as ${alias}`);

/** Pass a transaction as `db` to make several calls one change. */
export function tagOutsRepository(db: Db) {
  return {
    async machineExists(machineId: string): Promise<boolean> {
      return Boolean(await db('machines').first('id').where({ id: machineId }));
    },

    /** Fails with a unique violation when the machine already has an open tag-out. */
    async open(tagOut: { machineId: string; reason: string; reportedBy: string }): Promise<TagOutRecord> {
      const [row] = await db('tag_outs')
        .insert({ machine_id: tagOut.machineId, reason: tagOut.reason, reported_by: tagOut.reportedBy })
        .returning<TagOutRecord[]>(returning);
      if (!row) throw new Error('tag-out insert returned no row');
      return row;
    },

    /** Locks the open tag-out until the transaction ends, so two clearings run one after the other. */
    async findOpenForUpdate(machineId: string): Promise<TagOutRecord | undefined> {
      return db('tag_outs').first<TagOutRecord | undefined>(columns).where({ machine_id: machineId }).whereNull('cleared_at').forUpdate();
    },

    async list(open: boolean): Promise<TagOutListRecord[]> {
      const q = db('tag_outs as t')
        .join('machines as m', 'm.id', 't.machine_id')
        .leftJoin('members as r', 'r.id', 't.reported_by')
        .leftJoin('members as c', 'c.id', 't.cleared_by')
        .select<TagOutListRecord[]>({
          ...Object.fromEntries(Object.entries(columns).map(([alias, column]) => [alias, `t.${column}`])),
          machineName: 'm.name',
          reporterFirstName: 'r.first_name',
          reporterLastName: 'r.last_name',
          clearerFirstName: 'c.first_name',
          clearerLastName: 'c.last_name',
        });
      // Open ones, longest out of service first; cleared ones, latest cleared first.
      if (open) return q.whereNull('t.cleared_at').orderBy([{ column: 't.reported_at' }, { column: 't.id' }]);
      return q.whereNotNull('t.cleared_at').orderBy([{ column: 't.cleared_at', order: 'desc' }, { column: 't.id' }]).limit(CLEARED_TAG_OUTS_LISTED);
    },

    async forMail(id: string): Promise<TagOutMailRecord | undefined> {
      return db('tag_outs as t')
        .join('machines as m', 'm.id', 't.machine_id')
        .leftJoin('members as r', 'r.id', 't.reported_by')
        .first<TagOutMailRecord | undefined>({
          machineName: 'm.name',
          reason: 't.reason',
          reportedAt: 't.reported_at',
          reporterFirstName: 'r.first_name',
          reporterLastName: 'r.last_name',
        })
        .where('t.id', id);
    },

    /** The machine's running session, whose member a station's report speaks for when no badge is scanned. */
    async runningSession(machineId: string): Promise<{ id: string; memberId: string } | undefined> {
      return db('machine_sessions').first({ id: 'id', memberId: 'member_id' }).where({ machine_id: machineId }).whereNull('ended_at');
    },

    /** The active admins, who hear of every tag-out. */
    async adminRecipients(): Promise<string[]> {
      const rows = await db('members').select<{ email: string }[]>('email').where({ role: 'admin', active: true }).orderBy('email');
      return rows.map((row) => row.email);
    },

    async clear(id: string, clearing: { clearedBy: string; note: string }): Promise<TagOutRecord> {
      const [row] = await db('tag_outs')
        .where({ id })
        .whereNull('cleared_at')
        .update({ cleared_at: db.fn.now(), cleared_by: clearing.clearedBy, clear_note: clearing.note })
        .returning<TagOutRecord[]>(returning);
      if (!row) throw new Error(`tag-out ${id} was not open`);
      return row;
    },
  };
}
