import { can } from '@chuckkey/core';
import { ButtonLink } from '../../components/ui/button';
import { PlusIcon } from '../../components/ui/icons';
import { PageHeading } from '../../components/ui/page-heading';
import { paths } from '../../config/paths';
import { MachinesTable } from '../../features/machines/components/machines-table';
import { NoAccess } from '../components/no-access';
import { SavedNotice } from '../components/saved-notice';
import { SetupNav } from '../components/setup-nav';
import { useSignedInUser } from '../signed-in-user';

export default function SetupMachinesRoute() {
  const user = useSignedInUser();
  if (!can(user.role, 'manage:machine:any')) return <NoAccess area="Setup" />;
  return (
    <>
      <SetupNav user={user} />
      <PageHeading
        title="Machines"
        description="Every machine a member needs clearance for: where it stands, the trainings it asks for, and its safety checklist."
        actions={
          <ButtonLink to={paths.setupMachineNew.getHref()} variant="primary">
            <PlusIcon />
            Add a machine
          </ButtonLink>
        }
      />
      <SavedNotice />
      <MachinesTable />
    </>
  );
}
