import { z } from 'zod';
import { badgeCodeSchema } from '../badges/schemas';
import { reasonSchema, rungSchema, UNKNOWN_BADGE } from '../clearance/schemas';
import { roleSchema } from '../people/roles';
import { checklistItemSchema } from '../trainings/schemas';

const pinField = z.string().regex(/^\d{4,6}$/, { error: 'Use 4 to 6 digits.' });

/**
 * Whatever the scanner typed: a code that is not a badge code is answered like an unknown badge,
 * so the station shows one message for every badge it cannot use.
 */
export const stationScanSchema = z.object({
  badge: z.string({ error: 'Scan or type a badge code.' }).trim().min(1, { error: 'Scan or type a badge code.' }).max(200),
});

export const runningSessionSchema = z.object({
  id: z.uuid(),
  memberFirstName: z.string(),
  startedAt: z.string(),
  own: z.boolean(),
});
export type RunningSession = z.infer<typeof runningSessionSchema>;

export const unknownBadgeReasonSchema = z.object({ code: z.literal(UNKNOWN_BADGE), message: z.string(), nextStep: z.string() });

/**
 * The machine's next live reservation as a scan sees it: whether it is the scanning member's own,
 * and whether they may check in for it now.
 */
export const scanReservationSchema = z.object({
  id: z.uuid(),
  startsAt: z.string(),
  endsAt: z.string(),
  own: z.boolean(),
  memberFirstName: z.string(),
  canCheckIn: z.boolean(),
});
export type ScanReservation = z.infer<typeof scanReservationSchema>;

/** The decision after a scan at a machine station: who, whether they may start, and every reason why not. */
export const stationScanResultSchema = z.object({
  // photoToken lets this station fetch the member's photo for a few minutes after the scan.
  member: z.object({ id: z.uuid(), firstName: z.string(), role: roleSchema, hasPhoto: z.boolean(), photoToken: z.string().nullable() }).nullable(),
  cleared: z.boolean(),
  reasons: z.array(z.union([reasonSchema, unknownBadgeReasonSchema])),
  rungs: z.array(rungSchema),
  canSupervise: z.boolean(),
  runningSession: runningSessionSchema.nullable(),
  requiresPin: z.boolean(),
  safetyChecklist: z.array(checklistItemSchema),
  // Optional so that a station built before reservations still reads the answer.
  nextReservation: scanReservationSchema.nullable().optional(),
});
export type StationScanResult = z.infer<typeof stationScanResultSchema>;

export const sessionStartSchema = z.object({
  badge: badgeCodeSchema,
  /** The ids of every safety item the member confirmed on the screen. */
  checklist: z.array(z.string().max(60)).max(60),
  pin: pinField.optional(),
});
export type SessionStart = z.infer<typeof sessionStartSchema>;

export const sessionStartedSchema = z.object({
  id: z.uuid(),
  startedAt: z.string(),
  member: z.object({ id: z.uuid(), firstName: z.string() }),
});
export type SessionStarted = z.infer<typeof sessionStartedSchema>;

/** An end pressed while offline carries the time it was pressed; the key makes a replay harmless. */
export const sessionEndSchema = z.object({
  badge: badgeCodeSchema.optional(),
  endedAt: z.iso.datetime({ offset: true, error: 'Give the time as an ISO 8601 date and time.' }).optional(),
  idempotencyKey: z.uuid({ error: 'Send a UUID as the idempotency key.' }),
});
export type SessionEnd = z.infer<typeof sessionEndSchema>;

/** How long after the press an offline end may still arrive with its own time. */
export const OFFLINE_END_MAX_HOURS = 24;

export const sessionEndedSchema = z.object({
  id: z.uuid(),
  startedAt: z.string(),
  endedAt: z.string(),
  hours: z.number(),
});
export type SessionEnded = z.infer<typeof sessionEndedSchema>;

export const stationStateSchema = z.object({
  machine: z.object({ id: z.uuid(), name: z.string(), category: z.string(), requiresPin: z.boolean() }),
  runningSession: runningSessionSchema.omit({ own: true }).extend({ memberId: z.uuid() }).nullable(),
  supervisorOnDuty: z.object({ firstName: z.string() }).nullable(),
  // memberId lets the running screen tell the running member's own reservation from someone else's.
  nextReservation: z.object({ startsAt: z.string(), endsAt: z.string(), memberId: z.uuid(), memberFirstName: z.string() }).nullable().optional(),
  // The machine's live reservations touching today's day rail (06:00–24:00 in the shop's zone), for its time bar.
  today: z
    .array(z.object({ startsAt: z.string(), endsAt: z.string(), kind: z.enum(['member', 'class']), memberFirstName: z.string() }))
    .optional(),
  // The machine's open tag-out: the station shows it out of service with its reason.
  taggedOut: z.object({ reason: z.string(), since: z.string() }).nullable().optional(),
});
export type StationState = z.infer<typeof stationStateSchema>;

export const reservationCheckInSchema = z.object({ badge: badgeCodeSchema });
export type ReservationCheckIn = z.infer<typeof reservationCheckInSchema>;

export const reservationCheckedInSchema = z.object({ id: z.uuid(), status: z.literal('checked_in') });
export type ReservationCheckedIn = z.infer<typeof reservationCheckedInSchema>;

export const stationDutySchema = z.object({ badge: badgeCodeSchema, pin: pinField });

export const stationDutyResultSchema = z.object({
  onDuty: z.boolean(),
  supervisor: z.object({ firstName: z.string() }),
});
export type StationDutyResult = z.infer<typeof stationDutyResultSchema>;

/** Without a heartbeat for this long a station's running session is closed at its last contact. */
export const HEARTBEAT_SILENCE_MINUTES = 3;
