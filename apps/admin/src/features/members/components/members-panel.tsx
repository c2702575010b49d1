import { roleLabels, roleSchema, roles } from '@chuckkey/core';
import { useCallback, useState } from 'react';
import { WIDE_SCREEN, useMediaQuery } from '../../../hooks/use-media-query';
import { Button, buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { DownloadIcon } from '../../../components/ui/icons';
import { Pagination } from '../../../components/ui/pagination';
import { QueryError } from '../../../components/ui/query-error';
import { SelectField } from '../../../components/ui/select-field';
import { Spinner } from '../../../components/ui/spinner';
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

      {members.isPending ? (
        <Spinner label="Loading members…" />
      ) : members.isError ? (
        <QueryError error={members.error} what="the members" onRetry={() => void members.refetch()} retrying={members.isFetching} />
      ) : members.data.items.length === 0 ? (
        filters.page > 1 ? (
          <EmptyState
            title="This page is empty"
            action={
              <Button variant="secondary" onClick={() => update({ page: 1 })}>
                Go to the first page
              </Button>
            }
          >
            The list is shorter than it was when this page was opened.
          </EmptyState>
        ) : filtered ? (
          <EmptyState title="Nobody matches">
            Try a shorter search, or choose &ldquo;All roles&rdquo;.
          </EmptyState>
        ) : (
          <EmptyState title="No members yet">Invite the first person with the form below.</EmptyState>
        )
      ) : (
        <div className={members.isPlaceholderData ? 'opacity-60 transition-opacity' : undefined} aria-busy={members.isPlaceholderData}>
          {wide ? (
            <MembersTable
              members={members.data.items}
              filters={filters}
              currentUserId={currentUserId}
              timeZone={timeZone}
              onSort={(sort) => update(nextSort(filters, sort))}
              onChange={setChange}
              extras={extras}
            />
          ) : (
            <MemberCards
              members={members.data.items}
              currentUserId={currentUserId}
              timeZone={timeZone}
              onChange={setChange}
              extras={extras}
            />
          )}
        </div>
      )}

      {members.data && members.data.total > 0 && (
        <Pagination
          page={filters.page}
          pageSize={filters.pageSize}
          total={members.data.total}
          nouns={['member', 'members']}
          onPageChange={(page) => update({ page })}
        />
      )}

      <MemberChangeDialog change={change} onClose={() => setChange(null)} />
    </section>
  );
}
