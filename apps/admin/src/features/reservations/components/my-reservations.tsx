import type { MyReservation, MyReservations, ReservationStatus } from '@chuckkey/core';
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { errorMessage } from '../../../lib/api-client';
import { spanLabel } from '../utils/week-slots';

interface MyReservationsListProps {
  reservations: MyReservations;
  timeZone: string;
  onCancel: (reservationId: string) => Promise<unknown>;
  onRelease: (reservationId: string) => Promise<unknown>;
}

const statusWords: Record<ReservationStatus, string> = {
  active: 'Reserved',
  checked_in: 'Checked in',
  cancelled: 'Cancelled',
  released: 'Freed for others',
  no_show: 'No-show',
};

const classStatusWords: Record<ReservationStatus, string> = {
  active: 'Booked',
  checked_in: 'Checked in',
  cancelled: 'Cancelled by the instructor',
  released: 'Freed for others',
  no_show: 'Missed',
};

/**
 * The member's own reservations: what is coming (cancellable until checked into, its rest given
 * back once checked into), what is past, and the no-shows that can pause reserving.
 */
export function MyReservationsList({ reservations, timeZone, onCancel, onRelease }: MyReservationsListProps) {
  const [cancelling, setCancelling] = useState<MyReservation | null>(null);
  const [releasing, setReleasing] = useState<MyReservation | null>(null);
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const missed = reservations.past.filter((r) => r.status === 'no_show');
  const past = reservations.past.filter((r) => r.status !== 'no_show');

  async function confirmCancel() {
    if (!cancelling) return;
    setPending(true);
    setError(null);
    try {
      await onCancel(cancelling.id);
      setCancelling(null);
    } catch (caught) {
      setError(errorMessage(caught));
    } finally {
      setPending(false);
    }
  }

  async function confirmRelease() {
    if (!releasing) return;
    setPending(true);
    setError(null);
    try {
      await onRelease(releasing.id);
      setReleasing(null);
    } catch (caught) {
      setError(errorMessage(caught));
    } finally {
      setPending(false);
    }
  }

  // A class occurrence belongs to the class's instructor: the member sees it but cannot cancel it here.
  const row = (reservation: MyReservation, cancellable: boolean) => (
    <li key={reservation.id} className="flex flex-wrap items-center justify-between gap-2 border-b border-neutral-200 py-2 last:border-0">
      <div className="flex flex-col">
        {reservation.kind === 'class' ? (
          <span className="flex flex-wrap items-center gap-2">
            <span className="rounded-sm border border-brand px-1.5 text-sm font-bold text-brand">Class</span>
            <span className="font-bold text-neutral-900">{reservation.classTitle ?? 'Class'}</span>
          </span>
        ) : (
          <span className="font-bold text-neutral-900">{reservation.machineName}</span>
        )}
        {reservation.kind === 'class' && <span className="text-neutral-800">{reservation.machineName}</span>}
        <span className="text-neutral-800">{spanLabel(new Date(reservation.start), new Date(reservation.end), timeZone)}</span>
        <span className="text-sm text-neutral-700">{reservation.kind === 'class' ? classStatusWords[reservation.status] : statusWords[reservation.status]}</span>
      </div>
      {cancellable && reservation.kind === 'member' && reservation.status === 'active' && (
        <Button
          variant="secondary"
          aria-label={`Cancel the ${reservation.machineName} on ${spanLabel(new Date(reservation.start), new Date(reservation.end), timeZone)}`}
          onClick={() => setCancelling(reservation)}
        >
          Cancel
        </Button>
      )}
      {cancellable && reservation.kind === 'member' && reservation.status === 'checked_in' && (
        <Button
          variant="secondary"
          aria-label={`I'm done, release the rest of the ${reservation.machineName} on ${spanLabel(new Date(reservation.start), new Date(reservation.end), timeZone)}`}
          onClick={() => setReleasing(reservation)}
        >
          I'm done, release the rest
        </Button>
      )}
    </li>
  );

  return (
    <div className="flex flex-col gap-6">
      <section aria-labelledby="reservations-upcoming" className="flex flex-col gap-2">
        <h3 id="reservations-upcoming" className="text-lg font-bold text-neutral-900">
          Upcoming
        </h3>
        {reservations.upcoming.length === 0 ? (
          <EmptyState title="Nothing reserved">Choose a machine above and a free time in its week.</EmptyState>
        ) : (
          <ul aria-labelledby="reservations-upcoming">{reservations.upcoming.map((r) => row(r, true))}</ul>
        )}
      </section>
      <section aria-labelledby="reservations-past" className="flex flex-col gap-2">
        <h3 id="reservations-past" className="text-lg font-bold text-neutral-900">
          Past and cancelled
        </h3>
        {past.length === 0 ? <p className="text-neutral-700">No past or cancelled reservations yet.</p> : <ul aria-labelledby="reservations-past">{past.map((r) => row(r, false))}</ul>}
      </section>
      <section aria-labelledby="reservations-missed" className="flex flex-col gap-2">
        <h3 id="reservations-missed" className="text-lg font-bold text-neutral-900">
          No-shows
        </h3>
        {missed.length === 0 ? (
          <p className="text-neutral-700">No no-shows. A reservation not checked into soon after its start is freed for others and counted here.</p>
        ) : (
          <ul aria-labelledby="reservations-missed">{missed.map((r) => row(r, false))}</ul>
        )}
      </section>

      <ConfirmDialog
        open={cancelling !== null}
        title="Cancel this reservation?"
        confirmLabel="Cancel reservation"
        confirmVariant="danger"
        pending={pending}
        error={error}
        onConfirm={confirmCancel}
        onCancel={() => {
          setCancelling(null);
          setError(null);
        }}
      >
        {cancelling && `The ${cancelling.machineName} on ${spanLabel(new Date(cancelling.start), new Date(cancelling.end), timeZone)} goes back to everyone.`}
      </ConfirmDialog>

      <ConfirmDialog
        open={releasing !== null}
        title="Release the rest of this reservation?"
        confirmLabel="Release the rest"
        pending={pending}
        error={error}
        onConfirm={confirmRelease}
        onCancel={() => {
          setReleasing(null);
          setError(null);
        }}
      >
        {releasing && `The rest of your time on the ${releasing.machineName} goes back to everyone: others may reserve it or start on the machine. This cannot be undone.`}
      </ConfirmDialog>
    </div>
  );
}
