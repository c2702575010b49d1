import {
  incidentKindLabels,
  incidentKinds,
  incidentStatusLabels,
  incidentStatuses,
  type IncidentKind,
  type IncidentStatus,
  type IncidentSummary,
} from '@chuckkey/core';
import { Link, useSearchParams } from 'react-router-dom';
import { ButtonLink } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { ChoiceFilter, FilterBar } from '../../../components/ui/filter-bar';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { Table, TBody, Td, Th, THead, Tr } from '../../../components/ui/table';
import { paths } from '../../../config/paths';
import { formatDateTime } from '../../../lib/format';
import { useIncidents } from '../api/get-incidents';
import { IncidentStatusBadge } from './incident-status-badge';

const isStatus = (value: string): value is IncidentStatus => (incidentStatuses as readonly string[]).includes(value);
const isKind = (value: string): value is IncidentKind => (incidentKinds as readonly string[]).includes(value);

const statusChoices = incidentStatuses.map((value) => ({ value, label: incidentStatusLabels[value] }));
const kindChoices = incidentKinds.map((value) => ({ value, label: incidentKindLabels[value] }));

export function incidentPlace(incident: Pick<IncidentSummary, 'area' | 'location'>): string {
  return [incident.area?.name, incident.location].filter(Boolean).join(' — ');
}

/** Every report, newest first, filtered by status and kind; the filters live in the address. */
export function IncidentsTable({ timeZone }: { timeZone?: string | undefined }) {
  const [searchParams, setSearchParams] = useSearchParams();
  const statusParam = searchParams.get('status') ?? '';
  const kindParam = searchParams.get('kind') ?? '';
  const status = isStatus(statusParam) ? statusParam : undefined;
  const kind = isKind(kindParam) ? kindParam : undefined;
  const incidents = useIncidents({ status, kind });

  const setFilter = (key: 'status' | 'kind', value: string | undefined) => {
    const next = new URLSearchParams(searchParams);
    if (value) next.set(key, value);
    else next.delete(key);
    setSearchParams(next, { replace: true });
  };

  return (
    <div className="flex flex-col gap-4">
      <FilterBar label="Filter incidents">
        <ChoiceFilter label="Status" every="Every status" value={status} choices={statusChoices} isChoice={isStatus} onChange={(value) => setFilter('status', value)} />
        <ChoiceFilter label="Kind" every="Every kind" value={kind} choices={kindChoices} isChoice={isKind} onChange={(value) => setFilter('kind', value)} />
      </FilterBar>
      {incidents.isPending ? (
        <Spinner label="Loading incidents…" />
      ) : incidents.isError ? (
        <QueryError error={incidents.error} what="the incident reports" onRetry={() => void incidents.refetch()} retrying={incidents.isFetching} />
      ) : incidents.data.length === 0 ? (
        <EmptyState
          title={status || kind ? 'No incidents match these filters' : 'No incidents reported'}
          action={<ButtonLink to={paths.reportIncident.getHref()}>Report an incident</ButtonLink>}
        >
          {status || kind ? 'Choose another status or kind.' : 'Reports that members send appear here for review.'}
        </EmptyState>
      ) : (
        <Table caption="Incident reports">
          <THead>
            <Tr>
              <Th>When</Th>
              <Th>Kind</Th>
              <Th>Machine or place</Th>
              <Th>Status</Th>
              <Th>Reported by</Th>
            </Tr>
          </THead>
          <TBody>
            {incidents.data.map((incident) => (
              <Tr key={incident.id}>
                <Td className="whitespace-nowrap">
                  <Link to={paths.upkeepIncident.getHref(incident.id)} className="font-bold text-brand underline underline-offset-4">
                    {formatDateTime(incident.occurredAt, timeZone)}
                  </Link>
                </Td>
                <Td>{incidentKindLabels[incident.kind]}</Td>
                <Td>{incident.machine?.name ?? incidentPlace(incident)}</Td>
                <Td>
                  <IncidentStatusBadge status={incident.status} />
                </Td>
                <Td>{incident.reportedBy?.name ?? 'Former member'}</Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      )}
    </div>
  );
}
