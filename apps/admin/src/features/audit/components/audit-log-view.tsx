import { auditActions } from '@chuckkey/core';
import { Link } from 'react-router-dom';
import { EmptyState } from '../../../components/ui/empty-state';
import { ChoiceFilter, FilterBar } from '../../../components/ui/filter-bar';
import { PagedResults } from '../../../components/ui/paged-results';
import { TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format';
import { useAuditLog } from '../api/get-audit-log';
import { useAuditFilters } from '../hooks/use-audit-filters';
import { AUDIT_PAGE_SIZE, actionLabel, auditActionLabels, auditCsvHref, detailLines, isAuditAction } from '../utils/audit-filters';

export function AuditLogView({ timeZone }: { timeZone: string | undefined }) {
  const [filters, update] = useAuditFilters();
  const log = useAuditLog(filters);

  return (
    <div className="flex flex-col gap-4">
      <FilterBar label="Filter the audit log" exportHref={auditCsvHref(filters)}>
        <ChoiceFilter
          label="Action"
          every="Every action"
          value={filters.action}
          choices={auditActions.map((action) => ({ value: action, label: auditActionLabels[action] }))}
          isChoice={isAuditAction}
          onChange={(action) => update({ action })}
          className="sm:w-72"
        />
      </FilterBar>

      <PagedResults
        query={log}
        loadingLabel="Loading the audit log…"
        what="the audit log"
        page={filters.page}
        pageSize={AUDIT_PAGE_SIZE}
        nouns={['entry', 'entries']}
        onPageChange={(page) => update({ page })}
        empty={
          <EmptyState title={filters.action ? `Nothing recorded for “${auditActionLabels[filters.action]}”` : 'Nothing recorded yet'}>
            Sign-offs, revocations, role changes, badges, waivers and stations are recorded here as they happen.
          </EmptyState>
        }
      >
        {(entries) => (
          <Table caption="Audit log, newest first">
            <THead>
              <Tr>
                <Th>When</Th>
                <Th>Action</Th>
                <Th>By</Th>
                <Th>Member</Th>
                <Th>Details</Th>
              </Tr>
            </THead>
            <TBody>
              {entries.map((entry) => (
                <Tr key={entry.id} className="align-top">
                  <Td className="whitespace-nowrap">
                    <time dateTime={entry.at}>{formatDateTime(entry.at, timeZone)}</time>
                  </Td>
                  <Td className="font-bold">{actionLabel(entry.action)}</Td>
                  <Td>{entry.actor?.name ?? 'Chuckkey'}</Td>
                  <Td>
                    {entry.member ? (
                      <Link
                        to={paths.memberRecord.getHref(entry.member.id)}
                        state={{ name: entry.member.name }}
                        className="text-brand underline underline-offset-4"
                      >
                        {entry.member.name}
                      </Link>
                    ) : (
                      '—'
                    )}
                  </Td>
                  <Td className="text-sm">
                    {detailLines(entry.details, (iso) => formatDateTime(iso, timeZone)).map((line, index) => (
                      <p key={index} className="break-words">
                        {line}
                      </p>
                    ))}
                  </Td>
                </Tr>
              ))}
            </TBody>
          </Table>
        )}
      </PagedResults>
    </div>
  );
}
