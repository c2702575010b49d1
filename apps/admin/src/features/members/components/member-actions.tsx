import { roleLabels, roleSchema, roles, type Member } from '@chuckkey/core';
import { Button } from '../../../components/ui/button';
import { cn } from '../../../components/ui/cn';
import type { MemberChange } from './member-change-dialog';

interface MemberActionProps {
  member: Member;
  onChange: (change: MemberChange) => void;
  className?: string;
}

export function RoleSelect({ member, onChange, className }: MemberActionProps) {
  return (
    <select
      aria-label={`Role of ${member.name}`}
      value={member.role}
      onChange={(event) => {
        const role = roleSchema.safeParse(event.target.value);
        if (role.success) onChange({ member, role: role.data });
      }}
      className={cn('min-h-11 rounded-md border border-neutral-500 bg-white px-2 md:min-h-9', className)}
    >
      {roles.map((role) => (
        <option key={role} value={role}>
          {roleLabels[role]}
        </option>
      ))}
    </select>
  );
}

export function ActiveToggle({ member, onChange, className }: MemberActionProps) {
  const verb = member.active ? 'Deactivate' : 'Reactivate';
  return (
    <Button
      variant="secondary"
      aria-label={`${verb} ${member.name}`}
      onClick={() => onChange({ member, active: !member.active })}
      className={className}
    >
      {verb}
    </Button>
  );
}

export function StatusBadge({ active }: { active: boolean }) {
  return (
    <span
      className={cn(
        'inline-flex items-center gap-1.5 rounded-full px-2.5 py-0.5 text-sm font-bold whitespace-nowrap',
        active ? 'bg-success-soft text-success' : 'bg-neutral-200 text-neutral-800',
      )}
    >
      <span aria-hidden="true" className={cn('size-2 rounded-full', active ? 'bg-success' : 'border border-neutral-700')} />
      {active ? 'Active' : 'Inactive'}
    </span>
  );
}
