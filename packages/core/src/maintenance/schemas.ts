import { z } from 'zod';
import { maintenanceStatuses } from './due';

const interval = (unit: 'hours' | 'days', max: number) =>
  z
    .number({ error: `Every so many ${unit} is a whole number.` })
    .int({ error: `Every so many ${unit} is a whole number.` })
    .min(1, { error: `Every so many ${unit} is at least 1.` })
    .max(max, { error: `Keep it to ${max.toLocaleString('en-US')} ${unit}.` })
    .nullable()
    .default(null);

/** POST /api/machines/:id/maintenance and PUT /api/maintenance/:id: the whole task. */
export const maintenanceTaskInputSchema = z
  .object({
    name: z
      .string({ error: 'Name the task.' })
      .trim()
      .min(1, { error: 'Name the task.' })
      .max(200, { error: 'Keep the name to 200 characters.' }),
    instructions: z.string().trim().max(4000, { error: 'Keep the instructions to 4,000 characters.' }).default(''),
    everyHours: interval('hours', 100_000),
    everyDays: interval('days', 3650),
    blocking: z.boolean().default(false),
    active: z.boolean().default(true),
  })
  .refine((task) => task.everyHours !== null || task.everyDays !== null, {
    error: 'Say how often: every so many meter hours, every so many days, or both.',
    path: ['everyHours'],
  });
export type MaintenanceTaskInput = z.infer<typeof maintenanceTaskInputSchema>;

/** POST /api/maintenance/:id/complete: what was found or done, for the machine's record. */
export const maintenanceCompleteSchema = z.object({
  note: z.string().trim().max(1000, { error: 'Keep the note to 1,000 characters.' }).default(''),
});
export type MaintenanceComplete = z.infer<typeof maintenanceCompleteSchema>;

export const maintenanceStatusSchema = z.enum(maintenanceStatuses);

export const maintenanceTaskSchema = z.object({
  id: z.uuid(),
  machine: z.object({ id: z.uuid(), name: z.string(), meterHours: z.number() }),
  name: z.string(),
  instructions: z.string(),
  everyHours: z.number().int().nullable(),
  everyDays: z.number().int().nullable(),
  blocking: z.boolean(),
  active: z.boolean(),
  createdAt: z.string(),
  status: maintenanceStatusSchema,
  nextDueHours: z.number().nullable(),
  nextDueDate: z.string().nullable(),
  lastDone: z.object({ doneAt: z.string(), meterHours: z.number() }).nullable(),
});
export type MaintenanceTask = z.infer<typeof maintenanceTaskSchema>;

export const maintenanceCompletionSchema = z.object({
  id: z.number().int(),
  taskId: z.uuid(),
  taskName: z.string(),
  doneAt: z.string(),
  meterHours: z.number(),
  doneBy: z.object({ id: z.uuid(), name: z.string() }).nullable(),
  note: z.string(),
});
export type MaintenanceCompletion = z.infer<typeof maintenanceCompletionSchema>;

/** GET /api/machines/:id/maintenance: every task of the machine, active or not, and its history, newest first. */
export const machineMaintenanceSchema = z.object({
  machine: z.object({ id: z.uuid(), name: z.string(), meterHours: z.number() }),
  tasks: z.array(maintenanceTaskSchema),
  history: z.array(maintenanceCompletionSchema),
});
export type MachineMaintenance = z.infer<typeof machineMaintenanceSchema>;
