import { teachMemberListSchema, type TeachMember } from '@chuckkey/core';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { signOffKeys } from './sign-off-keys';

/** Fewer letters than this match half the shop; the list waits for a useful search. */
export const CANDIDATE_SEARCH_MIN = 2;

export function searchCandidates(search: string, signal?: AbortSignal): Promise<TeachMember[]> {
  return api.get('/teach/members', { query: { search }, schema: teachMemberListSchema, signal });
}

export function candidateSearchQueryOptions(search: string) {
  return queryOptions({
    queryKey: signOffKeys.candidateSearch(search),
    queryFn: ({ signal }) => searchCandidates(search, signal),
    enabled: search.length >= CANDIDATE_SEARCH_MIN,
    placeholderData: keepPreviousData,
  });
}

export function useCandidateSearch(search: string) {
  return useQuery(candidateSearchQueryOptions(search));
}
