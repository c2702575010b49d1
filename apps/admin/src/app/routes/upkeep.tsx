import { can } from '@chuckkey/core';
import { PageHeading } from '../../components/ui/page-heading';
import { MaintenanceMachinePicker } from '../../features/maintenance/components/maintenance-machine-picker';
import { MaintenanceTable } from '../../features/maintenance/components/maintenance-table';
import { UpkeepTabs } from '../../features/upkeep/components/upkeep-tabs';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

export default function UpkeepRoute() {
  const user = useSignedInUser();
  if (!can(user.role, 'read:maintenance:any')) return <NoAccess area="Maintenance" who="the shop's instructors and admins" />;
  return (
    <>
      <UpkeepTabs role={user.role} />
      <PageHeading
        title="Maintenance"
        description="Every machine's recurring tasks, due by its meter hours or by the calendar. A task that stops use when overdue makes the stations refuse the machine until someone marks it done."
      />
      <div className="mt-6 flex flex-col gap-6">
        <MaintenanceMachinePicker />
        <MaintenanceTable />
      </div>
    </>
  );
}
