import type { ClassOccurrence, ReservationStatus } from '@chuckkey/core';
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { errorMessage } from '../../../lib/api-client';
import { spanLabel } from '../../../lib/shop-clock';

interface ClassOccurrencesProps {
  occurrences: readonly ClassOccurrence[];
  timeZone: string;
  now: Date;
  /** Whether the reader may call meetings off: the class's instructor or an admin. */
  canCancel: boolean;
  onCancel: (reservationId: string) => Promise<unknown>;
}

const statusWords: Record<ReservationStatus, string> = {
  active: 'Held',
  checked_in: 'Under way',
  cancelled: 'Cancelled',
  released: 'Freed for others',
  no_show: 'Not held',
};

/** Every meeting of the class in order; one still to come can be called off on its own. */
export function ClassOccurrences({ occurrences, timeZone, now, canCancel, onCancel }: ClassOccurrencesProps) {
  const [cancelling, setCancelling] = useState<ClassOccurrence | null>(null);
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const sorted = [...occurrences].sort((a, b) => Date.parse(a.startsAt) - Date.parse(b.startsAt));
  const label = (occurrence: ClassOccurrence) => spanLabel(new Date(occurrence.startsAt), new Date(occurrence.endsAt), timeZone);

  async function confirm() {
    if (!cancelling) return;
    setPending(true);
    setError(null);
    try {
      await onCancel(cancelling.reservationId);
      setCancelling(null);
    } catch (caught) {
      setError(errorMessage(caught));
    } finally {
      setPending(false);
    }
  }

  return (
    <>
      <ol aria-label="Meetings" className="flex flex-col divide-y divide-neutral-200">
        {sorted.map((occurrence) => {
          const cancellable = canCancel && occurrence.status === 'active' && Date.parse(occurrence.startsAt) > now.getTime();
          return (
            <li key={occurrence.reservationId} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <span className="flex flex-col">
                <span className="font-bold text-neutral-900">{label(occurrence)}</span>
                <span className="text-sm text-neutral-700">{statusWords[occurrence.status]}</span>
              </span>
              {cancellable && (
                <Button variant="secondary" aria-label={`Cancel the meeting on ${label(occurrence)}`} onClick={() => setCancelling(occurrence)}>
                  Cancel
                </Button>
              )}
            </li>
          );
        })}
      </ol>
      <ConfirmDialog
        open={cancelling !== null}
        title="Cancel this meeting?"
        confirmLabel="Cancel meeting"
        confirmVariant="danger"
        pending={pending}
        error={error}
        onConfirm={() => void confirm()}
        onCancel={() => {
          setCancelling(null);
          setError(null);
        }}
      >
        {cancelling && `The machine is free again on ${label(cancelling)}; the class's other meetings stay.`}
      </ConfirmDialog>
    </>
  );
}
