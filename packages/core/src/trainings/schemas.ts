import { z } from 'zod';
import { machineCategorySchema } from '../shop/schemas';

/** A checklist item: a stable id (a slug) and the words shown. */
export const checklistItemSchema = z.object({
  id: z
    .string()
    .trim()
    .regex(/^[a-z0-9][a-z0-9-]{0,59}$/, { error: 'Use lower-case letters, digits and dashes.' }),
  label: z.string().trim().min(1, { error: 'Describe the item.' }).max(200, { error: 'Use at most 200 characters.' }),
});
export type ChecklistItem = z.infer<typeof checklistItemSchema>;

export const checklistSchema = z
  .array(checklistItemSchema)
  .max(40, { error: 'Use at most 40 items.' })
  .refine((items) => new Set(items.map((i) => i.id)).size === items.length, { error: 'Each item needs its own id.' });

/** Turns a label into an item id: "Removes the chuck key" → "removes-the-chuck-key". */
export function checklistItemId(label: string): string {
  return (
    label
      .toLowerCase()
      .normalize('NFKD')
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 60)
      .replace(/-+$/, '') || 'item'
  );
}

export const trainingSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  description: z.string(),
  checklist: z.array(checklistItemSchema),
  validityMonths: z.number().int(),
  active: z.boolean(),
  machineIds: z.array(z.uuid()),
});
export type Training = z.infer<typeof trainingSchema>;

export const trainingInputSchema = z.object({
  name: z.string().trim().min(1, { error: 'Give the training a name.' }).max(120, { error: 'Use at most 120 characters.' }),
  description: z.string().trim().max(2000, { error: 'Use at most 2000 characters.' }).default(''),
  checklist: checklistSchema.min(1, { error: 'List at least one practical item.' }),
  validityMonths: z.coerce
    .number({ error: 'Give the validity in months.' })
    .int({ error: 'Use whole months.' })
    .min(0, { error: '0 means it never lapses; use 0 or more.' })
    .max(120, { error: 'Use at most 120 months.' }),
  active: z.boolean().default(true),
});
export type TrainingInput = z.infer<typeof trainingInputSchema>;
export type TrainingFormValues = z.input<typeof trainingInputSchema>;

export const signOffLevels = ['supervised', 'independent'] as const;
export const signOffLevelSchema = z.enum(signOffLevels, { error: 'Choose supervised or independent.' });
export type SignOffLevel = z.infer<typeof signOffLevelSchema>;
export const signOffLevelLabels: Record<SignOffLevel, string> = {
  supervised: 'Supervised (only while a supervisor is on duty)',
  independent: 'Independent',
};

export const signOffCreateSchema = z.object({
  memberId: z.uuid({ error: 'Choose a member.' }),
  trainingId: z.uuid({ error: 'Choose a training.' }),
  level: signOffLevelSchema,
  /** The ids of the practical checklist items the instructor saw; every item must be there. */
  checklist: z.array(z.string().max(60)).max(40),
  note: z.string().trim().max(1000, { error: 'Use at most 1000 characters.' }).default(''),
});
export type SignOffCreate = z.infer<typeof signOffCreateSchema>;
export type SignOffCreateInput = z.input<typeof signOffCreateSchema>;

export const signOffRevokeSchema = z.object({
  reason: z.string().trim().min(3, { error: 'Say why, in a few words.' }).max(500, { error: 'Use at most 500 characters.' }),
});
export type SignOffRevoke = z.infer<typeof signOffRevokeSchema>;

export const signOffStateSchema = z.enum(['valid', 'expiring', 'expired', 'revoked']);

export const signOffSchema = z.object({
  id: z.uuid(),
  memberId: z.uuid(),
  memberName: z.string(),
  trainingId: z.uuid(),
  trainingName: z.string(),
  level: signOffLevelSchema,
  checklist: z.array(checklistItemSchema.extend({ seen: z.boolean() })),
  note: z.string(),
  signedBy: z.object({ id: z.uuid(), name: z.string() }),
  signedVia: z.enum(['web', 'station']),
  signedAt: z.string(),
  expiresAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
  revokeReason: z.string().nullable(),
  state: signOffStateSchema,
  /** Machines that require this training. */
  machines: z.array(z.object({ id: z.uuid(), name: z.string() })),
});
export type SignOff = z.infer<typeof signOffSchema>;

export const signOffReportQuerySchema = z.object({
  status: z.enum(['expiring', 'expired']).default('expiring'),
  format: z.enum(['json', 'csv']).default('json'),
});

export const machineDetailSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  category: machineCategorySchema,
  area: z.string(),
  areaId: z.uuid(),
  reservable: z.boolean(),
  meterHours: z.number(),
  description: z.string(),
  requiresPin: z.boolean(),
  safetyChecklist: z.array(checklistItemSchema),
  trainings: z.array(z.object({ id: z.uuid(), name: z.string() })),
});
export type MachineDetail = z.infer<typeof machineDetailSchema>;

export const machineInputSchema = z.object({
  name: z.string().trim().min(1, { error: 'Give the machine a name.' }).max(80, { error: 'Use at most 80 characters.' }),
  category: machineCategorySchema,
  areaId: z.uuid({ error: 'Choose an area.' }),
  reservable: z.boolean().default(false),
  description: z.string().trim().max(2000).default(''),
  requiresPin: z.boolean().default(false),
  safetyChecklist: checklistSchema.default([]),
  trainingIds: z.array(z.uuid()).max(20).default([]),
});
export type MachineInput = z.infer<typeof machineInputSchema>;
export type MachineFormValues = z.input<typeof machineInputSchema>;

export const areaSchema = z.object({ id: z.uuid(), name: z.string() });
export type Area = z.infer<typeof areaSchema>;

/** GET /api/machines: every machine with what a member needs to start on it. */
export const machineListSchema = z.array(machineDetailSchema);

export const areaListSchema = z.array(areaSchema);
export const trainingListSchema = z.array(trainingSchema);
export const signOffListSchema = z.array(signOffSchema);

/** GET /api/teach/members: the people an instructor may look up to sign off. */
export const TEACH_SEARCH_LIMIT = 20;
export const teachMemberQuerySchema = z.object({
  search: z.string().trim().max(100, { error: 'Use at most 100 characters.' }).default(''),
});
export const teachMemberSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  email: z.string(),
  active: z.boolean(),
});
export type TeachMember = z.infer<typeof teachMemberSchema>;
export const teachMemberListSchema = z.array(teachMemberSchema);
