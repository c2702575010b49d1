import { reservationRulesInputSchema, type ReservationRules, type ReservationRulesInput } from '@chuckkey/core';
import type { FieldErrors, Resolver } from 'react-hook-form';

/** The rules as the form holds them: typed text, with the weekly quota in hours as people think of it. */
export interface BookingRulesFormValues {
  slotMinutes: string;
  maxMinutes: string;
  bufferMinutes: string;
  horizonDays: string;
  weeklyQuotaHours: string;
  checkInMinutes: string;
  noShowGraceMinutes: string;
  noShowLimit: string;
  noShowWindowDays: string;
  suspensionDays: string;
}

export type BookingRulesField = keyof BookingRulesFormValues;

export const bookingRulesFields = [
  'slotMinutes',
  'maxMinutes',
  'bufferMinutes',
  'horizonDays',
  'weeklyQuotaHours',
  'checkInMinutes',
  'noShowGraceMinutes',
  'noShowLimit',
  'noShowWindowDays',
  'suspensionDays',
] as const satisfies readonly BookingRulesField[];

/** The table's ceiling of 10,080 minutes is a whole week. */
export const MAX_WEEKLY_QUOTA_HOURS = 168;

const QUOTA_MESSAGE = `Give the weekly quota as a number of hours from 0 to ${MAX_WEEKLY_QUOTA_HOURS}, e.g. 1.5 for an hour and a half.`;

/** Hours shown to two decimals at most; 20 minutes reads 0.33 and still comes back as 20. */
export function minutesToHours(minutes: number): string {
  return String(Number((minutes / 60).toFixed(2)));
}

/** Counted to the nearest minute, which is what the server keeps; undefined for text that is no number of hours. */
export function hoursToMinutes(text: string): number | undefined {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return undefined;
  const hours = Number(trimmed);
  if (!Number.isFinite(hours)) return undefined;
  return Math.round(hours * 60);
}

export function toFormValues(rules: ReservationRules): BookingRulesFormValues {
  return {
    slotMinutes: String(rules.slotMinutes),
    maxMinutes: String(rules.maxMinutes),
    bufferMinutes: String(rules.bufferMinutes),
    horizonDays: String(rules.horizonDays),
    weeklyQuotaHours: minutesToHours(rules.weeklyQuotaMinutes),
    checkInMinutes: String(rules.checkInMinutes),
    noShowGraceMinutes: String(rules.noShowGraceMinutes),
    noShowLimit: String(rules.noShowLimit),
    noShowWindowDays: String(rules.noShowWindowDays),
    suspensionDays: String(rules.suspensionDays),
  };
}

/** Empty text is left missing, so the core schema says the number is needed rather than reading it as 0. */
function wholeNumber(text: string): number | undefined {
  const trimmed = text.trim();
  return trimmed === '' ? undefined : Number(trimmed);
}

/** The body of PUT /api/machines/:id/reservation-rules, before the core schema judges it. */
export function toRulesBody(values: BookingRulesFormValues, reservable: boolean): Record<keyof ReservationRulesInput, unknown> {
  return {
    reservable,
    slotMinutes: wholeNumber(values.slotMinutes),
    maxMinutes: wholeNumber(values.maxMinutes),
    bufferMinutes: wholeNumber(values.bufferMinutes),
    horizonDays: wholeNumber(values.horizonDays),
    weeklyQuotaMinutes: hoursToMinutes(values.weeklyQuotaHours),
    checkInMinutes: wholeNumber(values.checkInMinutes),
    noShowGraceMinutes: wholeNumber(values.noShowGraceMinutes),
    noShowLimit: wholeNumber(values.noShowLimit),
    noShowWindowDays: wholeNumber(values.noShowWindowDays),
    suspensionDays: wholeNumber(values.suspensionDays),
  };
}

/** Where an error about a body field belongs in the form: the quota's minutes are the form's hours. */
export function formFieldOf(bodyField: string): BookingRulesField | undefined {
  if (bodyField === 'weeklyQuotaMinutes') return 'weeklyQuotaHours';
  return (bookingRulesFields as readonly string[]).includes(bodyField) ? (bodyField as BookingRulesField) : undefined;
}

/** Words for an error on a form field; the quota's are said in hours, as the field asks for them. */
export function messageFor(field: BookingRulesField, message: string): string {
  return field === 'weeklyQuotaHours' ? QUOTA_MESSAGE : message;
}

/**
 * Judges the form by the core schema the server uses, so both refuse the same values with the
 * same words; the parsed body is what gets sent. Reservable comes from outside the form.
 */
export function bookingRulesResolver(reservable: () => boolean): Resolver<BookingRulesFormValues, unknown, ReservationRulesInput> {
  return async (values) => {
    const result = reservationRulesInputSchema.safeParse(toRulesBody(values, reservable()));
    if (result.success) return { values: result.data, errors: {} };
    const errors: FieldErrors<BookingRulesFormValues> = {};
    for (const issue of result.error.issues) {
      const field = formFieldOf(String(issue.path[0] ?? ''));
      if (!field || errors[field]) continue;
      errors[field] = { type: 'validate', message: messageFor(field, issue.message) };
    }
    return { values: {}, errors };
  };
}
