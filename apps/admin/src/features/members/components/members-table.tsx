import { roleLabels, type Member, type MemberListQuery } from '@chuckkey/core';
import { SortableTh, TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { formatDate } from '../../../lib/format';
import { memberColumns, type MemberSort } from '../utils/member-filters';
import { ActiveToggle, RoleSelect, StatusBadge } from './member-actions';
import type { MemberChange } from './member-change-dialog';

interface MembersTableProps {
  members: Member[];
  filters: MemberListQuery;
  currentUserId: string;
  timeZone: string | undefined;
  onSort: (sort: MemberSort) => void;
  onChange: (change: MemberChange) => void;
}

export function MembersTable({ members, filters, currentUserId, timeZone, onSort, onChange }: MembersTableProps) {
  return (
    <Table caption="Members of the shop">
      <THead>
        <Tr>
          {memberColumns.map((column) => (
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
                {isSelf && <span className="font-normal text-neutral-700"> (you)</span>}
              </Td>
              <Td>{member.email}</Td>
              <Td>{isSelf ? roleLabels[member.role] : <RoleSelect member={member} onChange={onChange} />}</Td>
              <Td className="whitespace-nowrap">{formatDate(member.createdAt, timeZone)}</Td>
              <Td>
                <StatusBadge active={member.active} />
              </Td>
              <Td className="text-right">{!isSelf && <ActiveToggle member={member} onChange={onChange} />}</Td>
            </Tr>
          );
        })}
      </TBody>
    </Table>
  );
}
