import { signOffLevelLabels } from '@chuckkey/core';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { buttonClasses } from '../../../components/ui/button';
import { cn } from '../../../components/ui/cn';
import { EmptyState } from '../../../components/ui/empty-state';
import { DownloadIcon } from '../../../components/ui/icons';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { SortableThs, TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { paths } from '../../../config/paths';
import { nextSort, type SortColumn } from '../../../lib/table-sort';
import { signOffReportCsvHref, useSignOffReport } from '../api/get-sign-off-report';
import type { SignOffReportStatus } from '../api/sign-off-keys';
import { validUntilDate } from '../utils/sign-off-dates';
import { sortSignOffs, type SignOffSort, type SignOffSortField } from '../utils/sign-off-sort';
import { SignOffStateBadge } from './sign-off-state-badge';

const columns: SortColumn<SignOffSortField>[] = [
  { field: 'member', label: 'Member' },
  { field: 'training', label: 'Training' },
  { field: 'level', label: 'Level' },
  { field: 'expires', label: 'Valid until' },
  { field: 'signedBy', label: 'Signed off by' },
];

const views: { status: SignOffReportStatus; label: string }[] = [
  { status: 'expiring', label: 'Expiring in 30 days' },
  { status: 'expired', label: 'Expired' },
];

export function SignOffReport({ status, timeZone }: { status: SignOffReportStatus; timeZone: string | undefined }) {
  const report = useSignOffReport(status);
  const [sort, setSort] = useState<SignOffSort>({ field: 'expires', order: status === 'expired' ? 'desc' : 'asc' });
  const rows = useMemo(() => (report.data ? sortSignOffs(report.data, sort) : []), [report.data, sort]);
  const caption = status === 'expired' ? 'Expired sign-offs' : 'Sign-offs expiring in the next 30 days';

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-col gap-3 sm:flex-row sm:items-center sm:justify-between">
        <ul aria-label="Which sign-offs" className="flex gap-2">
          {views.map((view) => (
            <li key={view.status}>
              <Link
                to={paths.signOffReport.getHref(view.status)}
                aria-current={view.status === status ? 'page' : undefined}
                className={cn(buttonClasses(view.status === status ? 'primary' : 'secondary'))}
              >
                {view.label}
              </Link>
            </li>
          ))}
        </ul>
        <a href={signOffReportCsvHref(status)} download className={buttonClasses('secondary')}>
          <DownloadIcon />
          Export CSV
        </a>
      </div>

      {report.isPending ? (
        <Spinner label="Loading sign-offs…" />
      ) : report.isError ? (
        <QueryError error={report.error} what="the sign-offs" onRetry={() => void report.refetch()} retrying={report.isFetching} />
      ) : rows.length === 0 ? (
        <EmptyState title={status === 'expired' ? 'No expired sign-offs' : 'Nothing expires in the next 30 days'}>
          {status === 'expired'
            ? 'Every sign-off that lapsed has been renewed or revoked.'
            : 'When a sign-off comes within 30 days of lapsing it appears here, and its member gets a reminder by e-mail.'}
        </EmptyState>
      ) : (
        <Table caption={caption}>
          <THead>
            <Tr>
              <SortableThs
                columns={columns}
                sortedField={sort.field}
                order={sort.order}
                onSort={(field) => setSort((current) => nextSort(current, field))}
              />
              <Th>State</Th>
            </Tr>
          </THead>
          <TBody>
            {rows.map((signOff) => (
              <Tr key={signOff.id}>
                <Td className="font-bold">
                  <Link
                    to={paths.memberRecord.getHref(signOff.memberId)}
                    state={{ name: signOff.memberName }}
                    className="text-brand underline underline-offset-4"
                  >
                    {signOff.memberName}
                  </Link>
                </Td>
                <Td>{signOff.trainingName}</Td>
                <Td>{signOff.level === 'supervised' ? 'Supervised' : signOffLevelLabels.independent}</Td>
                <Td className="whitespace-nowrap">{signOff.expiresAt ? validUntilDate(signOff.expiresAt, timeZone) : 'Never lapses'}</Td>
                <Td>{signOff.signedBy.name}</Td>
                <Td>
                  <SignOffStateBadge state={signOff.state} />
                </Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      )}
    </div>
  );
}
