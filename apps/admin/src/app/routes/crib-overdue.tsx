import { can } from '@chuckkey/core';
import { PageHeading } from '../../components/ui/page-heading';
import { CribOverdueTable } from '../../features/crib/components/crib-overdue-table';
import { CribTabs } from '../../features/crib/components/crib-tabs';
import { useShop } from '../../features/shop/api/get-shop';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

export default function CribOverdueRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  if (!can(user.role, 'manage:crib:any')) return <NoAccess area="the crib" />;

  return (
    <>
      <CribTabs />
      <PageHeading title="Overdue" description="Tools still out after their due time, the most overdue first, and the reminders their members were sent. Times are the shop's." />
      <CribOverdueTable timeZone={shop.data?.timeZone} />
    </>
  );
}
