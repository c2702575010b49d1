import { EmptyState } from '../../../components/ui/empty-state';
import { WarningIcon } from '../../../components/ui/icons';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { formatDateTime } from '../../../lib/format';
import { useCribOverdue } from '../api/overdue';
import { lengthWords } from '../utils/crib-checkouts-rows';

const HOUR_MS = 3_600_000;

/** The shop sends at most this many reminders for one checkout. */
const MOST_NOTICES = 3;

/** Tools past their due time, most overdue first, with the e-mail reminders sent so far. */
export function CribOverdueTable({ timeZone }: { timeZone: string | undefined }) {
  const overdue = useCribOverdue();

  if (overdue.isPending) return <Spinner label="Loading the overdue tools…" />;
  if (overdue.isError) return <QueryError error={overdue.error} what="the overdue tools" onRetry={() => void overdue.refetch()} retrying={overdue.isFetching} />;
  if (overdue.data.length === 0) {
    return (
      <EmptyState title="Nothing is overdue">
        A tool still out after its due time appears here, and its member gets a reminder by e-mail, then one a day, three at most.
      </EmptyState>
    );
  }

  return (
    <Table caption="Overdue tools">
      <THead>
        <Tr>
          <Th>Member</Th>
          <Th>Tool</Th>
          <Th>Was due</Th>
          <Th>Overdue</Th>
          <Th>Reminders</Th>
        </Tr>
      </THead>
      <TBody>
        {overdue.data.map((row) => (
          <Tr key={row.checkoutId}>
            <Td>
              <span className="flex flex-col">
                <span className="font-bold">{row.memberName}</span>
                <a href={`mailto:${row.memberEmail}`} className="break-all text-sm text-brand underline underline-offset-4">
                  {row.memberEmail}
                </a>
              </span>
            </Td>
            <Td>
              <span className="flex flex-col">
                <span>{row.itemName}</span>
                <span className="text-sm text-neutral-700">{row.assetTag}</span>
              </span>
            </Td>
            <Td className="whitespace-nowrap">{formatDateTime(row.dueAt, timeZone)}</Td>
            <Td>
              <span className="inline-flex items-center gap-1.5 rounded-full border border-danger bg-danger-soft px-2.5 py-0.5 text-sm font-bold whitespace-nowrap text-danger">
                <WarningIcon className="size-4 shrink-0" />
                Overdue by {lengthWords(row.overdueByHours * HOUR_MS)}
              </span>
            </Td>
            <Td className="whitespace-nowrap">
              {row.noticesSent === 0 ? 'None sent yet' : `${row.noticesSent} of ${MOST_NOTICES} sent`}
              {row.lastNoticeAt && <span className="block text-sm text-neutral-700">last {formatDateTime(row.lastNoticeAt, timeZone)}</span>}
            </Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
