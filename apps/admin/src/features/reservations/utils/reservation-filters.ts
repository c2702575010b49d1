import { addCalendarDays, reservationStatuses, wallTimeToInstant, type ReservationStatus } from '@chuckkey/core';
import { apiHref, type QueryParams } from '../../../lib/api-client';

/** The admin list's filters as the address keeps them: days of the shop's calendar, both ends included. */
export interface ReservationFilters {
  from?: string | undefined;
  to?: string | undefined;
  machineId?: string | undefined;
  status?: ReservationStatus | undefined;
  page: number;
}

const isoDate = /^\d{4}-\d{2}-\d{2}$/;

function day(value: string | null): string | undefined {
  return value && isoDate.test(value) ? value : undefined;
}

export function isReservationStatus(value: string | null): value is ReservationStatus {
  return reservationStatuses.some((status) => status === value);
}

export function readReservationFilters(params: URLSearchParams): ReservationFilters {
  const page = Number(params.get('page'));
  const status = params.get('status');
  return {
    from: day(params.get('from')),
    to: day(params.get('to')),
    machineId: params.get('machine') || undefined,
    status: isReservationStatus(status) ? status : undefined,
    page: Number.isInteger(page) && page > 1 ? page : 1,
  };
}

export function reservationFiltersToSearchParams(filters: ReservationFilters): URLSearchParams {
  const params = new URLSearchParams();
  if (filters.from) params.set('from', filters.from);
  if (filters.to) params.set('to', filters.to);
  if (filters.machineId) params.set('machine', filters.machineId);
  if (filters.status) params.set('status', filters.status);
  if (filters.page > 1) params.set('page', String(filters.page));
  return params;
}

/**
 * The API's query: the days become instants on the shop's clock, from the first day's midnight
 * to the midnight that ends the last day, so "to 14 March" includes all of 14 March.
 */
export function reservationListQuery(filters: ReservationFilters, timeZone: string): QueryParams {
  return {
    from: filters.from ? wallTimeToInstant(filters.from, 0, timeZone)?.toISOString() : undefined,
    to: filters.to ? wallTimeToInstant(addCalendarDays(filters.to, 1), 0, timeZone)?.toISOString() : undefined,
    machineId: filters.machineId,
    status: filters.status,
    page: filters.page > 1 ? filters.page : undefined,
  };
}

/** The CSV download of every reservation the filters match, not only the page on screen. */
export function reservationCsvHref(filters: ReservationFilters, timeZone: string): string {
  return apiHref('/reservations/export.csv', { ...reservationListQuery(filters, timeZone), page: undefined });
}
