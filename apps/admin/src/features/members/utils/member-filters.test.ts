import { describe, expect, it } from 'vitest';
import {
  memberFiltersToSearchParams,
  memberSortChoices,
  membersCsvHref,
  nextSort,
  readMemberFilters,
  readSortChoice,
  sortChoiceValue,
} from './member-filters';

const defaults = { page: 1, pageSize: 25, sort: 'name', order: 'asc', search: undefined } as const;

describe('member filters in the URL', () => {
  it('a plain /people shows the first 25 by name', () => {
    expect(readMemberFilters(new URLSearchParams())).toEqual(defaults);
  });

  it('reads search, role, page and sort from the address', () => {
    const filters = readMemberFilters(new URLSearchParams('search=ada&role=admin&page=3&sort=createdAt&order=desc'));

    expect(filters).toEqual({ search: 'ada', role: 'admin', page: 3, pageSize: 25, sort: 'createdAt', order: 'desc' });
  });

  it('drops a mangled value and keeps the others', () => {
    const filters = readMemberFilters(new URLSearchParams('role=wizard&page=-4&sort=email'));

    expect(filters).toEqual({ ...defaults, sort: 'email' });
  });

  it('ignores a page size in the address: the table always shows 25', () => {
    expect(readMemberFilters(new URLSearchParams('pageSize=100')).pageSize).toBe(25);
  });

  it('writes only what differs from the defaults', () => {
    expect(memberFiltersToSearchParams(defaults).toString()).toBe('');
    expect(memberFiltersToSearchParams({ ...defaults, role: 'instructor', page: 2 }).toString()).toBe('role=instructor&page=2');
  });

  it('survives a round trip through the address', () => {
    const filters = { search: 'lathe club', role: 'member', page: 4, pageSize: 25, sort: 'email', order: 'desc' } as const;

    expect(readMemberFilters(memberFiltersToSearchParams(filters))).toEqual(filters);
  });
});

describe('nextSort', () => {
  it('turns the sorted column round', () => {
    expect(nextSort({ ...defaults }, 'name')).toEqual({ sort: 'name', order: 'desc' });
    expect(nextSort({ ...defaults, order: 'desc' }, 'name')).toEqual({ sort: 'name', order: 'asc' });
  });

  it('starts a new text column A to Z and the joined date newest first', () => {
    expect(nextSort({ ...defaults }, 'email')).toEqual({ sort: 'email', order: 'asc' });
    expect(nextSort({ ...defaults }, 'createdAt')).toEqual({ sort: 'createdAt', order: 'desc' });
  });
});

describe('membersCsvHref', () => {
  it('exports every match of the current filters, not only the page on screen', () => {
    const href = membersCsvHref({ search: 'ada', role: 'admin', page: 3, pageSize: 25, sort: 'email', order: 'desc' });

    expect(href).toBe('/api/members?format=csv&search=ada&role=admin&sort=email&order=desc');
  });
});

describe('sorting on a phone', () => {
  it('offers every column in both orders, each as one choice', () => {
    const values = memberSortChoices.map(sortChoiceValue);

    expect(new Set(values).size).toBe(8);
    expect(readSortChoice('createdAt:desc')).toEqual({ sort: 'createdAt', order: 'desc' });
  });

  it('ignores a choice it does not offer', () => {
    expect(readSortChoice('password:asc')).toBeUndefined();
  });
});
