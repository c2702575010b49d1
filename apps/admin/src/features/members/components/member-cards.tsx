import { roleLabels, type Member } from '@chuckkey/core';
import { formatDate } from '../../../lib/format';
import { ActiveToggle, RoleSelect, StatusBadge } from './member-actions';
import type { MemberChange } from './member-change-dialog';
import type { MemberExtras } from './member-extras';
import { MemberNameLink } from './member-name-link';

interface MemberCardsProps {
  members: Member[];
  currentUserId: string;
  timeZone: string | undefined;
  onChange: (change: MemberChange) => void;
  extras?: MemberExtras;
}

/** On a phone a row of six columns does not fit; each member becomes a card with the same controls. */
export function MemberCards({ members, currentUserId, timeZone, onChange, extras = {} }: MemberCardsProps) {
  const { selected, onSelect, rowActions } = extras;
  return (
    <ul aria-label="Members of the shop" className="flex flex-col gap-3">
      {members.map((member) => {
        const isSelf = member.id === currentUserId;
        return (
          <li key={member.id} className="flex flex-col gap-3 rounded-lg border border-neutral-300 bg-white p-4">
            <div className="flex items-start justify-between gap-3">
              <p>
                <MemberNameLink member={member} />
                {isSelf && <span className="text-neutral-700"> (you)</span>}
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
            {selected && onSelect && (
              <label className="flex min-h-11 cursor-pointer items-center gap-3">
                <input
                  type="checkbox"
                  className="size-6 cursor-pointer accent-brand"
                  checked={selected.has(member.id)}
                  onChange={(event) => onSelect([member], event.target.checked)}
                />
                <span>
                  Choose for the badge sheet<span className="sr-only">: {member.name}</span>
                </span>
              </label>
            )}
            <div className="flex flex-wrap gap-2">
              {rowActions?.(member, 'card')}
              {!isSelf && <ActiveToggle member={member} onChange={onChange} />}
            </div>
          </li>
        );
      })}
    </ul>
  );
}
