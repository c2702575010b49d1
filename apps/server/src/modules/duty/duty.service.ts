import type { StationDutyResult } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { dutyRepository } from './duty.repository';

/** Supervisors on duty are shop-wide: one instructor on duty supervises every machine. */
export function dutyService({ db, live }: Deps) {
  return {
    /** Takes the instructor or admin off duty if they are on, otherwise puts them on. */
    async toggle(supervisor: { id: string; firstName: string }): Promise<StationDutyResult> {
      const onDuty = await db.transaction(async (trx) => {
        const duty = dutyRepository(trx);
        if (await duty.endOpenShift(supervisor.id)) return false;
        await duty.startShift(supervisor.id);
        return true;
      });
      live.shopChanged('duty');
      return { onDuty, supervisor: { firstName: supervisor.firstName } };
    },
  };
}
