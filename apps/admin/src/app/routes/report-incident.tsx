import { can } from '@chuckkey/core';
import { Alert } from '../../components/ui/alert';
import { PageHeading } from '../../components/ui/page-heading';
import { QueryError } from '../../components/ui/query-error';
import { Spinner } from '../../components/ui/spinner';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { IncidentReportForm } from '../../features/incidents/components/incident-report-form';
import { useShop } from '../../features/shop/api/get-shop';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

export default function ReportIncidentRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  if (!can(user.role, 'create:incident:own')) return <NoAccess area="incident reports" />;
  return (
    <div className="flex flex-col gap-6">
      <Alert tone="warning" title="In an emergency call emergency services first.">
        This report does not replace first aid or any report you must make under local law.
      </Alert>
      <PageHeading
        title="Report an incident"
        description="An injury, a near miss or damage in the shop. The shop's admins review every report and follow it up."
      />
      {can(user.role, 'read:incident:any') && (
        <p>
          <TextLink to={paths.upkeepIncidents.getHref()}>See all incident reports in Upkeep</TextLink>
        </p>
      )}
      {shop.isPending ? (
        <Spinner />
      ) : shop.isError ? (
        <QueryError error={shop.error} what="the shop's details" onRetry={() => void shop.refetch()} retrying={shop.isFetching} />
      ) : (
        <IncidentReportForm timeZone={shop.data.timeZone} />
      )}
    </div>
  );
}
