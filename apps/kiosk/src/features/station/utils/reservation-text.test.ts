import { describe, expect, it } from 'vitest';
import { RESERVATION_WARNING_MINUTES, reservationLine, reservationWarning } from './reservation-text';

// Europe/Berlin is UTC+1 in December (IANA time zone database, through Intl).
const ZONE = 'Europe/Berlin';
const NOW = new Date('2026-12-05T07:52:00Z'); // 08:52 in Berlin
const next = { startsAt: '2026-12-05T08:00:00Z', endsAt: '2026-12-05T10:00:00Z', memberId: 'holder', memberFirstName: 'Ines' };

describe('reservationLine', () => {
  it('gives today’s reservation as wall-clock times in the shop’s zone', () => {
    expect(reservationLine(next, NOW, ZONE)).toBe('Next reservation: Ines, 09:00–11:00');
  });

  it('names the weekday of a reservation on another day', () => {
    const later = { ...next, startsAt: '2026-12-07T08:00:00Z', endsAt: '2026-12-07T09:00:00Z' };
    // 7 December 2026 is a Monday (Gregorian calendar, checked by Intl).
    expect(reservationLine(later, NOW, ZONE)).toBe('Next reservation: Ines, Monday 09:00–10:00');
  });
});

describe('reservationWarning', () => {
  const minutesBefore = (minutes: number) => new Date(new Date(next.startsAt).getTime() - minutes * 60_000);

  it('warns the member on the machine from ten minutes before someone else’s reservation (screens.md)', () => {
    expect(RESERVATION_WARNING_MINUTES).toBe(10);
    expect(reservationWarning(next, 'walk-up', minutesBefore(11), ZONE)).toBeNull();
    expect(reservationWarning(next, 'walk-up', minutesBefore(10), ZONE)).toBe(
      'Ines has reserved this machine from 09:00. Please finish up and end your session.',
    );
  });

  it('keeps warning once the reservation has begun, until it is over', () => {
    expect(reservationWarning(next, 'walk-up', minutesBefore(-5), ZONE)).toBe('Ines’s reservation began at 09:00. Please end your session.');
    expect(reservationWarning(next, 'walk-up', new Date(next.endsAt), ZONE)).toBeNull();
  });

  it('does not warn the holder about their own reservation, nor without one', () => {
    expect(reservationWarning(next, 'holder', minutesBefore(5), ZONE)).toBeNull();
    expect(reservationWarning(null, 'walk-up', minutesBefore(5), ZONE)).toBeNull();
  });
});
