import { z } from 'zod';
import { badgeCodeSchema } from '../badges/schemas';
import { roleSchema } from '../people/roles';
import { signOffLevelSchema, trainingSchema } from '../trainings/schemas';

export const stationKinds = ['machine', 'crib', 'board'] as const;

export const stationCreateSchema = z
  .object({
    machineId: z.uuid({ error: 'Choose a machine.' }).optional(),
    kind: z.enum(stationKinds).optional(),
    name: z.string().trim().max(80).optional(),
  })
  .refine((v) => (v.kind ?? 'machine') !== 'machine' || v.machineId, { error: 'A machine station needs a machine.', path: ['machineId'] });
export type StationCreate = z.infer<typeof stationCreateSchema>;

/** Pairing codes: 8 characters from an alphabet without look-alikes (no 0/O, 1/I/L). */
export const PAIRING_ALPHABET = 'ABCDEFGHJKMNPQRSTUVWXYZ23456789';
export const PAIRING_CODE_LENGTH = 8;
export const PAIRING_MINUTES = 10;
export const pairSchema = z.object({
  pairingCode: z
    .string({ error: 'Enter the pairing code.' })
    .trim()
    .toUpperCase()
    .transform((s) => s.replace(/[\s-]/g, ''))
    .pipe(z.string().regex(/^[A-Z0-9]{6,8}$/, { error: 'A pairing code has 6 to 8 letters and digits.' })),
});

export const stationSchema = z.object({
  id: z.uuid(),
  kind: z.enum(stationKinds),
  name: z.string(),
  machine: z.object({ id: z.uuid(), name: z.string() }).nullable(),
  pairedAt: z.string().nullable(),
  lastSeenAt: z.string().nullable(),
  revokedAt: z.string().nullable(),
  pairingExpiresAt: z.string().nullable(),
});
export type Station = z.infer<typeof stationSchema>;

/** What a paired device learns about itself from GET /api/station. */
export const stationSelfSchema = z.object({
  id: z.uuid(),
  kind: z.enum(stationKinds),
  name: z.string(),
  shopName: z.string(),
  machine: z
    .object({ id: z.uuid(), name: z.string(), category: z.string(), requiresPin: z.boolean() })
    .nullable(),
});
export type StationSelf = z.infer<typeof stationSelfSchema>;

export const stationInstructorSchema = z.object({
  badge: badgeCodeSchema,
  pin: z.string().regex(/^\d{4,6}$/, { error: 'Use 4 to 6 digits.' }),
});

export const stationSignOffSchema = z.object({
  instructorBadge: badgeCodeSchema,
  pin: z.string().regex(/^\d{4,6}$/, { error: 'Use 4 to 6 digits.' }),
  memberBadge: badgeCodeSchema,
  trainingId: z.uuid({ error: 'Choose a training.' }),
  level: signOffLevelSchema,
  checklist: z.array(z.string().max(60)).max(40),
  note: z.string().trim().max(1000).default(''),
});
export type StationSignOff = z.infer<typeof stationSignOffSchema>;

export const stationListSchema = z.array(stationSchema);

/** The answer to creating a station or asking for a new code: the code is shown this once. */
export const stationWithCodeSchema = stationSchema.extend({ pairingCode: z.string() });
export type StationWithCode = z.infer<typeof stationWithCodeSchema>;

/** The name of the device cookie that a paired station holds instead of a person's session. */
export const STATION_COOKIE = 'chuckkey.station';
/** Sent as `x-chuckkey-station: 1` on every state-changing station request: the station routes' CSRF defence. */
export const STATION_REQUEST_HEADER = 'x-chuckkey-station';

export const stationMemberLookupSchema = z.object({ badge: badgeCodeSchema });

/** A badge scanned at idle: the role lets the station open the instructor menu. */
export const stationMemberLookupResultSchema = z.union([
  z.object({
    member: z.object({ id: z.uuid(), firstName: z.string(), role: roleSchema }),
  }),
  z.object({
    member: z.null(),
    reason: z.enum(['unknown_badge', 'member_inactive']),
  }),
]);
export type StationMemberLookupResult = z.infer<typeof stationMemberLookupResultSchema>;

export const stationInstructorResultSchema = z.object({
  instructor: z.object({ id: z.uuid(), firstName: z.string() }),
  /** The active trainings the instructor can sign off, this station's machine's first. */
  trainings: z.array(trainingSchema),
});
export type StationInstructorResult = z.infer<typeof stationInstructorResultSchema>;
