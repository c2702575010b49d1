import { z } from 'zod';

export const incidentKinds = ['injury', 'near_miss', 'damage'] as const;
export const incidentKindSchema = z.enum(incidentKinds, { error: 'Choose injury, near miss or damage.' });
export type IncidentKind = z.infer<typeof incidentKindSchema>;
export const incidentKindLabels: Record<IncidentKind, string> = {
  injury: 'Injury',
  near_miss: 'Near miss',
  damage: 'Damage',
};

export const incidentStatuses = ['open', 'under_review', 'closed'] as const;
export const incidentStatusSchema = z.enum(incidentStatuses, { error: 'Choose open, under review or closed.' });
export type IncidentStatus = z.infer<typeof incidentStatusSchema>;
export const incidentStatusLabels: Record<IncidentStatus, string> = {
  open: 'Open',
  under_review: 'Under review',
  closed: 'Closed',
};

/** The limits of a report's photos; the form states them and the server enforces them. */
export const INCIDENT_PHOTO_MAX_COUNT = 5;
export const INCIDENT_PHOTO_MAX_BYTES = 10 * 1024 * 1024;
export const INCIDENT_PHOTO_TYPES = ['image/jpeg', 'image/png'] as const;

// The report arrives as multipart/form-data, where a field left empty is an empty string.
const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, { error: `Keep it to ${max.toLocaleString('en-US')} characters.` })
    .optional()
    .transform((value) => (value ? value : undefined));
const optionalId = (message: string) =>
  z
    .union([z.literal(''), z.uuid({ error: message })], { error: message })
    .optional()
    .transform((value) => (value ? value : undefined));

/** How far ahead of the server's clock a report's time may be: a phone's clock runs a little off. */
export const INCIDENT_CLOCK_SKEW_MS = 10 * 60 * 1000;

/** POST /api/incidents (the fields beside the photos). */
export const incidentReportSchema = z
  .object({
    occurredAt: z.iso
      .datetime({ offset: true, error: 'Say when it happened.' })
      // A value that is no time at all has its error already; this speaks only of real times.
      .refine((value) => !(Date.parse(value) > Date.now() + INCIDENT_CLOCK_SKEW_MS), { error: 'That time has not come yet.' }),
    areaId: optionalId('Choose an area of the shop.'),
    location: optionalText(200),
    machineId: optionalId('Choose a machine from the list.'),
    kind: incidentKindSchema,
    description: z
      .string({ error: 'Say what happened.' })
      .trim()
      .min(10, { error: 'Say what happened, in a sentence or two.' })
      .max(5000, { error: 'Keep it to 5,000 characters.' }),
    firstAid: optionalText(2000),
  })
  .refine((report) => Boolean(report.areaId) || Boolean(report.location?.trim()), {
    error: 'Say where it happened: choose an area or describe the place.',
    path: ['location'],
    // Checked even when other fields are wrong, so the form shows every mistake at once.
    when: () => true,
  });
export type IncidentReportInput = z.input<typeof incidentReportSchema>;
export type IncidentReport = z.output<typeof incidentReportSchema>;

/** PATCH /api/incidents/:id: the admins' review moves a report along. */
export const incidentReviewSchema = z.object({ status: incidentStatusSchema });
export type IncidentReview = z.infer<typeof incidentReviewSchema>;

/** POST /api/incidents/:id/notes: a follow-up note, never edited afterwards. */
export const incidentNoteInputSchema = z.object({
  note: z
    .string({ error: 'Write the note.' })
    .trim()
    .min(1, { error: 'Write the note.' })
    .max(4000, { error: 'Keep the note to 4,000 characters.' }),
});
export type IncidentNoteInput = z.infer<typeof incidentNoteInputSchema>;

export const incidentListQuerySchema = z.object({
  status: incidentStatusSchema.optional(),
  kind: incidentKindSchema.optional(),
});
export type IncidentListQuery = z.infer<typeof incidentListQuerySchema>;

export const incidentPhotoParamsSchema = z.object({
  id: z.uuid({ error: 'Not a valid id.' }),
  n: z.coerce
    .number({ error: 'Photos are numbered 1 to 5.' })
    .int({ error: 'Photos are numbered 1 to 5.' })
    .min(1, { error: 'Photos are numbered 1 to 5.' })
    .max(INCIDENT_PHOTO_MAX_COUNT, { error: 'Photos are numbered 1 to 5.' }),
});

const named = z.object({ id: z.uuid(), name: z.string() });

export const incidentSummarySchema = z.object({
  id: z.uuid(),
  occurredAt: z.string(),
  kind: incidentKindSchema,
  status: incidentStatusSchema,
  area: named.nullable(),
  location: z.string().nullable(),
  machine: named.nullable(),
  reportedBy: named.nullable(),
  reportedAt: z.string(),
  photoCount: z.number().int(),
});
export type IncidentSummary = z.infer<typeof incidentSummarySchema>;

export const incidentNoteSchema = z.object({
  id: z.uuid(),
  author: named.nullable(),
  at: z.string(),
  note: z.string(),
});
export type IncidentNote = z.infer<typeof incidentNoteSchema>;

export const incidentPhotoSchema = z.object({
  n: z.number().int(),
  contentType: z.enum(INCIDENT_PHOTO_TYPES),
  size: z.number().int(),
});
export type IncidentPhoto = z.infer<typeof incidentPhotoSchema>;

export const incidentSchema = incidentSummarySchema.extend({
  description: z.string(),
  firstAid: z.string().nullable(),
  photos: z.array(incidentPhotoSchema),
  notes: z.array(incidentNoteSchema),
});
export type Incident = z.infer<typeof incidentSchema>;

export const incidentListSchema = z.object({ items: z.array(incidentSummarySchema) });
export type IncidentList = z.infer<typeof incidentListSchema>;
