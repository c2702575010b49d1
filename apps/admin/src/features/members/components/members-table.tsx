import { roleLabels, type Member, type MemberListQuery } from '@chuckkey/core';
import { ActionsTh, SortableThs, TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { formatDate } from '../../../lib/format';
import { memberColumns, type MemberSort } from '../utils/member-filters';
import { ActiveToggle, RoleSelect, StatusBadge } from './member-actions';
import type { MemberChange } from './member-change-dialog';
import type { MemberExtras } from './member-extras';
import { MemberNameLink } from './member-name-link';

interface MembersTableProps {
  members: Member[];
  filters: MemberListQuery;
  currentUserId: string;
  timeZone: string | undefined;
  onSort: (sort: MemberSort) => void;
  onChange: (change: MemberChange) => void;
  extras?: MemberExtras;
}

const checkboxClasses = 'size-5 cursor-pointer accent-brand';

export function MembersTable({ members, filters, currentUserId, timeZone, onSort, onChange, extras = {} }: MembersTableProps) {
  const { selected, onSelect, rowActions } = extras;
  const selectable = Boolean(selected && onSelect);
  const allSelected = selectable && members.every((member) => selected?.has(member.id));
  return (
    <Table caption="Members of the shop">
      <THead>
        <Tr>
          {selectable && (
            <Th className="w-12">
              <label className="flex size-11 cursor-pointer items-center justify-center">
                <input
                  type="checkbox"
                  className={checkboxClasses}
                  checked={allSelected}
                  onChange={(event) => onSelect?.(members, event.target.checked)}
                />
                <span className="sr-only">Choose everyone on this page for the badge sheet</span>
              </label>
            </Th>
          )}
          <SortableThs columns={memberColumns} sortedField={filters.sort} order={filters.order} onSort={onSort} />
          <Th>Status</Th>
          <ActionsTh />
        </Tr>
      </THead>
      <TBody>
        {members.map((member) => {
          const isSelf = member.id === currentUserId;
          return (
            <Tr key={member.id} className={member.active ? undefined : 'bg-neutral-50'}>
              {selectable && (
                <Td className="px-2 py-1">
                  <label className="flex size-11 cursor-pointer items-center justify-center">
                    <input
                      type="checkbox"
                      className={checkboxClasses}
                      checked={selected?.has(member.id) ?? false}
                      onChange={(event) => onSelect?.([member], event.target.checked)}
                    />
                    <span className="sr-only">Choose {member.name} for the badge sheet</span>
                  </label>
                </Td>
              )}
              <Td>
                <MemberNameLink member={member} />
                {isSelf && <span className="text-neutral-700"> (you)</span>}
              </Td>
              <Td>{member.email}</Td>
              <Td>{isSelf ? roleLabels[member.role] : <RoleSelect member={member} onChange={onChange} />}</Td>
              <Td className="whitespace-nowrap">{formatDate(member.createdAt, timeZone)}</Td>
              <Td>
                <StatusBadge active={member.active} />
              </Td>
              <Td>
                <div className="flex justify-end gap-2">
                  {rowActions?.(member, 'row')}
                  {!isSelf && <ActiveToggle member={member} onChange={onChange} />}
                </div>
              </Td>
            </Tr>
          );
        })}
      </TBody>
    </Table>
  );
}
