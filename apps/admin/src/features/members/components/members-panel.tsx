import { roleLabels, roleSchema, roles } from '@chuckkey/core';
import { useCallback, useState } from 'react';
import { WIDE_SCREEN, useMediaQuery } from '../../../hooks/use-media-query';
import { buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { DownloadIcon } from '../../../components/ui/icons';
import { PagedResults } from '../../../components/ui/paged-results';
import { SelectField } from '../../../components/ui/select-field';
import { useMembers } from '../api/get-members';
import { useMemberFilters } from '../hooks/use-member-filters';
import { memberSortChoices, membersCsvHref, nextSort, readSortChoice, sortChoiceValue } from '../utils/member-filters';
import { MemberCards } from './member-cards';
import { MemberChangeDialog, type MemberChange } from './member-change-dialog';
import { MemberSearch } from './member-search';
import type { MemberExtras } from './member-extras';
import { MembersTable } from './members-table';

interface MembersPanelProps {
  currentUserId: string;
  timeZone: string | undefined;
  extras?: MemberExtras;
}

export function MembersPanel({ currentUserId, timeZone, extras = {} }: MembersPanelProps) {
  const [filters, update] = useMemberFilters();
  const members = useMembers(filters);
  const [change, setChange] = useState<MemberChange | null>(null);
  const onSearch = useCallback((search: string) => update({ search }), [update]);
  const filtered = Boolean(filters.search || filters.role);
  const wide = useMediaQuery(WIDE_SCREEN);

  return (
    <section aria-labelledby="members-heading" className="flex flex-col gap-4">
      <h2 id="members-heading" className="text-xl font-bold text-neutral-900">
        Members
      </h2>

      <div role="search" aria-label="Find members" className="flex flex-col gap-3 md:flex-row md:items-end">
        <MemberSearch value={filters.search ?? ''} onSearch={onSearch} />
        <SelectField
          label="Filter by role"
          value={filters.role ?? ''}
          onChange={(event) => {
            const role = roleSchema.safeParse(event.target.value);
            update({ role: role.success ? role.data : undefined });
          }}
          containerClassName="flex flex-col gap-1.5 md:w-48"
        >
          <option value="">All roles</option>
          {roles.map((role) => (
            <option key={role} value={role}>
              {roleLabels[role]}
            </option>
          ))}
        </SelectField>
        {!wide && (
          <SelectField
            label="Sort by"
            value={sortChoiceValue(filters)}
            onChange={(event) => {
              const choice = readSortChoice(event.target.value);
              if (choice) update(choice);
            }}
          >
            {memberSortChoices.map((choice) => (
              <option key={sortChoiceValue(choice)} value={sortChoiceValue(choice)}>
                {choice.label}
              </option>
            ))}
          </SelectField>
        )}
        <a href={membersCsvHref(filters)} download className={buttonClasses('secondary', 'md:self-end')}>
          <DownloadIcon />
          Export CSV
        </a>
      </div>

      <PagedResults
        query={members}
        loadingLabel="Loading members…"
        what="the members"
        page={filters.page}
        pageSize={filters.pageSize}
        nouns={['member', 'members']}
        onPageChange={(page) => update({ page })}
        pastEndNote="The list is shorter than it was when this page was opened."
        empty={
          filtered ? (
            <EmptyState title="Nobody matches">
              Try a shorter search, or choose &ldquo;All roles&rdquo;.
            </EmptyState>
          ) : (
            <EmptyState title="No members yet">Invite the first person with the form below.</EmptyState>
          )
        }
      >
        {(items) =>
          wide ? (
            <MembersTable
              members={items}
              filters={filters}
              currentUserId={currentUserId}
              timeZone={timeZone}
              onSort={(sort) => update(nextSort(filters, sort))}
              onChange={setChange}
              extras={extras}
            />
          ) : (
            <MemberCards
              members={items}
              currentUserId={currentUserId}
              timeZone={timeZone}
              onChange={setChange}
              extras={extras}
            />
          )
        }
      </PagedResults>

      <MemberChangeDialog change={change} onClose={() => setChange(null)} />
    </section>
  );
}
