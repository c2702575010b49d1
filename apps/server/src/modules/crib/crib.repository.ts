import type { CribCondition, CribItemInput } from '@chuckkey/core';
import type { Db } from '../../lib/db';

export interface CribItemRecord {
  id: string;
  kind: 'tool' | 'consumable';
  name: string;
  binLocation: string | null;
  assetTag: string | null;
  serialNumber: string | null;
  condition: CribCondition | null;
  inCirculation: boolean;
  loanPeriodHours: number | null;
  unit: string | null;
  stock: number | null;
  reorderLevel: number | null;
  priceCents: number | null;
  out: boolean;
  hasPhoto: boolean;
}

export interface CribPhotoRecord {
  image: Buffer;
  contentType: string;
  updatedAt: Date;
}

export interface CribCheckoutRecord {
  id: string;
  itemId: string;
  itemKind: 'tool' | 'consumable';
  itemName: string;
  memberId: string;
  memberName: string;
  quantity: number;
  checkedOutAt: Date;
  dueAt: Date | null;
  returnedAt: Date | null;
  returnCondition: CribCondition | null;
  returnNote: string | null;
  unitPriceCents: number | null;
}

export interface CribAttentionRecord {
  itemId: string;
  name: string;
  assetTag: string;
  binLocation: string | null;
  condition: CribCondition;
  note: string | null;
  returnedAt: Date | null;
  memberId: string | null;
  memberName: string | null;
}

const itemColumns = [
  'i.id as id',
  'i.kind as kind',
  'i.name as name',
  'i.bin_location as binLocation',
  'i.asset_tag as assetTag',
  'i.serial_number as serialNumber',
  'i.condition as condition',
  'i.in_circulation as inCirculation',
  'i.loan_period_hours as loanPeriodHours',
  'i.unit as unit',
  'i.stock as stock',
  'i.reorder_level as reorderLevel',
  'i.price_cents as priceCents',
];

const checkoutColumns = [
  'c.id as id',
  'c.item_id as itemId',
  'c.item_kind as itemKind',
  'i.name as itemName',
  'c.member_id as memberId',
  'c.quantity as quantity',
  'c.checked_out_at as checkedOutAt',
  'c.due_at as dueAt',
  'c.returned_at as returnedAt',
  'c.return_condition as returnCondition',
  'c.return_note as returnNote',
  'c.unit_price_cents as unitPriceCents',
];

/** Each kind's own columns, the other kind's left null as the table's checks require. */
function itemRow(item: CribItemInput) {
  const tool = item.kind === 'tool';
  return {
    kind: item.kind,
    name: item.name,
    bin_location: item.binLocation,
    in_circulation: item.inCirculation,
    asset_tag: tool ? item.assetTag : null,
    serial_number: tool ? item.serialNumber : null,
    condition: tool ? item.condition : null,
    loan_period_hours: tool ? item.loanPeriodHours : null,
    unit: tool ? null : item.unit,
    stock: tool ? null : item.stock,
    reorder_level: tool ? null : item.reorderLevel,
    price_cents: tool ? null : item.priceCents,
  };
}

/** Pass a transaction as `db` to make several calls one change. */
export function cribRepository(db: Db) {
  const items = () =>
    db({ i: 'crib_items' }).select(
      ...itemColumns,
      db.raw("exists (select 1 from crib_checkouts o where o.item_id = i.id and o.item_kind = 'tool' and o.returned_at is null) as out"),
      db.raw('exists (select 1 from crib_item_photos p where p.item_id = i.id) as "hasPhoto"'),
    );
  const checkouts = () =>
    db({ c: 'crib_checkouts' })
      .join({ i: 'crib_items' }, 'i.id', 'c.item_id')
      .join({ m: 'members' }, 'm.id', 'c.member_id')
      .select(...checkoutColumns, db.raw("m.first_name || ' ' || m.last_name as ??", ['memberName']));

  return {
    async listItems(): Promise<CribItemRecord[]> {
      return items().orderBy([{ column: 'i.name' }, { column: 'i.asset_tag' }]);
    },

    async findItem(id: string): Promise<CribItemRecord | undefined> {
      return items().where('i.id', id).first();
    },

    /** Fails with a unique violation when the asset tag is taken. */
    async createItem(item: CribItemInput): Promise<string> {
      const [row] = await db('crib_items').insert(itemRow(item)).returning<{ id: string }[]>('id');
      if (!row) throw new Error('crib item insert returned no row');
      return row.id;
    },

    /** Fails with a unique violation when the asset tag is taken, or a foreign key violation when a kind with checkouts changes. */
    async updateItem(id: string, item: CribItemInput): Promise<boolean> {
      const changed = await db('crib_items').where({ id }).update({ ...itemRow(item), updated_at: db.fn.now() });
      return changed > 0;
    },

    async findPhoto(itemId: string): Promise<CribPhotoRecord | undefined> {
      return db('crib_item_photos').first({ image: 'image', contentType: 'content_type', updatedAt: 'updated_at' }).where({ item_id: itemId });
    },

    async savePhoto(itemId: string, image: Buffer, contentType: string): Promise<void> {
      await db('crib_item_photos')
        .insert({ item_id: itemId, image, content_type: contentType, updated_at: db.fn.now() })
        .onConflict('item_id')
        .merge(['image', 'content_type', 'updated_at']);
    },

    /** False when the item had no photo. */
    async deletePhoto(itemId: string): Promise<boolean> {
      return (await db('crib_item_photos').where({ item_id: itemId }).delete()) > 0;
    },

    /** Whether the member's account is active; null when there is no such member. */
    async memberActive(memberId: string): Promise<boolean | null> {
      const row = await db('members').first('active').where({ id: memberId });
      return row ? Boolean(row.active) : null;
    },

    /**
     * Takes `quantity` from a consumable's stock in one statement, so concurrent takes can never
     * both spend the same units; false when the stock is short (nothing is taken then).
     */
    async takeStock(itemId: string, quantity: number): Promise<boolean> {
      const rows = await db('crib_items')
        .where({ id: itemId, kind: 'consumable', in_circulation: true })
        .andWhere('stock', '>=', quantity)
        .update({ stock: db.raw('stock - ?', [quantity]), updated_at: db.fn.now() })
        .returning('id');
      return rows.length > 0;
    },

    /** Fails with a unique violation when the tool is already out. */
    async insertCheckout(checkout: {
      itemId: string;
      itemKind: 'tool' | 'consumable';
      memberId: string;
      quantity: number;
      dueAt: Date | null;
      recordedBy: string;
    }): Promise<string> {
      const [row] = await db('crib_checkouts')
        .insert({
          item_id: checkout.itemId,
          item_kind: checkout.itemKind,
          member_id: checkout.memberId,
          quantity: checkout.quantity,
          due_at: checkout.dueAt,
          recorded_by: checkout.recordedBy,
          // The consumable's price read in the same statement as the take, so the charge is the price of that moment.
          unit_price_cents: db.raw("(select price_cents from crib_items where id = ? and kind = 'consumable')", [checkout.itemId]),
        })
        .returning<{ id: string }[]>('id');
      if (!row) throw new Error('crib checkout insert returned no row');
      return row.id;
    },

    /** A tool by its asset tag as a scanner or a person gives it: case and surrounding spaces do not matter. */
    async findToolByTag(tag: string): Promise<CribItemRecord | undefined> {
      const wanted = tag.trim();
      // Tags unique only by exact spelling could match twice; the exact spelling wins.
      return items()
        .where('i.kind', 'tool')
        .whereRaw('lower(i.asset_tag) = lower(?)', [wanted])
        .orderByRaw('(i.asset_tag = ?) desc', [wanted])
        .first();
    },

    /** The open checkout of a tool, with the first name of the member who has it. */
    async openCheckoutOfTool(itemId: string): Promise<{ id: string; memberId: string; memberFirstName: string; dueAt: Date } | undefined> {
      return db({ c: 'crib_checkouts' })
        .join({ m: 'members' }, 'm.id', 'c.member_id')
        .first({ id: 'c.id', memberId: 'c.member_id', memberFirstName: 'm.first_name', dueAt: 'c.due_at' })
        .where({ 'c.item_id': itemId, 'c.item_kind': 'tool' })
        .whereNull('c.returned_at');
    },

    async findCheckout(id: string): Promise<CribCheckoutRecord | undefined> {
      return checkouts().where('c.id', id).first();
    },

    /** Locks the checkout until the transaction ends, so two returns of it run one after the other. */
    async lockCheckout(id: string): Promise<{ itemKind: string; returnedAt: Date | null } | undefined> {
      return db('crib_checkouts').first({ itemKind: 'item_kind', returnedAt: 'returned_at' }).where({ id }).forUpdate();
    },

    async recordReturn(id: string, itemId: string, ret: { condition: CribCondition; note: string | null; recordedBy: string | null }): Promise<void> {
      await db('crib_checkouts').where({ id }).update({
        returned_at: db.fn.now(),
        return_condition: ret.condition,
        return_note: ret.note,
        returned_recorded_by: ret.recordedBy,
      });
      // A tool that comes back needing attention or damaged stays off the shelf until an admin puts it back.
      const item: Record<string, unknown> = { condition: ret.condition, updated_at: db.fn.now() };
      if (ret.condition !== 'good') item.in_circulation = false;
      await db('crib_items').where({ id: itemId }).update(item);
    },

    /** Marks a tool good and in circulation; false when no tool has that id. */
    async restoreTool(id: string): Promise<boolean> {
      const changed = await db('crib_items').where({ id, kind: 'tool' }).update({ condition: 'good', in_circulation: true, updated_at: db.fn.now() });
      return changed > 0;
    },

    async openToolCheckouts(memberId?: string): Promise<CribCheckoutRecord[]> {
      const query = checkouts().where('c.item_kind', 'tool').whereNull('c.returned_at').orderBy('c.due_at');
      if (memberId) query.andWhere('c.member_id', memberId);
      return query;
    },

    async allCheckouts(): Promise<CribCheckoutRecord[]> {
      return checkouts().orderBy('c.checked_out_at', 'desc').limit(500);
    },

    /** Tools out of circulation for their condition, with the return that reported it. */
    async attention(): Promise<CribAttentionRecord[]> {
      return db({ i: 'crib_items' })
        .select({
          itemId: 'i.id',
          name: 'i.name',
          assetTag: 'i.asset_tag',
          binLocation: 'i.bin_location',
          condition: 'i.condition',
          note: 'last.return_note',
          returnedAt: 'last.returned_at',
          memberId: 'last.member_id',
          memberName: db.raw("m.first_name || ' ' || m.last_name"),
        })
        .joinRaw(
          'left join lateral (select c.return_note, c.returned_at, c.member_id from crib_checkouts c where c.item_id = i.id and c.returned_at is not null order by c.returned_at desc limit 1) last on true',
        )
        .leftJoin({ m: 'members' }, 'm.id', 'last.member_id')
        .where('i.kind', 'tool')
        .whereIn('i.condition', ['needs_attention', 'damaged'])
        .orderBy('last.returned_at', 'desc');
    },
  };
}
