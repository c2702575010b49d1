import { paths } from '../../config/paths';
import { MachinesTable } from '../../features/machines/components/machines-table';
import { SetupListPage } from '../components/setup-list-page';

export default function SetupMachinesRoute() {
  return (
    <SetupListPage
      permission="manage:machine:any"
      title="Machines"
      description="Every machine a member needs clearance for: where it stands, the trainings it asks for, and its safety checklist."
      addHref={paths.setupMachineNew.getHref()}
      addLabel="Add a machine"
    >
      <MachinesTable />
    </SetupListPage>
  );
}
