import { CLASS_MAX_CAPACITY, CLASS_MAX_WEEKS, CLASS_TITLE_MAX, wallTimeToInstant, weeklyOccurrences, type ClassDetail, type ClassOccurrence, type ClassOccurrenceTimes } from '@chuckkey/core';
import { z } from 'zod';
import type { ClassRequestBody } from '../api/create-class';

const MINUTE = 60_000;

/** Classes are planned in half hours, from half an hour to a full working day. */
export const CLASS_LENGTH_STEP = 30;
export const CLASS_LENGTH_MAX = 8 * 60;
export const classLengths: readonly number[] = Array.from({ length: CLASS_LENGTH_MAX / CLASS_LENGTH_STEP }, (_, i) => (i + 1) * CLASS_LENGTH_STEP);

const wholeNumberIn = (min: number, max: number) => (value: string) => /^\d+$/.test(value.trim()) && Number(value) >= min && Number(value) <= max;

/**
 * The form's fields as the browser holds them (text), checked and turned into numbers. The
 * instants are worked out afterwards, on the shop's clock, by `planClassHold`.
 */
export const classHoldFormSchema = z
  .object({
    machineId: z.string().min(1, { error: 'Choose the machine to hold.' }),
    trainingId: z.string(),
    title: z
      .string()
      .trim()
      .min(1, { error: 'Give the class a title.' })
      .max(CLASS_TITLE_MAX, { error: `A class title can be at most ${CLASS_TITLE_MAX} characters.` }),
    date: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, { error: 'Choose the date of the first class.' }),
    startTime: z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, { error: 'Choose the time the class starts.' }),
    lengthMinutes: z.string().refine((value) => classLengths.includes(Number(value)), { error: 'Choose how long each class lasts.' }),
    weeks: z.string().refine(wholeNumberIn(1, CLASS_MAX_WEEKS), { error: `Give a whole number of weeks from 1 (once) to ${CLASS_MAX_WEEKS}.` }),
    capacity: z
      .string()
      .refine((value) => value.trim() === '' || wholeNumberIn(1, CLASS_MAX_CAPACITY)(value), { error: `Leave it empty, or give a whole number from 1 to ${CLASS_MAX_CAPACITY}.` }),
  })
  .transform((value) => {
    const [hours = 0, minutes = 0] = value.startTime.split(':').map(Number);
    return {
      machineId: value.machineId,
      trainingId: value.trainingId === '' ? null : value.trainingId,
      title: value.title,
      date: value.date,
      startMinutes: hours * 60 + minutes,
      lengthMinutes: Number(value.lengthMinutes),
      weeks: Number(value.weeks),
      capacity: value.capacity.trim() === '' ? null : Number(value.capacity),
    };
  });
export type ClassHoldFormInput = z.input<typeof classHoldFormSchema>;
export type ClassHoldValues = z.output<typeof classHoldFormSchema>;

export type ClassHoldPlan =
  | { ok: true; occurrences: ClassOccurrenceTimes[] }
  | { ok: false; field: 'date' | 'startTime'; message: string };

/**
 * The meetings the form will hold: the first on the chosen date and wall-clock time of the
 * shop, then the same weekday and time each following week (core's rule, the one the server
 * applies), each lasting the chosen length.
 */
export function planClassHold(values: Pick<ClassHoldValues, 'date' | 'startMinutes' | 'lengthMinutes' | 'weeks'>, timeZone: string, now: Date): ClassHoldPlan {
  const start = wallTimeToInstant(values.date, values.startMinutes, timeZone);
  if (!start) return { ok: false, field: 'startTime', message: 'The clocks skip that time on that day. Choose another start time.' };
  if (start.getTime() <= now.getTime()) return { ok: false, field: 'date', message: 'The first class must start in the future.' };
  const end = new Date(start.getTime() + values.lengthMinutes * MINUTE);
  return { ok: true, occurrences: weeklyOccurrences({ start, end }, values.weeks, timeZone) };
}

/** The body of POST /api/classes for a plan that holds. */
export function classRequestBody(values: ClassHoldValues, first: ClassOccurrenceTimes): ClassRequestBody {
  return {
    machineId: values.machineId,
    trainingId: values.trainingId,
    title: values.title,
    start: first.start.toISOString(),
    end: first.end.toISOString(),
    weeks: values.weeks,
    capacity: values.capacity,
  };
}

const live = (occurrence: ClassOccurrence) => occurrence.status === 'active' || occurrence.status === 'checked_in';

/** The meetings still to come (not ended, not cancelled), soonest first. */
export function upcomingOccurrences(cls: Pick<ClassDetail, 'occurrences'>, now: Date): ClassOccurrence[] {
  return cls.occurrences
    .filter((occurrence) => live(occurrence) && Date.parse(occurrence.endsAt) > now.getTime())
    .sort((a, b) => Date.parse(a.startsAt) - Date.parse(b.startsAt));
}

/** "4 booked of 8 places", "4 booked" when the class has no limit. */
export function bookedLabel(memberCount: number, capacity: number | null): string {
  return capacity === null ? `${memberCount} booked` : `${memberCount} booked of ${capacity} ${capacity === 1 ? 'place' : 'places'}`;
}
