import { can } from '@chuckkey/core';
import { PageHeading } from '../../components/ui/page-heading';
import { ShopHoursSetup } from '../../features/shop/components/shop-hours-setup';
import { NoAccess } from '../components/no-access';
import { SetupNav } from '../components/setup-nav';
import { useSignedInUser } from '../signed-in-user';

export default function SetupHoursRoute() {
  const user = useSignedInUser();
  if (!can(user.role, 'manage:shop:any')) return <NoAccess area="Setup" />;
  return (
    <>
      <SetupNav user={user} />
      <PageHeading
        title="Shop hours"
        description="When members may start on a machine: the opening hours of each weekday, and the days the shop is closed."
      />
      <ShopHoursSetup />
    </>
  );
}
