import { z } from 'zod';

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
