import { z } from 'zod';
import { badgeCodeSchema } from '../badges/schemas';

/** POST /api/machines/:id/tag-out: anyone signed in may take a machine out of service. */
export const tagOutCreateSchema = z.object({
  reason: z
    .string({ error: 'Say what is wrong with the machine.' })
    .trim()
    .min(3, { error: 'Say what is wrong with the machine.' })
    .max(500, { error: 'Keep the reason to 500 characters.' }),
});
export type TagOutCreate = z.infer<typeof tagOutCreateSchema>;

/** POST /api/machines/:id/tag-out/clear: what was done, for the machine's record. */
export const tagOutClearSchema = z.object({
  note: z
    .string({ error: 'Say what was done to put the machine back in service.' })
    .trim()
    .min(1, { error: 'Say what was done to put the machine back in service.' })
    .max(1000, { error: 'Keep the note to 1,000 characters.' }),
});
export type TagOutClear = z.infer<typeof tagOutClearSchema>;

export const tagOutSchema = z.object({
  id: z.uuid(),
  machineId: z.uuid(),
  reason: z.string(),
  reportedAt: z.string(),
});
export type TagOut = z.infer<typeof tagOutSchema>;

export const clearedTagOutSchema = tagOutSchema.extend({
  clearedAt: z.string(),
  clearNote: z.string(),
});
export type ClearedTagOut = z.infer<typeof clearedTagOutSchema>;

/** GET /api/tag-outs?open=true|false: the open ones (the default) or the cleared ones. */
export const tagOutListQuerySchema = z.object({
  open: z
    .enum(['true', 'false'], { error: 'Give open=true or open=false.' })
    .optional()
    .transform((value) => value !== 'false'),
});
export type TagOutListQuery = z.infer<typeof tagOutListQuerySchema>;

const personNameSchema = z.object({ id: z.uuid(), firstName: z.string(), lastName: z.string() });

export const tagOutListItemSchema = tagOutSchema.extend({
  machineName: z.string(),
  /** Null once the reporter's record is gone. */
  reportedBy: personNameSchema.nullable(),
  clearedAt: z.string().nullable(),
  clearedBy: personNameSchema.nullable(),
  clearNote: z.string().nullable(),
});
export type TagOutListItem = z.infer<typeof tagOutListItemSchema>;

export const tagOutListSchema = z.object({ items: z.array(tagOutListItemSchema) });
export type TagOutList = z.infer<typeof tagOutListSchema>;

/**
 * The reasons a station offers as large buttons, the common faults of a metal shop's machines
 * (common practice); "Other…" opens the keyboard for the member's own words.
 */
export const stationTagOutReasons = ['Strange noise', 'Guard damaged', 'Coolant leak', 'Electrical smell'] as const;

/**
 * POST /api/station/tag-out: the reporter is the member whose badge is scanned, or without a
 * badge the member of the machine's running session.
 */
export const stationTagOutSchema = tagOutCreateSchema.extend({
  badge: badgeCodeSchema.optional(),
});
export type StationTagOut = z.infer<typeof stationTagOutSchema>;

export const stationTagOutResultSchema = z.object({
  tagOut: tagOutSchema,
  /** The session the tag-out ended, or null when none was running. */
  endedSessionId: z.uuid().nullable(),
});
export type StationTagOutResult = z.infer<typeof stationTagOutResultSchema>;
