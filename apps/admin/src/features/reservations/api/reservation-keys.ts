import type { ReservationFilters } from '../utils/reservation-filters';

export const reservationKeys = {
  all: ['reservations'] as const,
  list: (filters: ReservationFilters, timeZone: string) => [...reservationKeys.all, 'list', filters, timeZone] as const,
  mine: () => [...reservationKeys.all, 'mine'] as const,
  availabilities: () => [...reservationKeys.all, 'availability'] as const,
  availability: (machineId: string, from: string, to: string) => [...reservationKeys.availabilities(), machineId, from, to] as const,
};
