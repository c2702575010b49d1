import { can, incidentKindLabels } from '@chuckkey/core';
import { useParams } from 'react-router-dom';
import { ApiError } from '../../lib/api-client';
import { EmptyState } from '../../components/ui/empty-state';
import { PageHeading } from '../../components/ui/page-heading';
import { QueryError } from '../../components/ui/query-error';
import { Spinner } from '../../components/ui/spinner';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { useIncident } from '../../features/incidents/api/get-incident';
import { IncidentReview } from '../../features/incidents/components/incident-review';
import { useShop } from '../../features/shop/api/get-shop';
import { UpkeepTabs } from '../../features/upkeep/components/upkeep-tabs';
import { formatDate } from '../../lib/format';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

function IncidentPage({ id }: { id: string }) {
  const incident = useIncident(id);
  const shop = useShop();
  const timeZone = shop.data?.timeZone;
  if (incident.isPending) return <Spinner label="Loading the report…" />;
  if (incident.isError) {
    if (incident.error instanceof ApiError && incident.error.status === 404) {
      return (
        <EmptyState title="There is no such incident report" action={<TextLink to={paths.upkeepIncidents.getHref()}>Back to incidents</TextLink>}>
          It may have been typed wrong in the address.
        </EmptyState>
      );
    }
    return <QueryError error={incident.error} what="the incident report" onRetry={() => void incident.refetch()} retrying={incident.isFetching} />;
  }
  const title = `${incidentKindLabels[incident.data.kind]}, ${formatDate(incident.data.occurredAt, timeZone)}`;
  return (
    <>
      <PageHeading title={title} description={<TextLink to={paths.upkeepIncidents.getHref()}>All incidents</TextLink>} />
      <IncidentReview incident={incident.data} timeZone={timeZone} />
    </>
  );
}

export default function UpkeepIncidentRoute() {
  const user = useSignedInUser();
  const { id = '' } = useParams();
  if (!can(user.role, 'read:incident:any')) return <NoAccess area="incident reports" />;
  return (
    <>
      <UpkeepTabs role={user.role} />
      <IncidentPage id={id} />
    </>
  );
}
