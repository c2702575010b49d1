import { can, type Permission, type User } from '@chuckkey/core';
import { SectionNav } from '../../components/ui/section-nav';
import { paths } from '../../config/paths';

const items: { label: string; to: string; permission: Permission }[] = [
  { label: 'Machines', to: paths.setupMachines.getHref(), permission: 'manage:machine:any' },
  { label: 'Trainings', to: paths.setupTrainings.getHref(), permission: 'manage:training:any' },
  { label: 'Stations', to: paths.setupStations.getHref(), permission: 'manage:station:any' },
  { label: 'Shop hours', to: paths.setupHours.getHref(), permission: 'manage:shop:any' },
  { label: 'Policies', to: paths.setupPolicies.getHref(), permission: 'manage:shop:any' },
  { label: 'Waiver', to: paths.setupWaiver.getHref(), permission: 'manage:waiver:any' },
];

export function SetupNav({ user }: { user: User }) {
  return <SectionNav label="Setup" items={items.filter((item) => can(user.role, item.permission))} />;
}
