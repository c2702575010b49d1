import { can } from '@chuckkey/core';
import { PageHeading } from '../../components/ui/page-heading';
import { useShop } from '../../features/shop/api/get-shop';
import { TagOutTables } from '../../features/tag-outs/components/tag-out-tables';
import { UpkeepTabs } from '../../features/upkeep/components/upkeep-tabs';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

export default function UpkeepTagOutsRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  if (!can(user.role, 'read:tag-out:any')) return <NoAccess area="Upkeep" who="the shop's instructors and admins" />;
  return (
    <>
      <UpkeepTabs role={user.role} />
      <PageHeading
        title="Tag-outs"
        description="Machines taken out of service because someone reported a problem, and what was done to put them back. An admin clears any tag-out; an instructor the ones they set. Times are the shop's."
      />
      <TagOutTables user={user} timeZone={shop.data?.timeZone} />
    </>
  );
}
