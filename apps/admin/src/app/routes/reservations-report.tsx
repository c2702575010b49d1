import { can } from '@chuckkey/core';
import { PageHeading } from '../../components/ui/page-heading';
import { ReservationsAdminView } from '../../features/reservations/components/reservations-admin-view';
import { useShop } from '../../features/shop/api/get-shop';
import { NoAccess } from '../components/no-access';
import { PeopleNav } from '../components/people-nav';
import { useSignedInUser } from '../signed-in-user';

export default function ReservationsReportRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  if (!can(user.role, 'manage:machine:any')) return <NoAccess area="the reservations" />;

  return (
    <>
      <PeopleNav user={user} />
      <PageHeading title="Reservations" description="Who reserved which machine and when, what was used, cancelled or missed. Times are the shop's." />
      <ReservationsAdminView timeZone={shop.data?.timeZone} />
    </>
  );
}
