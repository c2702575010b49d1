import type { MemberListQuery } from '@chuckkey/core';
import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { memberFiltersToSearchParams, readMemberFilters } from '../utils/member-filters';

type FilterChange = Partial<Omit<MemberListQuery, 'pageSize'>>;

export function useMemberFilters() {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = useMemo(() => readMemberFilters(searchParams), [searchParams]);

  const update = useCallback(
    (change: FilterChange) => {
      setSearchParams(
        (current) => {
          const previous = readMemberFilters(current);
          // A new search, filter or sort makes the old page number meaningless.
          const page = change.page ?? 1;
          return memberFiltersToSearchParams({ ...previous, ...change, page });
        },
        { replace: change.search !== undefined },
      );
    },
    [setSearchParams],
  );

  return [filters, update] as const;
}
