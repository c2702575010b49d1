import type { MyReservation, MyReservations } from '@chuckkey/core';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../lib/api-client';
import { MyReservationsList } from './my-reservations';

const reservation = (id: number, start: string, end: string, status: MyReservation['status']): MyReservation => ({
  id: `00000000-0000-4000-8000-00000000000${id}`,
  machineId: '00000000-0000-4000-8000-0000000000aa',
  machineName: 'MIG welder',
  kind: 'member',
  start,
  end,
  status,
});

// Saturday 14 March 2026, 9:00–11:00 in Chicago on CDT (UTC−5), per the IANA tz database via Intl.
const list: MyReservations = {
  upcoming: [reservation(1, '2026-03-14T14:00:00Z', '2026-03-14T16:00:00Z', 'active')],
  past: [reservation(2, '2026-03-07T15:00:00Z', '2026-03-07T16:00:00Z', 'checked_in'), reservation(3, '2026-03-05T15:00:00Z', '2026-03-05T16:00:00Z', 'no_show')],
};

// jsdom has no modal dialogs; the confirmation only needs to open and close.
beforeAll(() => {
  HTMLDialogElement.prototype.showModal ??= function showModal(this: HTMLDialogElement) {
    this.setAttribute('open', '');
  };
  HTMLDialogElement.prototype.close ??= function close(this: HTMLDialogElement) {
    this.removeAttribute('open');
  };
});

function setup(onCancel = vi.fn(async () => undefined), onRelease = vi.fn(async () => undefined), reservations = list) {
  const user = userEvent.setup();
  render(<MyReservationsList reservations={reservations} timeZone="America/Chicago" onCancel={onCancel} onRelease={onRelease} />);
  return { user, onCancel, onRelease };
}

describe('MyReservationsList', () => {
  it('sorts reservations into upcoming, past and no-shows, on the shop clock', () => {
    setup();
    expect(within(screen.getByRole('list', { name: 'Upcoming' })).getByText('Saturday 14 March, 9:00–11:00')).toBeTruthy();
    expect(within(screen.getByRole('list', { name: 'Past and cancelled' })).getByText('Checked in')).toBeTruthy();
    expect(within(screen.getByRole('list', { name: 'No-shows' })).getByText('Thursday 5 March, 9:00–10:00')).toBeTruthy();
  });

  it('cancels only after the question is confirmed', async () => {
    const { user, onCancel } = setup();
    await user.click(screen.getByRole('button', { name: 'Cancel the MIG welder on Saturday 14 March, 9:00–11:00' }));
    const dialog = screen.getByRole('dialog', { name: 'Cancel this reservation?' });
    expect(dialog.textContent).toContain('goes back to everyone');
    expect(onCancel).not.toHaveBeenCalled();

    await user.click(within(dialog).getByRole('button', { name: 'Cancel reservation' }));
    expect(onCancel).toHaveBeenCalledWith(list.upcoming[0]?.id);
  });

  it("keeps the dialog open with the server's reason when the cancellation is refused", async () => {
    const refused = new ApiError({ status: 409, code: 'not_cancellable', title: 'Conflict', detail: 'Only a reservation that is still to come, and not checked into, can be cancelled.' });
    const { user } = setup(vi.fn(async () => Promise.reject(refused)));
    await user.click(screen.getByRole('button', { name: /^Cancel the MIG welder/ }));
    await user.click(screen.getByRole('button', { name: 'Cancel reservation' }));
    expect((await screen.findByRole('alert')).textContent).toContain('can be cancelled');
    expect(screen.getByRole('dialog')).toBeTruthy();
  });

  it('offers to release the rest only on a checked-in reservation still running, after the question is confirmed', async () => {
    // Saturday 14 March 2026, 9:00–11:00 in Chicago on CDT (UTC−5), per the IANA tz database via Intl.
    const running = { upcoming: [reservation(4, '2026-03-14T14:00:00Z', '2026-03-14T16:00:00Z', 'checked_in')], past: list.past };
    const { user, onRelease, onCancel } = setup(undefined, undefined, running);
    expect(screen.queryByRole('button', { name: /^Cancel the MIG welder/ })).toBeNull();
    await user.click(screen.getByRole('button', { name: "I'm done, release the rest of the MIG welder on Saturday 14 March, 9:00–11:00" }));
    const dialog = screen.getByRole('dialog', { name: 'Release the rest of this reservation?' });
    expect(dialog.textContent).toContain('goes back to everyone');
    expect(onRelease).not.toHaveBeenCalled();

    await user.click(within(dialog).getByRole('button', { name: 'Release the rest' }));
    expect(onRelease).toHaveBeenCalledWith(running.upcoming[0]?.id);
    expect(onCancel).not.toHaveBeenCalled();
  });

  it('shows no release on an upcoming reservation not yet checked into, nor on past ones', () => {
    setup();
    expect(screen.queryByRole('button', { name: /release the rest/ })).toBeNull();
  });
});
