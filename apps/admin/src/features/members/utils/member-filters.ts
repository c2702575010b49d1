import { memberListQuerySchema, type MemberListQuery } from '@chuckkey/core';
import { apiHref } from '../../../lib/api-client';
import type { SortColumn } from '../../../lib/table-sort';

export type MemberSort = MemberListQuery['sort'];

const MEMBERS_PAGE_SIZE = 25;

export const memberColumns: SortColumn<MemberSort>[] = [
  { field: 'name', label: 'Name' },
  { field: 'email', label: 'E-mail' },
  { field: 'role', label: 'Role' },
  { field: 'createdAt', label: 'Joined' },
];

type SortChoice = Pick<MemberListQuery, 'sort' | 'order'>;

/** On a phone there are no column headers to click; one list names every order in words. */
export const memberSortChoices: (SortChoice & { label: string })[] = [
  { sort: 'name', order: 'asc', label: 'Name, A to Z' },
  { sort: 'name', order: 'desc', label: 'Name, Z to A' },
  { sort: 'email', order: 'asc', label: 'E-mail, A to Z' },
  { sort: 'email', order: 'desc', label: 'E-mail, Z to A' },
  { sort: 'role', order: 'asc', label: 'Role, ascending' },
  { sort: 'role', order: 'desc', label: 'Role, descending' },
  { sort: 'createdAt', order: 'desc', label: 'Joined, newest first' },
  { sort: 'createdAt', order: 'asc', label: 'Joined, oldest first' },
];

export function sortChoiceValue(choice: SortChoice): string {
  return `${choice.sort}:${choice.order}`;
}

export function readSortChoice(value: string): SortChoice | undefined {
  const choice = memberSortChoices.find((option) => sortChoiceValue(option) === value);
  return choice && { sort: choice.sort, order: choice.order };
}

const defaults = memberListQuerySchema.parse({ pageSize: MEMBERS_PAGE_SIZE });
const urlKeys = ['search', 'role', 'page', 'sort', 'order'] as const;

/**
 * Reads the table's state from the page's URL, so that a view can be bookmarked and the back
 * button works. A value someone mangled by hand falls back to its default on its own,
 * keeping the rest.
 */
export function readMemberFilters(params: URLSearchParams): MemberListQuery {
  const raw: Record<string, string> = {};
  for (const key of urlKeys) {
    const value = params.get(key);
    if (value !== null && value.trim() !== '') raw[key] = value;
  }
  for (;;) {
    const result = memberListQuerySchema.safeParse({ ...raw, pageSize: MEMBERS_PAGE_SIZE });
    if (result.success) return { ...result.data, search: result.data.search || undefined };
    const bad = new Set(result.error.issues.map((issue) => String(issue.path[0])));
    const before = Object.keys(raw).length;
    for (const key of bad) delete raw[key];
    if (Object.keys(raw).length === before) return defaults;
  }
}

/** Writes only what differs from the defaults, so that a plain /people stays plain. */
export function memberFiltersToSearchParams(filters: MemberListQuery): URLSearchParams {
  const params = new URLSearchParams();
  if (filters.search) params.set('search', filters.search);
  if (filters.role) params.set('role', filters.role);
  if (filters.page !== defaults.page) params.set('page', String(filters.page));
  if (filters.sort !== defaults.sort) params.set('sort', filters.sort);
  if (filters.order !== defaults.order) params.set('order', filters.order);
  return params;
}

/** Clicking the sorted column turns it round; a new column starts with its most useful order. */
export function nextSort(filters: MemberListQuery, sort: MemberSort): Pick<MemberListQuery, 'sort' | 'order'> {
  if (filters.sort === sort) return { sort, order: filters.order === 'asc' ? 'desc' : 'asc' };
  return { sort, order: sort === 'createdAt' ? 'desc' : 'asc' };
}

/** The export holds every match of the current search, not just the page on screen. */
export function membersCsvHref(filters: MemberListQuery): string {
  return apiHref('/members', {
    format: 'csv',
    search: filters.search,
    role: filters.role,
    sort: filters.sort,
    order: filters.order,
  });
}
