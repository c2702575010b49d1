import { can } from '@chuckkey/core';
import { PageHeading } from '../../components/ui/page-heading';
import { InviteForm } from '../../features/invitations/components/invite-form';
import { OpenInvitations } from '../../features/invitations/components/open-invitations';
import { MembersPanel } from '../../features/members/components/members-panel';
import { useShop } from '../../features/shop/api/get-shop';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

export default function PeopleRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  if (!can(user.role, 'read:member:any')) return <NoAccess area="People" />;

  const timeZone = shop.data?.timeZone;
  return (
    <>
      <PageHeading title="People" description="The shop's members and their roles, and the invitations still open." />
      <MembersPanel currentUserId={user.id} timeZone={timeZone} />
      <div className="grid grid-cols-1 gap-6 xl:grid-cols-2">
        <InviteForm />
        <OpenInvitations timeZone={timeZone} />
      </div>
    </>
  );
}
