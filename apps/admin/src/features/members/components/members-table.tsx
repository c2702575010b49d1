import { roleLabels, roles, type Member, type MemberListQuery, type Role } from '@chuckkey/core';
import { Button } from '../../../components/ui/button';
import { cn } from '../../../components/ui/cn';
import { SortableTh, TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { formatDate } from '../../../lib/format';
import type { MemberSort } from '../utils/member-filters';
import type { MemberChange } from './member-change-dialog';

interface MembersTableProps {
  members: Member[];
  filters: MemberListQuery;
  currentUserId: string;
  timeZone: string | undefined;
  onSort: (sort: MemberSort) => void;
  onChange: (change: MemberChange) => void;
}

const columns: { sort: MemberSort; label: string }[] = [
  { sort: 'name', label: 'Name' },
  { sort: 'email', label: 'E-mail' },
  { sort: 'role', label: 'Role' },
  { sort: 'createdAt', label: 'Joined' },
];

function StatusBadge({ active }: { active: boolean }) {
  return (
    <span
      className={cn(
        'inline-flex items-center gap-1.5 rounded-full px-2.5 py-0.5 text-sm font-bold',
        active ? 'bg-success-soft text-success' : 'bg-neutral-200 text-neutral-800',
      )}
    >
      <span aria-hidden="true" className={cn('size-2 rounded-full', active ? 'bg-success' : 'border border-neutral-700')} />
      {active ? 'Active' : 'Inactive'}
    </span>
  );
}

export function MembersTable({ members, filters, currentUserId, timeZone, onSort, onChange }: MembersTableProps) {
  return (
    <Table caption="Members of the shop">
      <THead>
        <Tr>
          {columns.map((column) => (
            <SortableTh
              key={column.sort}
              label={column.label}
              order={filters.sort === column.sort ? filters.order : undefined}
              onSort={() => onSort(column.sort)}
            />
          ))}
          <Th>Status</Th>
          <Th>
            <span className="sr-only">Actions</span>
          </Th>
        </Tr>
      </THead>
      <TBody>
        {members.map((member) => {
          const isSelf = member.id === currentUserId;
          return (
            <Tr key={member.id} className={member.active ? undefined : 'bg-neutral-50'}>
              <Td className="font-bold">
                {member.name}
                {isSelf && <span className="ml-2 font-normal text-neutral-700">(you)</span>}
              </Td>
              <Td className="break-all">{member.email}</Td>
              <Td>
                {isSelf ? (
                  roleLabels[member.role]
                ) : (
                  <select
                    aria-label={`Role of ${member.name}`}
                    value={member.role}
                    onChange={(event) => onChange({ member, role: event.target.value as Role })}
                    className="min-h-11 rounded-md border border-neutral-500 bg-white px-2 md:min-h-9"
                  >
                    {roles.map((role) => (
                      <option key={role} value={role}>
                        {roleLabels[role]}
                      </option>
                    ))}
                  </select>
                )}
              </Td>
              <Td className="whitespace-nowrap">{formatDate(member.createdAt, timeZone)}</Td>
              <Td>
                <StatusBadge active={member.active} />
              </Td>
              <Td className="text-right">
                {!isSelf && (
                  <Button
                    variant="secondary"
                    aria-label={`${member.active ? 'Deactivate' : 'Reactivate'} ${member.name}`}
                    onClick={() => onChange({ member, active: !member.active })}
                  >
                    {member.active ? 'Deactivate' : 'Reactivate'}
                  </Button>
                )}
              </Td>
            </Tr>
          );
        })}
      </TBody>
    </Table>
  );
}
