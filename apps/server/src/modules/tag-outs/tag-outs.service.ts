import { can, type ClearedTagOut, type TagOut, type TagOutListItem } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { conflict, forbidden, notFound, pgCode, UNIQUE_VIOLATION } from '../../lib/errors';
import { auditLog } from '../audit/audit.repository';
import { tagOutMail } from './tag-out-mail';
import { tagOutsRepository, type TagOutListRecord, type TagOutRecord } from './tag-outs.repository';

const machineNotFound = () => notFound('machine_not_found', 'There is no machine with that id.');
const cannotClear = () => forbidden('Only an admin, or the instructor who tagged this machine out, can clear the tag.');
const alreadyTaggedOut = () => conflict('already_tagged_out', 'This machine is already tagged out. Its tag says why.');

const toTagOut = (row: TagOutRecord): TagOut => ({
  id: row.id,
  machineId: row.machineId,
  reason: row.reason,
  reportedAt: row.reportedAt.toISOString(),
});

const person = (id: string | null, firstName: string | null, lastName: string | null) =>
  id && firstName !== null ? { id, firstName, lastName: lastName ?? '' } : null;

const toListItem = (row: TagOutListRecord): TagOutListItem => ({
  ...toTagOut(row),
  machineName: row.machineName,
  reportedBy: person(row.reportedBy, row.reporterFirstName, row.reporterLastName),
  clearedAt: row.clearedAt ? row.clearedAt.toISOString() : null,
  clearedBy: person(row.clearedBy, row.clearerFirstName, row.clearerLastName),
  clearNote: row.clearNote,
});

/**
 * Tag-outs take a machine out of service (clearance rule 4 refuses it, the board shows the reason).
 * Anyone signed in may tag a machine out; only an admin, or the instructor who tagged it, clears it.
 */
export function tagOutsService(deps: Deps) {
  const { db, live } = deps;
  const mail = tagOutMail(deps);
  return {
    /**
     * Every way of tagging a machine out comes here (the web app, a station), so the admins hear
     * of each one. The mail goes after the commit and is not waited for: the answer, and the
     * machine's refusal, must not wait on a mail server.
     */
    async tagOut(actor: Pick<Express.User, 'id'>, machineId: string, reason: string): Promise<TagOut> {
      const tagOut = await db.transaction(async (trx) => {
        const repository = tagOutsRepository(trx);
        if (!(await repository.machineExists(machineId))) throw machineNotFound();
        let opened: TagOutRecord;
        try {
          opened = await repository.open({ machineId, reason, reportedBy: actor.id });
        } catch (error) {
          if (pgCode(error) === UNIQUE_VIOLATION) throw alreadyTaggedOut();
          throw error;
        }
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'machine.tagged_out',
          entity: 'machine',
          entityId: machineId,
          details: { tagOutId: opened.id, reason },
        });
        return opened;
      });
      live.machineChanged(machineId);
      void mail.notifyAdmins(tagOut.id);
      return toTagOut(tagOut);
    },

    async list(open: boolean): Promise<TagOutListItem[]> {
      return (await tagOutsRepository(db).list(open)).map(toListItem);
    },

    async clear(actor: Express.User, machineId: string, note: string): Promise<ClearedTagOut> {
      const any = can(actor.role, 'clear:tag-out:any');
      const own = can(actor.role, 'clear:tag-out:own');
      if (!any && !own) throw cannotClear();
      const cleared = await db.transaction(async (trx) => {
        const repository = tagOutsRepository(trx);
        if (!(await repository.machineExists(machineId))) throw machineNotFound();
        const open = await repository.findOpenForUpdate(machineId);
        if (!open) throw conflict('not_tagged_out', 'This machine is not tagged out.');
        if (!any && open.reportedBy !== actor.id) throw cannotClear();
        const row = await repository.clear(open.id, { clearedBy: actor.id, note });
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'machine.tag_out_cleared',
          entity: 'machine',
          entityId: machineId,
          details: { tagOutId: row.id, reason: row.reason, note },
        });
        return row;
      });
      live.machineChanged(machineId);
      return { ...toTagOut(cleared), clearedAt: (cleared.clearedAt ?? new Date()).toISOString(), clearNote: cleared.clearNote ?? note };
    },
  };
}
