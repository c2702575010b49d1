import { can, type TagOutListItem, type User } from '@chuckkey/core';

/** Whether this person is offered "Clear": an admin for any tag-out, an instructor for the ones they set. The server decides again. */
export function mayClear(user: Pick<User, 'id' | 'role'>, tagOut: Pick<TagOutListItem, 'reportedBy'>): boolean {
  if (can(user.role, 'clear:tag-out:any')) return true;
  return can(user.role, 'clear:tag-out:own') && tagOut.reportedBy?.id === user.id;
}
