import { Panel } from '../../../components/ui/panel';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { formatDateTime } from '../../../lib/format';
import { useMyCribCheckouts } from '../api/mine';
import { useCribClock } from '../hooks/use-crib-clock';
import { CribCheckoutsDueBadge } from './crib-checkouts-due-badge';

/** What the signed-in member has out from the crib, soonest due first, on My record. */
export function CribMinePanel({ timeZone }: { timeZone: string | undefined }) {
  const mine = useMyCribCheckouts();
  const now = useCribClock();
  return (
    <Panel title="What I have out" description="Tools you borrowed from the crib and when each is due back. Bring them to the crib to return them.">
      {mine.isPending ? (
        <Spinner label="Loading what you have out…" />
      ) : mine.isError ? (
        <QueryError error={mine.error} what="what you have out" onRetry={() => void mine.refetch()} retrying={mine.isFetching} />
      ) : mine.data.length === 0 ? (
        <p className="text-neutral-800">Nothing out from the crib.</p>
      ) : (
        <ul aria-label="What I have out" className="flex flex-col divide-y divide-neutral-200 rounded-lg border border-neutral-300">
          {mine.data.map((checkout) => (
            <li key={checkout.id} className="flex flex-wrap items-center justify-between gap-2 px-4 py-3">
              <span className="flex flex-col">
                <span className="font-bold text-neutral-900">{checkout.itemName}</span>
                <span className="text-sm text-neutral-700">{checkout.dueAt ? `Due ${formatDateTime(checkout.dueAt, timeZone)}` : 'No due time'}</span>
              </span>
              <CribCheckoutsDueBadge dueAt={checkout.dueAt} now={now} />
            </li>
          ))}
        </ul>
      )}
    </Panel>
  );
}
