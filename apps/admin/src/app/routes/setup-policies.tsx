import { can } from '@chuckkey/core';
import { PageHeading } from '../../components/ui/page-heading';
import { ShopPoliciesSetup } from '../../features/shop/components/shop-policies-setup';
import { NoAccess } from '../components/no-access';
import { SetupNav } from '../components/setup-nav';
import { useSignedInUser } from '../signed-in-user';

export default function SetupPoliciesRoute() {
  const user = useSignedInUser();
  if (!can(user.role, 'manage:shop:any')) return <NoAccess area="Setup" />;
  return (
    <>
      <SetupNav user={user} />
      <PageHeading title="Policies" description="Shop-wide rules the machine stations apply when a member scans in." />
      <ShopPoliciesSetup />
    </>
  );
}
