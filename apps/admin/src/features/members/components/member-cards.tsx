import { roleLabels, type Member } from '@chuckkey/core';
import { formatDate } from '../../../lib/format';
import { ActiveToggle, RoleSelect, StatusBadge } from './member-actions';
import type { MemberChange } from './member-change-dialog';

interface MemberCardsProps {
  members: Member[];
  currentUserId: string;
  timeZone: string | undefined;
  onChange: (change: MemberChange) => void;
}

/** On a phone a row of six columns does not fit; each member becomes a card with the same controls. */
export function MemberCards({ members, currentUserId, timeZone, onChange }: MemberCardsProps) {
  return (
    <ul aria-label="Members of the shop" className="flex flex-col gap-3">
      {members.map((member) => {
        const isSelf = member.id === currentUserId;
        return (
          <li key={member.id} className="flex flex-col gap-3 rounded-lg border border-neutral-300 bg-white p-4">
            <div className="flex items-start justify-between gap-3">
              <p className="font-bold text-neutral-900">
                {member.name}
                {isSelf && <span className="font-normal text-neutral-700"> (you)</span>}
              </p>
              <StatusBadge active={member.active} />
            </div>
            <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
              <dt className="text-neutral-700">E-mail</dt>
              <dd className="break-all">{member.email}</dd>
              <dt className="text-neutral-700">Joined</dt>
              <dd>{formatDate(member.createdAt, timeZone)}</dd>
              <dt className="self-center text-neutral-700">Role</dt>
              <dd>{isSelf ? roleLabels[member.role] : <RoleSelect member={member} onChange={onChange} className="w-full" />}</dd>
            </dl>
            {!isSelf && <ActiveToggle member={member} onChange={onChange} className="self-start" />}
          </li>
        );
      })}
    </ul>
  );
}
