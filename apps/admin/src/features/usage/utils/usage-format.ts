import type { DenialCode, UsageCsvTable, UsageGrouping } from '@chuckkey/core';
import { apiHref } from '../../../lib/api-client';
import type { DateRange } from './date-range';

/** Why a scan was refused, a few words per reason code, short enough for a chart's axis. */
export const denialLabels: Record<DenialCode, string> = {
  membership_inactive: 'Membership not active',
  waiver_missing: 'No safety waiver on file',
  sign_off_missing: 'Not signed off',
  sign_off_expired: 'Sign-off expired',
  sign_off_revoked: 'Sign-off revoked',
  supervisor_required: 'No supervisor on duty',
  tagged_out: 'Machine tagged out',
  maintenance_overdue: 'Maintenance overdue',
  machine_in_use: 'Machine in use',
  reservation_soon: 'Reservation about to start',
  shop_closed: 'Shop closed',
  crib_overdue: 'Tool crib return overdue',
  balance_due: 'Balance due',
  unknown_badge: 'Badge not known',
};

const hoursFormat = new Intl.NumberFormat('en-GB', { minimumFractionDigits: 1, maximumFractionDigits: 1 });
const countFormat = new Intl.NumberFormat('en-GB');
const percentFormat = new Intl.NumberFormat('en-GB', { style: 'percent', maximumFractionDigits: 1 });

/** "12.5 h": report hours to a tenth, enough to compare machines and members. */
export function hoursLabel(hours: number): string {
  return `${hoursFormat.format(hours)} h`;
}

export function countLabel(count: number): string {
  return countFormat.format(count);
}

/** "42%", "0.5%", or a dash when the shop was never open in the range and the share means nothing. */
export function utilizationLabel(utilization: number | null): string {
  return utilization === null ? '—' : percentFormat.format(utilization);
}

/** "1 Sept 2026 – 30 Nov 2026" for a range of shop-calendar dates; formatted in UTC, where a bare date cannot shift. */
export function rangeLabel({ from, to }: DateRange): string {
  const format = new Intl.DateTimeFormat('en-GB', { timeZone: 'UTC', day: 'numeric', month: 'short', year: 'numeric' });
  return `${format.format(new Date(`${from}T00:00:00Z`))} – ${format.format(new Date(`${to}T00:00:00Z`))}`;
}

/** The report's "Export CSV" link for one of its tables; the browser saves the file itself. */
export function usageCsvHref(range: DateRange, table: UsageCsvTable, groupBy: UsageGrouping = 'machine'): string {
  return apiHref('/reports/usage', { from: range.from, to: range.to, groupBy, format: 'csv', table });
}
