import { z } from 'zod';

/** The rules a reservation is refused by, in the order they are checked; `overlap` is the database's. */
export const reservationRefusalCodes = [
  'not_reservable',
  'in_the_past',
  'bad_step',
  'too_long',
  'beyond_horizon',
  'suspended',
  'training_required',
  'outside_hours',
  'quota_exceeded',
  'overlap',
] as const;
export const reservationRefusalCodeSchema = z.enum(reservationRefusalCodes);
export type ReservationRefusalCode = z.infer<typeof reservationRefusalCodeSchema>;

export const reservationStatuses = ['active', 'checked_in', 'cancelled', 'released', 'no_show'] as const;
export const reservationStatusSchema = z.enum(reservationStatuses);
export type ReservationStatus = z.infer<typeof reservationStatusSchema>;

export const reservationKinds = ['member', 'class'] as const;
export type ReservationKind = (typeof reservationKinds)[number];

/** A machine's booking rules, as admins set them; every length is in whole minutes. */
export const reservationRulesSchema = z.object({
  slotMinutes: z.number().int(),
  maxMinutes: z.number().int(),
  bufferMinutes: z.number().int(),
  horizonDays: z.number().int(),
  weeklyQuotaMinutes: z.number().int(),
  checkInMinutes: z.number().int(),
  noShowGraceMinutes: z.number().int(),
  noShowLimit: z.number().int(),
  noShowWindowDays: z.number().int(),
  suspensionDays: z.number().int(),
});
export type ReservationRules = z.infer<typeof reservationRulesSchema>;

/** An instant with its offset, as a browser's `toISOString()` writes it; parsed into a Date. */
const instantSchema = (what: string) =>
  z.iso
    .datetime({ offset: true, error: `Give the ${what} as a date and time with its offset, e.g. 2026-03-14T09:00:00-05:00.` })
    .transform((value) => new Date(value));

/** Whether `to` comes after `from`; zod runs object checks even when a field failed, so both may be missing. */
const inOrder = (from: unknown, to: unknown): boolean => !(from instanceof Date && to instanceof Date) || to.getTime() > from.getTime();

/** POST /api/reservations */
export const reservationCreateSchema = z
  .object({
    machineId: z.uuid({ error: 'Choose a machine.' }),
    start: instantSchema('start'),
    end: instantSchema('end'),
  })
  .refine((value) => inOrder(value.start, value.end), { path: ['end'], error: 'The end must come after the start.' });
export type ReservationCreate = z.output<typeof reservationCreateSchema>;

export const reservationSchema = z.object({
  id: z.uuid(),
  machineId: z.uuid(),
  start: z.string(),
  end: z.string(),
  status: reservationStatusSchema,
});
export type Reservation = z.infer<typeof reservationSchema>;

/** A reservation in the member's own list, with the machine named. */
export const myReservationSchema = reservationSchema.extend({
  machineName: z.string(),
  kind: z.enum(reservationKinds),
  /** The class's title for a class meeting (one the member holds or is booked into), else null; the server always sends it. */
  classTitle: z.string().nullish(),
});
export type MyReservation = z.infer<typeof myReservationSchema>;

/** GET /api/reservations/mine: upcoming soonest first, past latest first. */
export const myReservationsSchema = z.object({
  upcoming: z.array(myReservationSchema),
  past: z.array(myReservationSchema),
});
export type MyReservations = z.infer<typeof myReservationsSchema>;

/** The longest span one availability request may cover: a little over a month of week views. */
export const AVAILABILITY_MAX_DAYS = 42;

/** GET /api/machines/:id/availability?from=&to= */
export const availabilityQuerySchema = z
  .object({ from: instantSchema('from time'), to: instantSchema('to time') })
  .refine((value) => inOrder(value.from, value.to), { path: ['to'], error: 'The end of the range must come after its start.' })
  .refine((value) => !(value.from instanceof Date && value.to instanceof Date) || value.to.getTime() - value.from.getTime() <= AVAILABILITY_MAX_DAYS * 86_400_000, {
    path: ['to'],
    error: `Ask for at most ${AVAILABILITY_MAX_DAYS} days at a time.`,
  });
export type AvailabilityQuery = z.output<typeof availabilityQuerySchema>;

/** A taken range, named by no one: the claim itself and its cleanup buffer after it. */
export const takenRangeSchema = z.object({
  start: z.string(),
  end: z.string(),
  blockedUntil: z.string(),
  kind: z.enum(reservationKinds),
  /** A class hold's class title (classes are public, as on the wall board); absent for members' reservations. */
  title: z.string().nullish(),
});
export type TakenRange = z.infer<typeof takenRangeSchema>;

export const availabilitySchema = z.object({
  machineId: z.uuid(),
  reservable: z.boolean(),
  timeZone: z.string(),
  from: z.string(),
  to: z.string(),
  rules: reservationRulesSchema,
  taken: z.array(takenRangeSchema),
});
export type Availability = z.infer<typeof availabilitySchema>;

const wholeMinutes = (what: string, min: number, max: number) =>
  z
    .number({ error: `Give the ${what} as a whole number.` })
    .int({ error: `Give the ${what} as a whole number.` })
    .min(min, { error: `The ${what} must be at least ${min}.` })
    .max(max, { error: `The ${what} can be at most ${max}.` });

/** PUT /api/machines/:id/reservation-rules: the whole set, with the ranges the table checks. */
export const reservationRulesInputSchema = z
  .object({
    reservable: z.boolean({ error: 'Say whether the machine can be reserved.' }),
    slotMinutes: wholeMinutes('slot step (minutes)', 5, 240),
    maxMinutes: wholeMinutes('longest reservation (minutes)', 5, 1440),
    bufferMinutes: wholeMinutes('buffer after each reservation (minutes)', 0, 240),
    horizonDays: wholeMinutes('booking horizon (days)', 1, 365),
    weeklyQuotaMinutes: wholeMinutes('weekly quota (minutes)', 0, 10080),
    checkInMinutes: wholeMinutes('check-in window (minutes)', 0, 120),
    noShowGraceMinutes: wholeMinutes('no-show grace (minutes)', 0, 120),
    noShowLimit: wholeMinutes('no-show limit', 1, 100),
    noShowWindowDays: wholeMinutes('no-show window (days)', 1, 365),
    suspensionDays: wholeMinutes('suspension (days)', 0, 365),
  })
  .superRefine((value, ctx) => {
    if (typeof value.slotMinutes !== 'number' || typeof value.maxMinutes !== 'number') return;
    // Steps that divide the day keep every day's slots on the same clock times.
    if (1440 % value.slotMinutes !== 0) ctx.addIssue({ code: 'custom', path: ['slotMinutes'], message: 'The slot step must divide the day evenly (e.g. 10, 15, 20, 30 or 60 minutes).' });
    else if (value.maxMinutes < value.slotMinutes || value.maxMinutes % value.slotMinutes !== 0) {
      ctx.addIssue({ code: 'custom', path: ['maxMinutes'], message: `The longest reservation must be a whole number of ${value.slotMinutes}-minute steps.` });
    }
  });
export type ReservationRulesInput = z.output<typeof reservationRulesInputSchema>;

export const machineReservationRulesSchema = z.object({
  machineId: z.uuid(),
  reservable: z.boolean(),
  rules: reservationRulesSchema,
});
export type MachineReservationRules = z.infer<typeof machineReservationRulesSchema>;

/** POST /api/profile/calendar-feed: the private feed address, answered once. */
export const calendarFeedCreatedSchema = z.object({ url: z.url() });
export type CalendarFeedCreated = z.infer<typeof calendarFeedCreatedSchema>;

/** Whether the member has a feed and since when; its address is never given again (only its hash is kept). */
export const calendarFeedStatusSchema = z.object({ exists: z.boolean(), createdAt: z.string().nullable() });
export type CalendarFeedStatus = z.infer<typeof calendarFeedStatusSchema>;

/** GET /api/calendar/:token.ics: the feed's secret, as the server makes them (URL-safe base64). */
export const calendarFeedParamsSchema = z.object({
  token: z.string().regex(/^[A-Za-z0-9_-]{20,100}$/, { error: 'Not a calendar feed address.' }),
});

export const RESERVATION_LIST_PAGE_SIZE = 50;

/** GET /api/reservations and /api/reservations/export.csv (admins): every filter optional. */
export const reservationListQuerySchema = z
  .object({
    from: instantSchema('from time').optional(),
    to: instantSchema('to time').optional(),
    machineId: z.uuid({ error: 'Choose a machine.' }).optional(),
    status: reservationStatusSchema.optional(),
    page: z.coerce.number().int().min(1).default(1),
  })
  .refine((value) => inOrder(value.from, value.to), { path: ['to'], error: 'The end of the range must come after its start.' });
export type ReservationListQuery = z.output<typeof reservationListQuerySchema>;

export const reservationListItemSchema = z.object({
  id: z.uuid(),
  machine: z.object({ id: z.uuid(), name: z.string() }),
  member: z.object({ id: z.uuid(), firstName: z.string(), lastName: z.string() }),
  start: z.string(),
  end: z.string(),
  status: reservationStatusSchema,
  kind: z.enum(reservationKinds),
});
export type ReservationListItem = z.infer<typeof reservationListItemSchema>;

export const reservationListSchema = z.object({
  items: z.array(reservationListItemSchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type ReservationList = z.infer<typeof reservationListSchema>;
