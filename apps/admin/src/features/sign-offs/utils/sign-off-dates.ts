import { signOffExpiry } from '@chuckkey/core';
import { formatDate } from '../../../lib/format';

/**
 * A sign-off's expiry is the first instant it no longer counts (the start of the next local
 * day, see signOffExpiry); people think in the last day it still counts, so that is the day shown.
 */
export function lastValidDay(expiresAt: string): Date {
  return new Date(Date.parse(expiresAt) - 1);
}

/** The calendar date of an instant in the shop's time zone, as YYYY-MM-DD for <time dateTime>. */
export function localDate(instant: Date, timeZone?: string): string {
  const parts = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).formatToParts(instant);
  const part = (type: string) => parts.find((p) => p.type === type)?.value ?? '';
  return `${part('year')}-${part('month')}-${part('day')}`;
}

export function validUntilDate(expiresAt: string, timeZone?: string): string {
  return formatDate(lastValidDay(expiresAt).toISOString(), timeZone);
}

/** Where a sign-off given now would lapse, shown to the instructor before confirming it. */
export function previewValidUntil(now: Date, validityMonths: number, timeZone: string): { expiresAt: string | null; text: string } {
  const expiry = signOffExpiry(now, validityMonths, timeZone);
  if (!expiry) return { expiresAt: null, text: 'Never lapses' };
  const months = validityMonths === 1 ? '1 month' : `${validityMonths} months`;
  return { expiresAt: expiry.toISOString(), text: `Valid until ${validUntilDate(expiry.toISOString(), timeZone)} (${months} from today)` };
}
