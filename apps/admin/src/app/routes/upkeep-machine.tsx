import { can } from '@chuckkey/core';
import { useParams } from 'react-router-dom';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { MachineMaintenanceView } from '../../features/maintenance/components/machine-maintenance-view';
import { useShop } from '../../features/shop/api/get-shop';
import { UpkeepTabs } from '../../features/upkeep/components/upkeep-tabs';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

export default function UpkeepMachineRoute() {
  const user = useSignedInUser();
  const { id = '' } = useParams();
  const shop = useShop();
  if (!can(user.role, 'read:maintenance:any')) return <NoAccess area="Maintenance" who="the shop's instructors and admins" />;
  return (
    <>
      <UpkeepTabs role={user.role} />
      <p className="mb-4">
        <TextLink to={paths.upkeep.getHref()}>All maintenance tasks</TextLink>
      </p>
      <MachineMaintenanceView key={id} machineId={id} role={user.role} timeZone={shop.data?.timeZone} />
    </>
  );
}
