import { shopDate, wallClockInstant } from '@chuckkey/core';
import type { Knex } from 'knex';

const DAY = 86_400_000;

interface DemoTool {
  name: string;
  assetTag: string;
  serialNumber: string | null;
  binLocation: string;
  loanPeriodHours: number | null;
}

interface DemoConsumable {
  name: string;
  unit: string;
  stock: number;
  reorderLevel: number;
  priceCents: number;
  binLocation: string;
}

/** The demo shop's crib: its own tools under its own asset tags (CK-…), no makers named. */
export const demoCribTools: DemoTool[] = [
  { name: 'Outside micrometer 0–1 in', assetTag: 'CK-0001', serialNumber: 'M1-2207', binLocation: 'Cabinet A, drawer 1', loanPeriodHours: null },
  { name: 'Outside micrometer 0–1 in', assetTag: 'CK-0002', serialNumber: 'M1-2208', binLocation: 'Cabinet A, drawer 1', loanPeriodHours: null },
  { name: 'Outside micrometer 1–2 in', assetTag: 'CK-0003', serialNumber: 'M2-0415', binLocation: 'Cabinet A, drawer 1', loanPeriodHours: null },
  { name: 'Telescoping bore gauge set, 5/16–6 in', assetTag: 'CK-0010', serialNumber: null, binLocation: 'Cabinet A, drawer 2', loanPeriodHours: null },
  { name: 'Telescoping bore gauge set, 5/16–6 in', assetTag: 'CK-0011', serialNumber: null, binLocation: 'Cabinet A, drawer 2', loanPeriodHours: null },
  { name: 'Thread pitch gauge, inch', assetTag: 'CK-0020', serialNumber: null, binLocation: 'Cabinet A, drawer 3', loanPeriodHours: null },
  { name: 'Thread pitch gauge, metric', assetTag: 'CK-0021', serialNumber: null, binLocation: 'Cabinet A, drawer 3', loanPeriodHours: null },
  { name: 'Boring bar, 3/8 in shank', assetTag: 'CK-0030', serialNumber: null, binLocation: 'Lathe rack, slot 4', loanPeriodHours: null },
  { name: 'Boring bar, 1/2 in shank', assetTag: 'CK-0031', serialNumber: null, binLocation: 'Lathe rack, slot 5', loanPeriodHours: null },
  { name: 'Center drill set, #1–#5', assetTag: 'CK-0040', serialNumber: null, binLocation: 'Lathe rack, drawer 1', loanPeriodHours: null },
  { name: 'Parting blade and holder, 1/2 in', assetTag: 'CK-0050', serialNumber: null, binLocation: 'Lathe rack, slot 8', loanPeriodHours: null },
  { name: 'Auto-darkening welding helmet', assetTag: 'CK-0060', serialNumber: 'H-3301', binLocation: 'Weld bay hooks', loanPeriodHours: null },
  { name: 'Auto-darkening welding helmet', assetTag: 'CK-0061', serialNumber: 'H-3302', binLocation: 'Weld bay hooks', loanPeriodHours: null },
  // Gloves go home for a week: a member keeps them for a run of welding evenings.
  { name: 'Welding gloves, large', assetTag: 'CK-0070', serialNumber: null, binLocation: 'Weld bay shelf', loanPeriodHours: 168 },
  { name: 'Welding gloves, medium', assetTag: 'CK-0071', serialNumber: null, binLocation: 'Weld bay shelf', loanPeriodHours: 168 },
];

export const demoCribConsumables: DemoConsumable[] = [
  { name: 'Carbide turning insert, CCMT 32.51', unit: 'each', stock: 40, reorderLevel: 10, priceCents: 650, binLocation: 'Cabinet B, bin 1' },
  { name: 'MIG wire, 0.030 in, 11 lb spool', unit: 'spool', stock: 6, reorderLevel: 2, priceCents: 3400, binLocation: 'Weld bay shelf' },
  { name: 'Flap disc, 4-1/2 in, 80 grit', unit: 'each', stock: 25, reorderLevel: 8, priceCents: 450, binLocation: 'Cabinet B, bin 4' },
];

/** The demo member has a 0–1 in micrometer out, due at 18:00 tomorrow on the shop's wall clock. */
export const demoCribLoan = { assetTag: 'CK-0001', memberEmail: 'member@example.org', dueClock: '18:00' } as const;

/** Another member kept a boring bar past closing two days ago, so the overdue list has something to show. */
export const demoCribOverdue = { assetTag: 'CK-0030', daysAgo: 2, dueClock: '18:00' } as const;

/** A helmet came back needing attention, so the attention list has something to show. */
export const demoCribAttention = {
  assetTag: 'CK-0061',
  note: 'The lens stays dark for several seconds after the arc stops. Check the sensors and the battery.',
} as const;

/** The demo member took two turning inserts last week, at the price of the day. */
export const demoCribTake = { name: 'Carbide turning insert, CCMT 32.51', quantity: 2, daysAgo: 6 } as const;

export async function seed(knex: Knex): Promise<void> {
  // Seeding again leaves an existing crib as it is: its stock and checkouts are the shop's now.
  if (await knex('crib_items').first('id')) return;

  await knex('crib_items').insert([
    ...demoCribTools.map((tool) => ({
      kind: 'tool',
      name: tool.name,
      asset_tag: tool.assetTag,
      serial_number: tool.serialNumber,
      bin_location: tool.binLocation,
      condition: 'good',
      loan_period_hours: tool.loanPeriodHours,
    })),
    ...demoCribConsumables.map((item) => ({
      kind: 'consumable',
      name: item.name,
      unit: item.unit,
      stock: item.stock,
      reorder_level: item.reorderLevel,
      price_cents: item.priceCents,
      bin_location: item.binLocation,
    })),
  ]);

  const [{ time_zone: timeZone }, member, admin, tool] = await Promise.all([
    knex('shop').first('time_zone').where({ id: 1 }),
    knex('members').first('id').where({ email: demoCribLoan.memberEmail }),
    knex('members').first('id').where({ email: 'admin@example.org' }),
    knex('crib_items').first('id').where({ asset_tag: demoCribLoan.assetTag }),
  ]);
  if (!member || !tool) return;
  const now = Date.now();
  const tomorrow = shopDate(new Date(now + DAY), timeZone);
  await knex('crib_checkouts').insert({
    item_id: tool.id,
    item_kind: 'tool',
    member_id: member.id,
    quantity: 1,
    due_at: wallClockInstant(tomorrow, demoCribLoan.dueClock, timeZone),
    recorded_by: admin?.id ?? null,
  });

  // The other scenes go to the first plain member (by e-mail) other than the demo member.
  const [other, overdueTool, helmet, insert] = await Promise.all([
    knex('members').first('id').where({ role: 'member', active: true }).whereNot({ id: member.id }).orderBy('email'),
    knex('crib_items').first('id').where({ asset_tag: demoCribOverdue.assetTag }),
    knex('crib_items').first('id').where({ asset_tag: demoCribAttention.assetTag }),
    knex('crib_items').first('id', 'price_cents').where({ name: demoCribTake.name }),
  ]);
  if (other && overdueTool) {
    const dueDay = shopDate(new Date(now - demoCribOverdue.daysAgo * DAY), timeZone);
    const dueAt = wallClockInstant(dueDay, demoCribOverdue.dueClock, timeZone);
    await knex('crib_checkouts').insert({
      item_id: overdueTool.id,
      item_kind: 'tool',
      member_id: other.id,
      quantity: 1,
      checked_out_at: new Date(dueAt.getTime() - 3 * 3_600_000),
      due_at: dueAt,
      recorded_by: admin?.id ?? null,
    });
  }
  if (other && helmet) {
    const returnedAt = new Date(now - DAY);
    await knex('crib_checkouts').insert({
      item_id: helmet.id,
      item_kind: 'tool',
      member_id: other.id,
      quantity: 1,
      checked_out_at: new Date(returnedAt.getTime() - 4 * 3_600_000),
      due_at: returnedAt,
      returned_at: returnedAt,
      return_condition: 'needs_attention',
      return_note: demoCribAttention.note,
      recorded_by: admin?.id ?? null,
      returned_recorded_by: admin?.id ?? null,
    });
    await knex('crib_items').where({ id: helmet.id }).update({ condition: 'needs_attention', in_circulation: false });
  }
  if (insert) {
    await knex('crib_checkouts').insert({
      item_id: insert.id,
      item_kind: 'consumable',
      member_id: member.id,
      quantity: demoCribTake.quantity,
      unit_price_cents: insert.price_cents,
      checked_out_at: new Date(now - demoCribTake.daysAgo * DAY),
      recorded_by: admin?.id ?? null,
    });
    await knex('crib_items').where({ id: insert.id }).decrement('stock', demoCribTake.quantity);
  }
}
