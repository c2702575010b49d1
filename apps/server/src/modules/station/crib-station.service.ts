import { type CribCheckout, type CribStationCheckoutInput, type CribStationConsumable, type CribStationItem, type CribStationMemberResult, type CribStationReturnInput } from '@chuckkey/core';
import type { Db } from '../../lib/db';
import type { Deps } from '../../lib/deps';
import { AppError, conflict, notFound } from '../../lib/errors';
import { badgesService } from '../badges/badges.service';
import { cribRepository } from '../crib/crib.repository';
import { cribService, toCheckout, toolDueAt } from '../crib/crib.service';
import { membersRepository, toUser } from '../members/members.repository';
import type { StationRecord } from '../stations/stations.repository';


export const notACribStation = () =>
  new AppError(403, 'not_a_crib_station', 'This station is not at the tool crib. Tools are checked out and returned at the crib’s own station.');
const toolNotFound = () => notFound('crib_item_not_found', 'No tool in the crib has that tag. Scan the label again, or type the tag.');
const unknownBadge = () => new AppError(401, 'unknown_badge', 'This badge is not known here. Scan it again, or ask an admin for a new card.');

/** A line's error, naming the basket line it belongs to, so the station marks that line. */
function forLine(error: AppError, itemId: string): AppError {
  return new AppError(error.status, error.code, error.message, { ...error.options, extensions: { ...error.options.extensions, itemId } });
}

/**
 * The crib station: a member's badge opens a basket; tools come back without one. Checkouts go
 * through the crib's own service with the member as the person who recorded them.
 */
export function cribStationService(deps: Deps) {
  const { db } = deps;
  const badges = badgesService(deps);


  async function openCheckoutByTag(repository: ReturnType<typeof cribRepository>, tag: string) {
    const item = await repository.findToolByTag(tag);
    if (!item) throw toolNotFound();
    return { item, open: await repository.openCheckoutOfTool(item.id) };
  }

  return {
    async member(badge: string, now: Date): Promise<CribStationMemberResult> {
      const holder = await badges.findMemberByCode(badge);
      if (!holder) return { member: null, reason: 'unknown_badge' };
      if (!holder.active) return { member: null, reason: 'member_inactive' };
      const out = (await cribRepository(db).openToolCheckouts(holder.id)).map(toCheckout);
      return {
        member: { id: holder.id, firstName: holder.firstName },
        out: out.map((checkout) => ({ ...checkout, overdue: checkout.dueAt !== null && Date.parse(checkout.dueAt) < now.getTime() })),
      };
    },

    async lookup(tag: string, now: Date): Promise<{ item: CribStationItem }> {
      const { item, open } = await openCheckoutByTag(cribRepository(db), tag);
      const dueAt = await toolDueAt(db, item.loanPeriodHours, now);
      return {
        item: {
          id: item.id,
          kind: item.kind,
          name: item.name,
          assetTag: item.assetTag ?? tag,
          binLocation: item.binLocation,
          available: item.inCirculation && !open,
          dueAt: dueAt.toISOString(),
          openCheckout: open ? { id: open.id, memberFirstName: open.memberFirstName, dueAt: open.dueAt.toISOString() } : null,
        },
      };
    },

    async consumables(): Promise<CribStationConsumable[]> {
      const items = await cribRepository(db).listItems();
      return items.flatMap((item) =>
        item.kind === 'consumable' && item.inCirculation && item.stock !== null && item.stock > 0 && item.unit !== null
          ? [{ id: item.id, name: item.name, unit: item.unit, stock: item.stock, binLocation: item.binLocation }]
          : [],
      );
    },

    /** The whole basket in one transaction: one line refused (a tool out, stock short) and nothing is taken. */
    async checkOut(station: StationRecord, input: CribStationCheckoutInput, now: Date): Promise<CribCheckout[]> {
      const holder = await badges.findMemberByCode(input.badge);
      if (!holder) throw unknownBadge();
      if (!holder.active) throw new AppError(403, 'member_inactive', 'This member’s account is not active. An admin can help at the desk.');
      const record = await membersRepository(db).findById(holder.id);
      if (!record) throw unknownBadge();
      const member = toUser(record);
      return db.transaction(async (trx: Db) => {
        const crib = cribService({ ...deps, db: trx });
        const checkouts: CribCheckout[] = [];
        for (const line of input.items) {
          try {
            checkouts.push(await crib.checkOut(member, { memberId: member.id, itemId: line.itemId, quantity: line.quantity }, now, { via: 'station', stationId: station.id }));
          } catch (error) {
            if (error instanceof AppError) throw forLine(error, line.itemId);
            throw error;
          }
        }
        return checkouts;
      });
    },

    /** Anyone may bring a tool back: the station records it, and no badge is asked for. */
    async returnTool(station: StationRecord, input: CribStationReturnInput): Promise<CribCheckout> {
      const { open } = await openCheckoutByTag(cribRepository(db), input.tag);
      if (!open) throw conflict('not_checked_out', 'This tool is not checked out, so there is nothing to return. Put it back in its bin.');
      return cribService(deps).returnItem(null, open.id, { condition: input.condition, note: input.note }, { via: 'station', stationId: station.id });
    },
  };
}
