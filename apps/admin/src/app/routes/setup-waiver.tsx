import { can } from '@chuckkey/core';
import { PageHeading } from '../../components/ui/page-heading';
import { useShop } from '../../features/shop/api/get-shop';
import { WaiverPublisher } from '../../features/waivers/components/waiver-publish';
import { NoAccess } from '../components/no-access';
import { SetupNav } from '../components/setup-nav';
import { useSignedInUser } from '../signed-in-user';

export default function SetupWaiverRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  if (!can(user.role, 'manage:waiver:any')) return <NoAccess area="Setup" />;
  return (
    <>
      <SetupNav user={user} />
      <PageHeading
        title="Safety waiver"
        description="The text every member accepts before any station clears them. Publishing a new version asks everyone again."
      />
      <WaiverPublisher timeZone={shop.data?.timeZone} />
    </>
  );
}
