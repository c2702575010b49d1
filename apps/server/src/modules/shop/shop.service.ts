import {
  describeWeeklyHours,
  hoursOnDate,
  shopDate,
  shopHoursAt,
  type ClosureInput,
  type ShopClosure,
  type ShopHours,
  type WeeklyHoursInput,
} from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { badRequest, notFound } from '../../lib/errors';
import { auditLog } from '../audit/audit.repository';
import { shopRepository } from './shop.repository';

const iso = (date: Date | null) => (date ? date.toISOString() : null);

/** The shop's opening hours and closures: what Setup edits and what clearance rule 7 reads. */
export function shopHoursService({ db }: Deps) {
  const shop = shopRepository(db);

  async function hours(now: Date): Promise<ShopHours> {
    const [{ timeZone }, weekly] = await Promise.all([shop.get(), shop.weeklyHours()]);
    const today = shopDate(now, timeZone);
    const closures = await shop.closuresFrom(today);
    const state = shopHoursAt(weekly, closures, timeZone, now);
    const day = hoursOnDate(weekly, closures, timeZone, today);
    return {
      timeZone,
      weekly,
      closures,
      today: {
        date: today,
        open: state.open,
        opensAt: iso(state.opensAt),
        closesAt: iso(state.closesAt),
        intervals: day.intervals,
        closure: day.closure,
      },
    };
  }

  return {
    hours,

    /** Replaces the weekly schedule in one transaction, with its before and after in the audit log. */
    async replaceWeekly(actor: Express.User, input: WeeklyHoursInput, now: Date): Promise<ShopHours> {
      await db.transaction(async (trx) => {
        const repository = shopRepository(trx);
        await repository.lock();
        const before = await repository.weeklyHours();
        await repository.replaceWeeklyHours(input.weekly);
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'shop.hours_changed',
          entity: 'shop',
          entityId: '1',
          details: { before: describeWeeklyHours(before), after: describeWeeklyHours(input.weekly) },
        });
      });
      return hours(now);
    },

    async addClosure(actor: Express.User, input: ClosureInput, now: Date): Promise<ShopClosure> {
      const { timeZone } = await shop.get();
      // A closure over only past days would close nothing and vanish from the list at once.
      if (input.endsOn < shopDate(now, timeZone)) {
        throw badRequest('closure_in_past', 'A closure must end today or later.', { endsOn: ['The last day has already passed.'] });
      }
      return db.transaction(async (trx) => {
        const closure = await shopRepository(trx).addClosure({ ...input, createdBy: actor.id });
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'shop.closure_added',
          entity: 'shop_closure',
          entityId: closure.id,
          details: { startsOn: closure.startsOn, endsOn: closure.endsOn, reason: closure.reason },
        });
        return closure;
      });
    },

    async removeClosure(actor: Express.User, id: string): Promise<void> {
      await db.transaction(async (trx) => {
        const repository = shopRepository(trx);
        const closure = await repository.findClosure(id);
        if (!closure || !(await repository.removeClosure(id))) throw notFound('closure_not_found', 'There is no closure with that id.');
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'shop.closure_removed',
          entity: 'shop_closure',
          entityId: id,
          details: { startsOn: closure.startsOn, endsOn: closure.endsOn, reason: closure.reason },
        });
      });
    },
  };
}
export type ShopHoursService = ReturnType<typeof shopHoursService>;
