import { can } from '@chuckkey/core';
import { PageHeading } from '../../components/ui/page-heading';
import { CribAttentionList } from '../../features/crib/components/crib-attention-list';
import { CribTabs } from '../../features/crib/components/crib-tabs';
import { useShop } from '../../features/shop/api/get-shop';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

export default function CribAttentionRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  if (!can(user.role, 'manage:crib:any')) return <NoAccess area="the crib" />;

  return (
    <>
      <CribTabs />
      <PageHeading
        title="Needs attention"
        description="Tools returned needing attention or damaged are out of circulation. Once one is repaired or checked, put it back in circulation."
      />
      <CribAttentionList timeZone={shop.data?.timeZone} />
    </>
  );
}
