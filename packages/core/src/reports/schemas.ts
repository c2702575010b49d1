import { z } from 'zod';
import { clearanceCodes, clearanceRuleSchema, UNKNOWN_BADGE } from '../clearance/schemas';

/** The reason codes a recorded denial can carry: every clearance code, and a badge that belongs to no one. */
export const denialCodes = [...clearanceCodes, UNKNOWN_BADGE] as const;
export const denialCodeSchema = z.enum(denialCodes);
export type DenialCode = z.infer<typeof denialCodeSchema>;

export const usageGroupings = ['machine', 'member', 'day'] as const;
export const usageGroupingSchema = z.enum(usageGroupings);
export type UsageGrouping = z.infer<typeof usageGroupingSchema>;

export const usageCsvTables = ['rows', 'heatmap', 'reservations', 'denials', 'trainings', 'signOffs'] as const;
export const usageCsvTableSchema = z.enum(usageCsvTables);
export type UsageCsvTable = z.infer<typeof usageCsvTableSchema>;

/** The longest range one report covers, in calendar days counted inclusively. */
export const USAGE_REPORT_MAX_DAYS = 400;

const calendarDate = (what: string) => z.iso.date({ error: `Give the ${what} as a date, e.g. 2026-03-14.` });

/** Days from `from` to `to`, both counted; ISO dates read as UTC midnights so no offset shifts them. */
export function daysInRange(from: string, to: string): number {
  return Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / 86_400_000) + 1;
}

/** GET /api/reports/usage: shop-calendar dates, both included. */
export const usageReportQuerySchema = z
  .object({
    from: calendarDate('first day'),
    to: calendarDate('last day'),
    groupBy: usageGroupingSchema.default('machine'),
    format: z.enum(['json', 'csv']).default('json'),
    table: usageCsvTableSchema.default('rows'),
  })
  .superRefine((value, ctx) => {
    // zod runs object checks even when a field failed; only compare two valid dates.
    if (!/^\d{4}-\d{2}-\d{2}$/.test(value.from ?? '') || !/^\d{4}-\d{2}-\d{2}$/.test(value.to ?? '')) return;
    const days = daysInRange(value.from, value.to);
    if (days < 1) ctx.addIssue({ code: 'custom', path: ['to'], message: 'The last day must not come before the first day.' });
    else if (days > USAGE_REPORT_MAX_DAYS)
      ctx.addIssue({ code: 'custom', path: ['to'], message: `A report covers at most ${USAGE_REPORT_MAX_DAYS} days.` });
  });
export type UsageReportQuery = z.output<typeof usageReportQuerySchema>;

export const usageMachineRowSchema = z.object({
  machineId: z.uuid(),
  machineName: z.string(),
  sessions: z.number().int(),
  /** Hours of use inside the range, whether or not the shop was open. */
  hours: z.number(),
  /** The shop's open hours in the range, from its weekly hours less its closures. */
  openHours: z.number(),
  /** Hours of use inside open hours ÷ open hours, 0–1; null when the shop was never open in the range. */
  utilization: z.number().nullable(),
});
export type UsageMachineRow = z.infer<typeof usageMachineRowSchema>;

export const usageMemberRowSchema = z.object({
  memberId: z.uuid(),
  memberName: z.string(),
  sessions: z.number().int(),
  hours: z.number(),
});
export type UsageMemberRow = z.infer<typeof usageMemberRowSchema>;

export const usageDayRowSchema = z.object({
  /** A shop-calendar date, 'YYYY-MM-DD'. */
  date: z.string(),
  sessions: z.number().int(),
  hours: z.number(),
});
export type UsageDayRow = z.infer<typeof usageDayRowSchema>;

export const usageHeatmapCellSchema = z.object({
  /** ISO 8601 weekday on the shop's wall clock: 1 Monday … 7 Sunday. */
  weekday: z.number().int().min(1).max(7),
  hour: z.number().int().min(0).max(23),
  hours: z.number(),
});
export type UsageHeatmapCell = z.infer<typeof usageHeatmapCellSchema>;

export const usageReservationsSchema = z.object({
  made: z.number().int(),
  /** Checked in at the station. */
  used: z.number().int(),
  noShows: z.number().int(),
  cancelled: z.number().int(),
});
export type UsageReservations = z.infer<typeof usageReservationsSchema>;

export const usageDenialSchema = z.object({
  code: denialCodeSchema,
  /** The rule of the ladder the code belongs to; null for a badge that belongs to no one. */
  rule: clearanceRuleSchema.nullable(),
  count: z.number().int(),
});
export type UsageDenial = z.infer<typeof usageDenialSchema>;

export const usageTrainingDemandSchema = z.object({
  trainingId: z.uuid(),
  trainingName: z.string(),
  count: z.number().int(),
});
export type UsageTrainingDemand = z.infer<typeof usageTrainingDemandSchema>;

export const usageSignOffsSchema = z.object({
  instructorId: z.uuid(),
  instructorName: z.string(),
  count: z.number().int(),
});
export type UsageSignOffs = z.infer<typeof usageSignOffsSchema>;

const base = {
  from: z.string(),
  to: z.string(),
  /** The shop's IANA time zone, the wall clock of the dates, days and heatmap. */
  timeZone: z.string(),
  heatmap: z.array(usageHeatmapCellSchema),
  reservations: usageReservationsSchema,
  /** Refused scans by reason, most first. */
  denials: z.array(usageDenialSchema),
  /** Trainings members were refused for lacking (missing or expired sign-off), most first. */
  trainingsInDemand: z.array(usageTrainingDemandSchema),
  /** Sign-offs given in the range per instructor, most first. */
  signOffs: z.array(usageSignOffsSchema),
};

/** GET /api/reports/usage: the rows follow `groupBy`. */
export const usageReportSchema = z.discriminatedUnion('groupBy', [
  z.object({ ...base, groupBy: z.literal('machine'), rows: z.array(usageMachineRowSchema) }),
  z.object({ ...base, groupBy: z.literal('member'), rows: z.array(usageMemberRowSchema) }),
  z.object({ ...base, groupBy: z.literal('day'), rows: z.array(usageDayRowSchema) }),
]);
export type UsageReport = z.infer<typeof usageReportSchema>;
