import type { MyReservation, MyReservations } from '@chuckkey/core';
import { render, screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { MyReservationsList } from './my-reservations';

const meeting = (id: number, start: string, end: string): MyReservation => ({
  id: `00000000-0000-4000-8000-00000000000${id}`,
  machineId: '00000000-0000-4000-8000-0000000000aa',
  machineName: 'Lathe 2',
  kind: 'class',
  classTitle: 'Lathe basics class',
  start,
  end,
  status: 'active',
});

// Saturday 12 December 2026, 9:00–11:00 in Chicago on CST (UTC−6), per the IANA tz database via Intl.
const list: MyReservations = { upcoming: [meeting(1, '2026-12-12T15:00:00Z', '2026-12-12T17:00:00Z')], past: [] };

describe('a class the member is booked into, among their reservations', () => {
  it('shows the class title with a Class label, the machine and the time, and offers no Cancel', () => {
    render(<MyReservationsList reservations={list} timeZone="America/Chicago" onCancel={vi.fn()} onRelease={vi.fn()} />);
    const item = within(screen.getByRole('list', { name: 'Upcoming' })).getByRole('listitem');
    expect(within(item).getByText('Class')).toBeTruthy();
    expect(within(item).getByText('Lathe basics class')).toBeTruthy();
    expect(within(item).getByText('Lathe 2')).toBeTruthy();
    expect(within(item).getByText('Saturday 12 December, 9:00–11:00')).toBeTruthy();
    expect(within(item).queryByRole('button')).toBeNull();
  });
});
