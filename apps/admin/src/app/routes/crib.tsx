import { can } from '@chuckkey/core';
import { PageHeading } from '../../components/ui/page-heading';
import { CribInventory } from '../../features/crib/components/crib-inventory';
import { CribTabs } from '../../features/crib/components/crib-tabs';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

export default function CribRoute() {
  const user = useSignedInUser();
  if (!can(user.role, 'manage:crib:any')) return <NoAccess area="the crib" />;

  return (
    <>
      <CribTabs />
      <PageHeading
        title="Crib inventory"
        description="The tools members borrow and the consumables they take. Tick tools to print their asset tag labels; export the list as CSV, change it in a spreadsheet and import it back."
      />
      <CribInventory />
    </>
  );
}
