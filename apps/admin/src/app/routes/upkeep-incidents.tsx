import { can } from '@chuckkey/core';
import { ButtonLink } from '../../components/ui/button';
import { PageHeading } from '../../components/ui/page-heading';
import { paths } from '../../config/paths';
import { IncidentsTable } from '../../features/incidents/components/incidents-table';
import { useShop } from '../../features/shop/api/get-shop';
import { UpkeepTabs } from '../../features/upkeep/components/upkeep-tabs';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

export default function UpkeepIncidentsRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  if (!can(user.role, 'read:incident:any')) return <NoAccess area="incident reports" />;
  return (
    <>
      <UpkeepTabs role={user.role} />
      <PageHeading
        title="Incidents"
        description="Injuries, near misses and damage reported in the shop, newest first. Open one to see its photos, change its status and add follow-up notes. Times are the shop's."
        actions={<ButtonLink to={paths.reportIncident.getHref()}>Report an incident</ButtonLink>}
      />
      <IncidentsTable timeZone={shop.data?.timeZone} />
    </>
  );
}
