import { z } from 'zod';

export const machineCategories = [
  'lathe',
  'mill',
  'mig_welder',
  'tig_welder',
  'band_saw',
  'drill_press',
  'surface_grinder',
] as const;
export const machineCategorySchema = z.enum(machineCategories);
export type MachineCategory = z.infer<typeof machineCategorySchema>;

export const machineCategoryLabels: Record<MachineCategory, string> = {
  lathe: 'Engine lathe',
  mill: 'Milling machine',
  mig_welder: 'MIG welder',
  tig_welder: 'TIG welder',
  band_saw: 'Band saw',
  drill_press: 'Drill press',
  surface_grinder: 'Surface grinder',
};

export const shopSchema = z.object({
  name: z.string(),
  town: z.string(),
  timeZone: z.string(),
});
export type Shop = z.infer<typeof shopSchema>;

export const machineSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  category: machineCategorySchema,
  area: z.string(),
  reservable: z.boolean(),
  meterHours: z.number(),
});
export type Machine = z.infer<typeof machineSchema>;

export const outboxAttachmentSchema = z.object({
  filename: z.string().nullable(),
  contentType: z.string(),
  size: z.number().int(),
});
export type OutboxAttachment = z.infer<typeof outboxAttachmentSchema>;

export const outboxMessageSchema = z.object({
  id: z.uuid(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  receivedAt: z.string(),
  attachments: z.array(outboxAttachmentSchema),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;
export const outboxAttachmentParamsSchema = z.object({
  id: z.uuid({ error: 'Not a valid id.' }),
  index: z.coerce.number({ error: 'Not a valid attachment number.' }).int({ error: 'Not a valid attachment number.' }).min(0, { error: 'Not a valid attachment number.' }),
});
export const outboxListSchema = z.object({ items: z.array(outboxMessageSchema), total: z.number().int() });

export const healthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  database: z.enum(['ok', 'down']),
});
