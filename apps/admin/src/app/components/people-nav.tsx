import { can, type Permission, type User } from '@chuckkey/core';
import { SectionNav } from '../../components/ui/section-nav';
import { paths } from '../../config/paths';

const items: { label: string; to: string; end?: boolean; permission: Permission }[] = [
  { label: 'Members', to: paths.people.getHref(), end: true, permission: 'read:member:any' },
  { label: 'Sign-offs', to: paths.signOffReport.getHref(), permission: 'report:sign-off:any' },
  { label: 'Audit log', to: paths.auditLog.getHref(), permission: 'read:audit:any' },
  { label: 'Reservations', to: paths.reservationsReport.getHref(), permission: 'manage:machine:any' },
];

/** People holds the records about members: who they are, which sign-offs lapse, what changed, what they reserved. */
export function PeopleNav({ user }: { user: User }) {
  return <SectionNav label="People" items={items.filter((item) => can(user.role, item.permission))} />;
}
