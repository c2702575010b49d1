import { CribOverdueTable } from '../../features/crib/components/crib-overdue-table';
import { useShop } from '../../features/shop/api/get-shop';
import { CribPage } from '../components/crib-page';

export default function CribOverdueRoute() {
  const shop = useShop();
  return (
    <CribPage title="Overdue" description="Tools still out after their due time, the most overdue first, and the reminders their members were sent. Times are the shop's.">
      <CribOverdueTable timeZone={shop.data?.timeZone} />
    </CribPage>
  );
}
