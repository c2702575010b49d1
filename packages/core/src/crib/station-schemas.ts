import { z } from 'zod';
import { badgeCodeSchema } from '../badges/schemas';
import { cribCheckoutSchema, cribConditionSchema, cribItemKinds } from './schemas';

/** An asset tag as the crib station reads it from a QR label, a hand scanner or the screen. */
export const cribTagSchema = z
  .string({ error: 'Scan or type the tool’s tag.' })
  .trim()
  .min(1, { error: 'Scan or type the tool’s tag.' })
  .max(40, { error: 'An asset tag has at most 40 characters.' });

/** POST /api/station/crib/member: the badge scanned at the crib. */
export const cribStationMemberInputSchema = z.object({ badge: badgeCodeSchema });

/** A tool the member has out, with whether its due time has passed. */
export const cribStationOutSchema = cribCheckoutSchema.extend({ overdue: z.boolean() });
export type CribStationOut = z.infer<typeof cribStationOutSchema>;

export const cribStationMemberResultSchema = z.union([
  z.object({
    member: z.object({ id: z.uuid(), firstName: z.string() }),
    /** Soonest due first. */
    out: z.array(cribStationOutSchema),
  }),
  z.object({
    member: z.null(),
    reason: z.enum(['unknown_badge', 'member_inactive']),
  }),
]);
export type CribStationMemberResult = z.infer<typeof cribStationMemberResultSchema>;

/** POST /api/station/crib/items/lookup. */
export const cribTagLookupInputSchema = z.object({ tag: cribTagSchema });

export const cribStationItemSchema = z.object({
  id: z.uuid(),
  kind: z.enum(cribItemKinds),
  name: z.string(),
  assetTag: z.string(),
  binLocation: z.string().nullable(),
  available: z.boolean(),
  /** When the tool would be due back if it were checked out now. */
  dueAt: z.string(),
  openCheckout: z.object({ id: z.uuid(), memberFirstName: z.string(), dueAt: z.string() }).nullable(),
});
export type CribStationItem = z.infer<typeof cribStationItemSchema>;
export const cribTagLookupResultSchema = z.object({ item: cribStationItemSchema });

/** GET /api/station/crib/consumables: what can be taken by count now. */
export const cribStationConsumableSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  unit: z.string(),
  stock: z.number().int(),
  binLocation: z.string().nullable(),
});
export type CribStationConsumable = z.infer<typeof cribStationConsumableSchema>;
export const cribStationConsumablesSchema = z.array(cribStationConsumableSchema);

/** The most lines one basket may hold: more than anyone carries from the crib at once. */
export const CRIB_BASKET_MAX_LINES = 50;

/** POST /api/station/crib/checkouts: the whole basket, taken together or not at all. */
export const cribStationCheckoutInputSchema = z.object({
  badge: badgeCodeSchema,
  items: z
    .array(
      z.object({
        itemId: z.uuid({ error: 'Choose the item.' }),
        quantity: z.number({ error: 'The quantity is a whole number.' }).int({ error: 'The quantity is a whole number.' }).min(1, { error: 'Take at least one.' }).max(1000).default(1),
      }),
      { error: 'Send the basket’s lines.' },
    )
    .min(1, { error: 'The basket is empty.' })
    .max(CRIB_BASKET_MAX_LINES, { error: `A basket holds at most ${CRIB_BASKET_MAX_LINES} lines.` }),
});
export type CribStationCheckoutInput = z.infer<typeof cribStationCheckoutInputSchema>;
export const cribStationCheckoutResultSchema = z.object({ checkouts: z.array(cribCheckoutSchema) });

export const CRIB_DAMAGE_NOTE_HINT = 'Say what is damaged, so it can be repaired.';

/** POST /api/station/crib/returns: a damaged tool needs a note for whoever repairs it. */
export const cribStationReturnInputSchema = z
  .object({
    tag: cribTagSchema,
    condition: cribConditionSchema,
    note: z
      .string()
      .trim()
      .max(1000, { error: 'Keep the note to 1000 characters.' })
      .nullish()
      .transform((value) => (value ? value : null)),
  })
  .refine((input) => input.condition !== 'damaged' || input.note !== null, { error: CRIB_DAMAGE_NOTE_HINT, path: ['note'] });
export type CribStationReturnInput = z.infer<typeof cribStationReturnInputSchema>;
