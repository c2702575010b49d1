import { z } from 'zod';

export const cribItemKinds = ['tool', 'consumable'] as const;
export const cribConditions = ['good', 'needs_attention', 'damaged'] as const;
export const cribConditionSchema = z.enum(cribConditions, { error: 'Choose good, needs attention or damaged.' });
export type CribCondition = z.infer<typeof cribConditionSchema>;

const name = z
  .string({ error: 'Give the item a name.' })
  .trim()
  .min(1, { error: 'Give the item a name.' })
  .max(200, { error: 'Keep the name to 200 characters.' });
const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, { error: `Keep it to ${max} characters.` })
    .nullish()
    .transform((value) => (value ? value : null));
const count = (what: string) => z.number({ error: `${what} must be a whole number.` }).int({ error: `${what} must be a whole number.` }).min(0, { error: `${what} cannot be below zero.` });

/** A tool: lent to one member at a time and expected back. */
export const cribToolInputSchema = z.object({
  kind: z.literal('tool'),
  name,
  assetTag: z
    .string({ error: 'Give the tool an asset tag.' })
    .trim()
    .min(1, { error: 'Give the tool an asset tag.' })
    .max(40, { error: 'Keep the asset tag to 40 characters.' }),
  serialNumber: optionalText(100),
  binLocation: optionalText(100),
  condition: cribConditionSchema.default('good'),
  inCirculation: z.boolean().default(true),
  // Null: due back at the shop's closing time on the day it goes out.
  loanPeriodHours: z.number().int({ error: 'The loan period is whole hours.' }).min(1, { error: 'The loan period is at least one hour.' }).max(24 * 90).nullable().default(null),
});

/** A consumable: taken by count, charged per unit, never returned. */
export const cribConsumableInputSchema = z.object({
  kind: z.literal('consumable'),
  name,
  binLocation: optionalText(100),
  unit: z.string({ error: 'Say what one unit is (each, spool, box).' }).trim().min(1, { error: 'Say what one unit is (each, spool, box).' }).max(40),
  stock: count('Stock'),
  reorderLevel: count('The reorder level').nullable().default(null),
  priceCents: count('The price'),
  inCirculation: z.boolean().default(true),
});

/** POST /api/crib/items and PUT /api/crib/items/:id: the whole item, either kind. */
export const cribItemInputSchema = z.discriminatedUnion('kind', [cribToolInputSchema, cribConsumableInputSchema], {
  error: 'Say whether the item is a tool or a consumable.',
});
export type CribItemInput = z.infer<typeof cribItemInputSchema>;

/** An item as admins see it. */
export const cribItemSchema = z.object({
  id: z.uuid(),
  kind: z.enum(cribItemKinds),
  name: z.string(),
  binLocation: z.string().nullable(),
  assetTag: z.string().nullable(),
  serialNumber: z.string().nullable(),
  condition: cribConditionSchema.nullable(),
  inCirculation: z.boolean(),
  loanPeriodHours: z.number().int().nullable(),
  unit: z.string().nullable(),
  stock: z.number().int().nullable(),
  reorderLevel: z.number().int().nullable(),
  priceCents: z.number().int().nullable(),
  /** For a tool: in circulation and not out. For a consumable: in circulation and stock above zero. */
  available: z.boolean(),
  /** A photo has been uploaded: GET /api/crib/items/:id/photo answers it. */
  hasPhoto: z.boolean(),
});
export type CribItem = z.infer<typeof cribItemSchema>;

/** An item as members see it: enough to find it and know whether it can be had. */
export const cribItemPublicSchema = cribItemSchema.pick({ id: true, kind: true, name: true, binLocation: true, available: true });
export type CribItemPublic = z.infer<typeof cribItemPublicSchema>;

/** POST /api/crib/checkouts: a tool lent (quantity 1) or a consumable taken by count. */
export const cribCheckoutInputSchema = z.object({
  memberId: z.uuid({ error: 'Choose the member.' }),
  itemId: z.uuid({ error: 'Choose the item.' }),
  quantity: z.number({ error: 'The quantity is a whole number.' }).int({ error: 'The quantity is a whole number.' }).min(1, { error: 'Take at least one.' }).max(1000).default(1),
});
export type CribCheckoutInput = z.infer<typeof cribCheckoutInputSchema>;

/** POST /api/crib/checkouts/:id/return: the tool's condition as it comes back. */
export const cribReturnInputSchema = z.object({
  condition: cribConditionSchema,
  note: optionalText(1000),
});
export type CribReturnInput = z.infer<typeof cribReturnInputSchema>;

export const cribCheckoutSchema = z.object({
  id: z.uuid(),
  itemId: z.uuid(),
  itemKind: z.enum(cribItemKinds),
  itemName: z.string(),
  memberId: z.uuid(),
  /** First and last name, so lists of checkouts read without a second look-up. */
  memberName: z.string(),
  quantity: z.number().int(),
  checkedOutAt: z.string(),
  dueAt: z.string().nullable(),
  returnedAt: z.string().nullable(),
  returnCondition: cribConditionSchema.nullable(),
  returnNote: z.string().nullable(),
  /** A consumable take: the price of one unit at the moment of the take, which its charge uses. Null for a tool. */
  unitPriceCents: z.number().int().nullable(),
});
export type CribCheckout = z.infer<typeof cribCheckoutSchema>;

/** GET /api/crib/attention: a tool out of circulation for its condition, with the return that reported it. */
export const cribAttentionSchema = z.object({
  itemId: z.uuid(),
  name: z.string(),
  assetTag: z.string(),
  binLocation: z.string().nullable(),
  condition: cribConditionSchema,
  note: z.string().nullable(),
  returnedAt: z.string().nullable(),
  memberId: z.uuid().nullable(),
  memberName: z.string().nullable(),
});
export type CribAttention = z.infer<typeof cribAttentionSchema>;

/** POST /api/crib/items/:id/restore: a tool put back on the shelf after its repair or check. */
export const cribRestoreInputSchema = z.object({
  note: optionalText(1000),
});
export type CribRestoreInput = z.infer<typeof cribRestoreInputSchema>;

export const cribCheckoutsQuerySchema = z.object({
  open: z.enum(['true', 'false']).optional().transform((value) => value === 'true'),
});

/** POST /api/crib/items/import: the inventory as RFC 4180 CSV text, with the export's header line. */
export const cribImportInputSchema = z.object({
  csv: z.string({ error: 'Send the CSV text.' }).min(1, { error: 'Send the CSV text.' }).max(1_000_000, { error: 'Keep the file under 1 MB.' }),
});

/** The columns of the inventory's CSV, in order; `id` blank on import adds the item. */
export const cribCsvColumns = [
  'id',
  'kind',
  'name',
  'asset_tag',
  'serial_number',
  'bin_location',
  'condition',
  'in_circulation',
  'loan_period_hours',
  'unit',
  'stock',
  'reorder_level',
  'price_cents',
] as const;

/** GET /api/crib/overdue: a tool past its due time, most overdue first, with the reminders sent so far. */
export const cribOverdueSchema = z.object({
  checkoutId: z.uuid(),
  itemId: z.uuid(),
  itemName: z.string(),
  assetTag: z.string(),
  memberId: z.uuid(),
  memberName: z.string(),
  memberEmail: z.string(),
  dueAt: z.string(),
  overdueByHours: z.number(),
  noticesSent: z.number().int(),
  lastNoticeAt: z.string().nullable(),
});
export type CribOverdue = z.infer<typeof cribOverdueSchema>;
