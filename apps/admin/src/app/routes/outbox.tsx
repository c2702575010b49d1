import { can } from '@chuckkey/core';
import { PageHeading } from '../../components/ui/page-heading';
import { OutboxView } from '../../features/outbox/components/outbox-view';
import { useShop } from '../../features/shop/api/get-shop';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

export default function OutboxRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  if (!can(user.role, 'read:outbox:any')) return <NoAccess area="Outbox" />;

  return (
    <>
      <PageHeading
        title="Outbox"
        description="In development Chuckkey sends no real e-mail: every message it would send is caught and kept here instead."
      />
      <OutboxView timeZone={shop.data?.timeZone} />
    </>
  );
}
