import type { TeachMember } from '@chuckkey/core';
import { TEACH_SEARCH_LIMIT } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { membersRepository, toMember } from '../members/members.repository';

/** What an instructor needs to find someone to sign off, and no more of the member list. */
export function teachService({ db }: Deps) {
  const members = membersRepository(db);
  return {
    async searchMembers(search: string): Promise<TeachMember[]> {
      const { items } = await members.list({ search: search || undefined, page: 1, pageSize: TEACH_SEARCH_LIMIT, sort: 'name', order: 'asc' });
      return items.map(toMember).map(({ id, name, email, active }) => ({ id, name, email, active }));
    },
  };
}
