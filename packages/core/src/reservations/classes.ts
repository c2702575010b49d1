import { TZDate } from '@date-fns/tz';
import { addWeeks } from 'date-fns';
import { z } from 'zod';
import { reservationStatusSchema } from './schemas';

/** The most weeks one class runs: half a year of a weekly course. */
export const CLASS_MAX_WEEKS = 26;
export const CLASS_MAX_CAPACITY = 500;
export const CLASS_TITLE_MAX = 120;
/** How far ahead GET /api/classes looks when no range is given. */
export const CLASS_LIST_DEFAULT_WEEKS = 8;
/** The longest range one GET /api/classes may cover. */
export const CLASS_LIST_MAX_DAYS = 366;

const instantSchema = (what: string) =>
  z.iso
    .datetime({ offset: true, error: `Give the ${what} as a date and time with its offset, e.g. 2026-03-14T09:00:00-05:00.` })
    .transform((value) => new Date(value));

const memberIdsSchema = z
  .array(z.uuid({ error: 'Every member must be given by their id.' }), { error: 'Give the members as a list of ids.' })
  .max(CLASS_MAX_CAPACITY, { error: `A class can have at most ${CLASS_MAX_CAPACITY} members.` })
  .transform((ids) => [...new Set(ids)]);

/** POST /api/classes */
export const classCreateSchema = z
  .object({
    machineId: z.uuid({ error: 'Choose a machine.' }),
    trainingId: z.uuid({ error: 'Choose a training, or none.' }).nullish().transform((value) => value ?? null),
    title: z
      .string({ error: 'Give the class a title.' })
      .trim()
      .min(1, { error: 'Give the class a title.' })
      .max(CLASS_TITLE_MAX, { error: `A class title can be at most ${CLASS_TITLE_MAX} characters.` }),
    start: instantSchema('start'),
    end: instantSchema('end'),
    weeks: z
      .number({ error: 'Give the number of weeks as a whole number.' })
      .int({ error: 'Give the number of weeks as a whole number.' })
      .min(1, { error: 'A class runs for at least 1 week.' })
      .max(CLASS_MAX_WEEKS, { error: `A class can repeat for at most ${CLASS_MAX_WEEKS} weeks.` })
      .default(1),
    capacity: z
      .number({ error: 'Give the capacity as a whole number.' })
      .int({ error: 'Give the capacity as a whole number.' })
      .min(1, { error: 'A class has room for at least 1 member.' })
      .max(CLASS_MAX_CAPACITY, { error: `A class can have room for at most ${CLASS_MAX_CAPACITY} members.` })
      .nullish()
      .transform((value) => value ?? null),
    memberIds: memberIdsSchema.default([]),
  })
  .superRefine((value, ctx) => {
    if (value.start instanceof Date && value.end instanceof Date && value.end.getTime() <= value.start.getTime()) {
      ctx.addIssue({ code: 'custom', path: ['end'], message: 'The end must come after the start.' });
    }
    if (value.start instanceof Date && value.end instanceof Date && value.end.getTime() - value.start.getTime() > 86_400_000) {
      ctx.addIssue({ code: 'custom', path: ['end'], message: 'A class meets for at most a day at a time.' });
    }
    if (typeof value.capacity === 'number' && Array.isArray(value.memberIds) && value.memberIds.length > value.capacity) {
      ctx.addIssue({ code: 'custom', path: ['memberIds'], message: `The class has room for ${value.capacity} members; ${value.memberIds.length} were given.` });
    }
  });
export type ClassCreate = z.output<typeof classCreateSchema>;

/** PUT /api/classes/:id/members: the whole list of members booked into the class. */
export const classMembersInputSchema = z.object({ memberIds: memberIdsSchema });
export type ClassMembersInput = z.output<typeof classMembersInputSchema>;

/** GET /api/classes?from=&to= (both optional: from now, for eight weeks). */
export const classListQuerySchema = z
  .object({ from: instantSchema('from time').optional(), to: instantSchema('to time').optional() })
  .refine((value) => !(value.from && value.to) || value.to.getTime() > value.from.getTime(), { path: ['to'], error: 'The end of the range must come after its start.' })
  .refine((value) => !(value.from && value.to) || value.to.getTime() - value.from.getTime() <= CLASS_LIST_MAX_DAYS * 86_400_000, {
    path: ['to'],
    error: `Ask for at most ${CLASS_LIST_MAX_DAYS} days at a time.`,
  });
export type ClassListQuery = z.output<typeof classListQuerySchema>;

/** DELETE /api/classes/:id/occurrences/:reservationId */
export const classOccurrenceParamsSchema = z.object({
  id: z.uuid({ error: 'Not a class id.' }),
  reservationId: z.uuid({ error: 'Not an occurrence id.' }),
});

export const classOccurrenceSchema = z.object({
  reservationId: z.uuid(),
  startsAt: z.string(),
  endsAt: z.string(),
  status: reservationStatusSchema,
});
export type ClassOccurrence = z.infer<typeof classOccurrenceSchema>;

export const classMemberSchema = z.object({ id: z.uuid(), firstName: z.string(), lastName: z.string() });
export type ClassMember = z.infer<typeof classMemberSchema>;

/**
 * A class as its instructor, an admin or a member sees it. `members` (names) is there for
 * instructors and admins only; everyone gets `booked` (whether the reader is in it) and the count.
 */
export const classSchema = z.object({
  id: z.uuid(),
  title: z.string(),
  machineId: z.uuid(),
  machineName: z.string(),
  trainingId: z.uuid().nullable(),
  trainingName: z.string().nullable(),
  instructor: z.object({ id: z.uuid(), firstName: z.string() }),
  weeks: z.number().int(),
  rrule: z.string().nullable(),
  capacity: z.number().int().nullable(),
  cancelledAt: z.string().nullable(),
  occurrences: z.array(classOccurrenceSchema),
  members: z.array(classMemberSchema).optional(),
  memberCount: z.number().int(),
  booked: z.boolean(),
});
export type ClassDetail = z.infer<typeof classSchema>;

export const classListSchema = z.object({ from: z.string(), to: z.string(), classes: z.array(classSchema) });
export type ClassList = z.infer<typeof classListSchema>;

export interface ClassOccurrenceTimes {
  start: Date;
  end: Date;
}

/**
 * The class's meetings: the first one and then the same weekday and wall-clock times of the shop's
 * zone each following week, so a 9:00 class stays at 9:00 local when the clocks change between
 * two meetings (its UTC instant moves by the hour instead).
 */
export function weeklyOccurrences(first: ClassOccurrenceTimes, weeks: number, timeZone: string): ClassOccurrenceTimes[] {
  const start = new TZDate(first.start.getTime(), timeZone);
  const end = new TZDate(first.end.getTime(), timeZone);
  return Array.from({ length: weeks }, (_, week) => ({
    start: new Date(addWeeks(start, week).getTime()),
    end: new Date(addWeeks(end, week).getTime()),
  }));
}

/** The RFC 5545 RRULE value of a class meeting `weeks` times weekly, or null when it meets once. */
export function classRrule(weeks: number): string | null {
  return weeks > 1 ? `FREQ=WEEKLY;COUNT=${weeks}` : null;
}

/** The instant a shop-calendar date ('YYYY-MM-DD') shows a wall-clock time ('HH:MM') in the zone. */
export function wallClockInstant(date: string, clock: string, timeZone: string): Date {
  const [year, month, day] = date.split('-').map(Number) as [number, number, number];
  const [hour, minute] = clock.split(':').map(Number) as [number, number];
  return new Date(new TZDate(year, month - 1, day, hour, minute, timeZone).getTime());
}
