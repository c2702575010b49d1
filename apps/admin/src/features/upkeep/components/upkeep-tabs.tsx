import { can, type Permission, type Role } from '@chuckkey/core';
import { SectionNav } from '../../../components/ui/section-nav';
import { paths } from '../../../config/paths';

const items: { label: string; to: string; end?: boolean; permission: Permission }[] = [
  { label: 'Maintenance', to: paths.upkeep.getHref(), end: true, permission: 'read:maintenance:any' },
  { label: 'Tag-outs', to: paths.upkeepTagOuts.getHref(), permission: 'read:tag-out:any' },
  { label: 'Incidents', to: paths.upkeepIncidents.getHref(), permission: 'read:incident:any' },
];

/**
 * The parts of Upkeep, each at its own address; every Upkeep page shows them at its top. Only the
 * parts the person may open are listed (instructors see maintenance and tag-outs, not incidents).
 */
export function UpkeepTabs({ role }: { role: Role }) {
  return <SectionNav label="Upkeep" items={items.filter((item) => can(role, item.permission))} />;
}
