import { describe, expect, it } from 'vitest';
import { readReservationFilters, reservationCsvHref, reservationFiltersToSearchParams, reservationListQuery } from './reservation-filters';

describe('reservation filters', () => {
  it('reads what it writes, and drops what it cannot read', () => {
    const filters = { from: '2026-03-07', to: '2026-03-14', machineId: 'm1', status: 'no_show' as const, page: 3 };
    expect(readReservationFilters(reservationFiltersToSearchParams(filters))).toEqual(filters);
    expect(readReservationFilters(new URLSearchParams('from=March&status=lost&page=-2'))).toEqual({
      from: undefined,
      to: undefined,
      machineId: undefined,
      status: undefined,
      page: 1,
    });
  });

  it("asks the API for whole days of the shop's calendar across a clock change (IANA tz database via Intl)", () => {
    // America/Chicago moves from UTC−6 to UTC−5 on Sunday 8 March 2026.
    expect(reservationListQuery({ from: '2026-03-07', to: '2026-03-08', page: 1 }, 'America/Chicago')).toEqual({
      from: '2026-03-07T06:00:00.000Z',
      to: '2026-03-09T05:00:00.000Z',
      machineId: undefined,
      status: undefined,
      page: undefined,
    });
  });

  it('exports every page the filters match', () => {
    expect(reservationCsvHref({ status: 'active', page: 4 }, 'UTC')).toBe('/api/reservations/export.csv?status=active');
  });
});
