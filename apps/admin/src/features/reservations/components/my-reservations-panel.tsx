import { Panel } from '../../../components/ui/panel';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { useCancelReservation } from '../api/cancel-reservation';
import { useMyReservations } from '../api/get-my-reservations';
import { useReleaseReservation } from '../api/release-reservation';
import { MyReservationsList } from './my-reservations';

/** The signed-in member's reservations and the classes they are booked into, on Reserve and on My record. */
export function MyReservationsPanel({ timeZone, description }: { timeZone: string | undefined; description?: string }) {
  const mine = useMyReservations();
  const cancel = useCancelReservation();
  const release = useReleaseReservation();
  return (
    <Panel title="My reservations" description={description}>
      {mine.isError ? (
        <QueryError error={mine.error} what="your reservations" onRetry={() => void mine.refetch()} />
      ) : !mine.data || !timeZone ? (
        <Spinner label="Loading your reservations…" />
      ) : (
        <MyReservationsList reservations={mine.data} timeZone={timeZone} onCancel={(id) => cancel.mutateAsync(id)} onRelease={(id) => release.mutateAsync(id)} />
      )}
    </Panel>
  );
}
