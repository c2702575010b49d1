import type { Member } from '@chuckkey/core';
import { Link } from 'react-router-dom';
import { paths } from '../../../config/paths';

/** A member's name opens their record: sign-offs, waiver and badge. */
export function MemberNameLink({ member }: { member: Member }) {
  return (
    <Link
      to={paths.memberRecord.getHref(member.id)}
      state={{ name: member.name }}
      className="font-bold text-brand underline underline-offset-4 hover:text-brand-strong"
    >
      {member.name}
    </Link>
  );
}
