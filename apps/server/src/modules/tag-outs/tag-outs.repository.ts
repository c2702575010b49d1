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
