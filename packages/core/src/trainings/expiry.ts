import { TZDate } from '@date-fns/tz';
import { addDays, addMonths, differenceInCalendarDays, startOfDay } from 'date-fns';

export const EXPIRING_SOON_DAYS = 30;

/**
 * When a sign-off lapses: it is good through the same calendar date `validityMonths` later in
 * the shop's time zone (clamped to the month's last day: 29 Feb + 12 months is 28 Feb), and
 * expires at the start of the next local day. 0 months means it never lapses (null).
 */
export function signOffExpiry(signedAt: Date, validityMonths: number, timeZone: string): Date | null {
  if (validityMonths === 0) return null;
  const local = new TZDate(signedAt.getTime(), timeZone);
  const lastGoodDay = addMonths(startOfDay(local), validityMonths);
  return new Date(addDays(lastGoodDay, 1).getTime());
}

export type SignOffState = 'valid' | 'expiring' | 'expired' | 'revoked';

export const signOffStateLabels: Record<SignOffState, string> = {
  valid: 'Valid',
  expiring: 'Expiring soon',
  expired: 'Expired',
  revoked: 'Revoked',
};

/** A sign-off's state at `now`: revoked first, then expired, then expiring within 30 days. */
export function signOffState(signOff: { expiresAt: Date | null; revokedAt: Date | null }, now: Date): SignOffState {
  if (signOff.revokedAt && signOff.revokedAt.getTime() <= now.getTime()) return 'revoked';
  if (!signOff.expiresAt) return 'valid';
  if (signOff.expiresAt.getTime() <= now.getTime()) return 'expired';
  if (signOff.expiresAt.getTime() - now.getTime() <= EXPIRING_SOON_DAYS * 86_400_000) return 'expiring';
  return 'valid';
}

/** Whole days left before the sign-off lapses, counted in the shop's calendar. */
export function daysUntilExpiry(expiresAt: Date, now: Date, timeZone: string): number {
  return differenceInCalendarDays(new TZDate(expiresAt.getTime(), timeZone), new TZDate(now.getTime(), timeZone));
}
