import { can } from '@chuckkey/core';
import { PageHeading } from '../../components/ui/page-heading';
import { AuditLogView } from '../../features/audit/components/audit-log-view';
import { useShop } from '../../features/shop/api/get-shop';
import { NoAccess } from '../components/no-access';
import { PeopleNav } from '../components/people-nav';
import { useSignedInUser } from '../signed-in-user';

export default function AuditLogRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  if (!can(user.role, 'read:audit:any')) return <NoAccess area="the audit log" />;

  return (
    <>
      <PeopleNav user={user} />
      <PageHeading
        title="Audit log"
        description="Who signed off or revoked what, changed a role, issued a badge, recorded a waiver or paired a station, and when."
      />
      <AuditLogView timeZone={shop.data?.timeZone} />
    </>
  );
}
