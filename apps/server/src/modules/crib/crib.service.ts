import {
  can,
  cribDueAt,
  type CribCheckout,
  type CribCheckoutInput,
  type CribItem,
  type CribItemInput,
  type CribItemPublic,
  type CribRestoreInput,
  type CribReturnInput,
} from '@chuckkey/core';
import type { Db } from '../../lib/db';
import type { Deps } from '../../lib/deps';
import { AppError, badRequest, conflict, notFound, pgCode, UNIQUE_VIOLATION } from '../../lib/errors';
import { sniffType } from '../../lib/uploads';
import { auditLog } from '../audit/audit.repository';
import { normalizePhoto, PHOTO_KINDS, PHOTO_TYPES, PHOTO_UPLOAD } from '../badges/badges.service';
import { shopRepository } from '../shop/shop.repository';
import { cribItemsCsv, readCribItemsCsv } from './crib-csv';
import { cribRepository, type CribCheckoutRecord, type CribItemRecord, type CribPhotoRecord } from './crib.repository';

const DAY_MS = 86_400_000;
const FOREIGN_KEY_VIOLATION = '23503';

const itemNotFound = () => notFound('crib_item_not_found', 'There is no crib item with that id.');
const checkoutNotFound = () => notFound('crib_checkout_not_found', 'There is no crib checkout with that id.');
const assetTagTaken = () => conflict('asset_tag_taken', 'Another tool already has that asset tag.', { assetTag: ['Another tool already has that asset tag.'] });
const alreadyOut = () => conflict('already_out', 'This tool is already checked out. It has to be returned first.');
const shortStock = () => conflict('short_stock', 'There is not enough of this in stock.');
const outOfCirculation = () => conflict('out_of_circulation', 'This item is out of circulation and cannot be checked out.');
const memberInactive = () => new AppError(403, 'member_inactive', 'This member’s account is not active, so nothing can be checked out to them.');

const available = (item: CribItemRecord) => item.inCirculation && (item.kind === 'tool' ? !item.out : (item.stock ?? 0) > 0);

const toItem = (row: CribItemRecord): CribItem => {
  const { out, ...item } = row;
  return { ...item, available: item.inCirculation && (item.kind === 'tool' ? !out : (item.stock ?? 0) > 0) };
};
const toPublicItem = (item: CribItemRecord): CribItemPublic => ({
  id: item.id,
  kind: item.kind,
  name: item.name,
  binLocation: item.binLocation,
  available: available(item),
});
export const toCheckout = (row: CribCheckoutRecord): CribCheckout => ({
  ...row,
  checkedOutAt: row.checkedOutAt.toISOString(),
  dueAt: row.dueAt ? row.dueAt.toISOString() : null,
  returnedAt: row.returnedAt ? row.returnedAt.toISOString() : null,
});

/**
 * When a tool lent at `now` is due back, by the shop's hours as `db` (a transaction or not) reads
 * them. The reads run one after the other, since a transaction's connection takes one at a time.
 */
export async function toolDueAt(db: Db, loanPeriodHours: number | null, now: Date): Promise<Date> {
  const shop = shopRepository(db);
  const { timeZone } = await shop.get();
  const weekly = await shop.weeklyHours();
  // Yesterday's closures too: a closure is whole days of the shop's calendar, which may be behind UTC.
  const closures = await shop.closuresFrom(new Date(now.getTime() - DAY_MS).toISOString().slice(0, 10));
  return cribDueAt(loanPeriodHours, { weekly, closures, timeZone }, now);
}

/**
 * The tool crib. Checkouts and returns take the person who records them as `actor`, so a crib
 * station's route can call the same service as the admins' web app; `context` adds to the audit
 * entry's details where the change was made (a station says which). Given a transaction as `db`,
 * each checkout becomes part of it, so several can land or fail together.
 */
export function cribService({ db }: Deps) {
  return {
    async items(actor: Express.User): Promise<CribItem[] | CribItemPublic[]> {
      const rows = await cribRepository(db).listItems();
      return can(actor.role, 'manage:crib:any') ? rows.map(toItem) : rows.map(toPublicItem);
    },

    async createItem(actor: Express.User, input: CribItemInput): Promise<CribItem> {
      return db.transaction(async (trx) => {
        const repository = cribRepository(trx);
        let id: string;
        try {
          id = await repository.createItem(input);
        } catch (error) {
          if (pgCode(error) === UNIQUE_VIOLATION) throw assetTagTaken();
          throw error;
        }
        await auditLog(trx).record({ actorId: actor.id, action: 'crib.item_created', entity: 'crib_item', entityId: id, details: { name: input.name, kind: input.kind } });
        const item = await repository.findItem(id);
        if (!item) throw new Error('crib item vanished after insert');
        return toItem(item);
      });
    },

    async updateItem(actor: Express.User, id: string, input: CribItemInput): Promise<CribItem> {
      return db.transaction(async (trx) => {
        const repository = cribRepository(trx);
        let changed: boolean;
        try {
          changed = await repository.updateItem(id, input);
        } catch (error) {
          if (pgCode(error) === UNIQUE_VIOLATION) throw assetTagTaken();
          // The checkouts' foreign key names the item's kind: a kind with history cannot change.
          if (pgCode(error) === FOREIGN_KEY_VIOLATION) throw conflict('kind_has_checkouts', 'This item has checkouts, so it cannot change between tool and consumable.');
          throw error;
        }
        if (!changed) throw itemNotFound();
        await auditLog(trx).record({ actorId: actor.id, action: 'crib.item_updated', entity: 'crib_item', entityId: id, details: { name: input.name, kind: input.kind } });
        const item = await repository.findItem(id);
        if (!item) throw itemNotFound();
        return toItem(item);
      });
    },

    /**
     * Checks the upload by its content and stores it as member photos are stored (oriented,
     * at most 600 × 600, re-encoded as JPEG without metadata); on any refusal nothing is stored.
     */
    async setPhoto(itemId: string, data: Buffer): Promise<CribItem> {
      const repository = cribRepository(db);
      if (!(await repository.findItem(itemId))) throw itemNotFound();
      await sniffType(data, PHOTO_TYPES, PHOTO_UPLOAD, PHOTO_KINDS);
      await repository.savePhoto(itemId, await normalizePhoto(data), 'image/jpeg');
      const item = await repository.findItem(itemId);
      if (!item) throw itemNotFound();
      return toItem(item);
    },

    async deletePhoto(itemId: string): Promise<void> {
      const repository = cribRepository(db);
      if (!(await repository.findItem(itemId))) throw itemNotFound();
      await repository.deletePhoto(itemId);
    },

    async photo(itemId: string): Promise<CribPhotoRecord> {
      const photo = await cribRepository(db).findPhoto(itemId);
      if (!photo) throw notFound('no_photo', 'This crib item has no photo yet.');
      return photo;
    },

    /** A tool back on the shelf after its repair or check: good condition, in circulation again. */
    async restoreItem(actor: Express.User, id: string, input: CribRestoreInput): Promise<CribItem> {
      return db.transaction(async (trx) => {
        const repository = cribRepository(trx);
        const before = await repository.findItem(id);
        if (!before) throw itemNotFound();
        if (before.kind !== 'tool') throw conflict('not_a_tool', 'Only a tool has a condition to put right; change a consumable under the inventory.');
        if (!(await repository.restoreTool(id))) throw itemNotFound();
        await auditLog(trx).record({
          actorId: actor.id,
          action: 'crib.item_restored',
          entity: 'crib_item',
          entityId: id,
          details: { name: before.name, condition: before.condition, inCirculation: before.inCirculation, note: input.note },
        });
        const item = await repository.findItem(id);
        if (!item) throw itemNotFound();
        return toItem(item);
      });
    },

    async exportCsv(): Promise<string> {
      return cribItemsCsv((await cribRepository(db).listItems()).map(toItem));
    },

    /** Adds rows without an id and replaces those with one, all in one change: a bad row imports nothing. */
    async importCsv(actor: Express.User, csv: string): Promise<{ created: number; updated: number }> {
      const rows = readCribItemsCsv(csv);
      return db.transaction(async (trx) => {
        const repository = cribRepository(trx);
        let created = 0;
        let updated = 0;
        for (const [index, row] of rows.entries()) {
          const line = index + 2;
          try {
            if (row.id === null) {
              await repository.createItem(row.input);
              created += 1;
            } else if (await repository.updateItem(row.id, row.input)) {
              updated += 1;
            } else {
              throw notFound('crib_item_not_found', `Line ${line} names an item this crib does not hold.`);
            }
          } catch (error) {
            if (pgCode(error) === UNIQUE_VIOLATION) throw conflict('asset_tag_taken', `Line ${line}: another tool already has that asset tag; nothing was imported.`);
            if (pgCode(error) === FOREIGN_KEY_VIOLATION) throw conflict('kind_has_checkouts', `Line ${line}: the item has checkouts, so it cannot change between tool and consumable; nothing was imported.`);
            throw error;
          }
        }
        await auditLog(trx).record({ actorId: actor.id, action: 'crib.items_imported', entity: 'crib_item', entityId: 'import', details: { created, updated } });
        return { created, updated };
      });
    },

    async checkOut(actor: Express.User, input: CribCheckoutInput, now = new Date(), context: Record<string, unknown> = {}): Promise<CribCheckout> {
      return db.transaction(async (trx) => {
        const repository = cribRepository(trx);
        // One after the other: a transaction's connection runs one query at a time.
        const item = await repository.findItem(input.itemId);
        const memberActive = await repository.memberActive(input.memberId);
        if (!item) throw itemNotFound();
        if (memberActive === null) throw notFound('member_not_found', 'There is no member with that id.');
        // Refused as at the crib station: an inactive account takes nothing from the crib.
        if (!memberActive) throw memberInactive();
        if (!item.inCirculation) throw outOfCirculation();

        let dueAt: Date | null = null;
        if (item.kind === 'tool') {
          if (input.quantity !== 1) throw badRequest('tool_quantity', 'A tool is checked out one at a time.', { quantity: ['A tool is checked out one at a time.'] });
          dueAt = await toolDueAt(trx, item.loanPeriodHours, now);
        } else if (!(await repository.takeStock(item.id, input.quantity))) {
          throw shortStock();
        }

        let id: string;
        try {
          id = await repository.insertCheckout({ itemId: item.id, itemKind: item.kind, memberId: input.memberId, quantity: input.quantity, dueAt, recordedBy: actor.id });
        } catch (error) {
          if (pgCode(error) === UNIQUE_VIOLATION) throw alreadyOut();
          throw error;
        }
        await auditLog(trx).record({
          actorId: actor.id,
          memberId: input.memberId,
          action: 'crib.checked_out',
          entity: 'crib_item',
          entityId: item.id,
          details: { checkoutId: id, name: item.name, quantity: input.quantity, dueAt: dueAt?.toISOString() ?? null, ...context },
        });
        const checkout = await repository.findCheckout(id);
        if (!checkout) throw new Error('crib checkout vanished after insert');
        return toCheckout(checkout);
      });
    },

    /** `actor` null: brought back at a station, where anyone may return a tool without a badge. */
    async returnItem(actor: Express.User | null, checkoutId: string, input: CribReturnInput, context: Record<string, unknown> = {}): Promise<CribCheckout> {
      return db.transaction(async (trx) => {
        const repository = cribRepository(trx);
        const locked = await repository.lockCheckout(checkoutId);
        if (!locked) throw checkoutNotFound();
        if (locked.itemKind !== 'tool') throw conflict('consumable_not_returned', 'Consumables are used up, not returned.');
        if (locked.returnedAt) throw conflict('already_returned', 'This checkout has already been returned.');
        const open = await repository.findCheckout(checkoutId);
        if (!open) throw checkoutNotFound();
        await repository.recordReturn(checkoutId, open.itemId, { condition: input.condition, note: input.note, recordedBy: actor?.id ?? null });
        await auditLog(trx).record({
          actorId: actor?.id ?? null,
          memberId: open.memberId,
          action: 'crib.returned',
          entity: 'crib_item',
          entityId: open.itemId,
          details: { checkoutId, name: open.itemName, condition: input.condition, note: input.note, ...context },
        });
        const returned = await repository.findCheckout(checkoutId);
        if (!returned) throw checkoutNotFound();
        return toCheckout(returned);
      });
    },

    async checkouts(open: boolean): Promise<CribCheckout[]> {
      const repository = cribRepository(db);
      return (open ? await repository.openToolCheckouts() : await repository.allCheckouts()).map(toCheckout);
    },

    async mine(actor: Express.User): Promise<CribCheckout[]> {
      return (await cribRepository(db).openToolCheckouts(actor.id)).map(toCheckout);
    },

    async attention() {
      const rows = await cribRepository(db).attention();
      return rows.map((row) => ({ ...row, returnedAt: row.returnedAt ? row.returnedAt.toISOString() : null }));
    },
  };
}
