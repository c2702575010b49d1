import { can, type Member } from '@chuckkey/core';
import { useCallback, useMemo, useState } from 'react';
import { PageHeading } from '../../components/ui/page-heading';
import { BadgeSheetBar, PrintCardLink } from '../../features/badges/components/badge-print';
import { InviteForm } from '../../features/invitations/components/invite-form';
import { OpenInvitations } from '../../features/invitations/components/open-invitations';
import { MembersPanel } from '../../features/members/components/members-panel';
import { useShop } from '../../features/shop/api/get-shop';
import { NoAccess } from '../components/no-access';
import { PeopleNav } from '../components/people-nav';
import { useSignedInUser } from '../signed-in-user';

export default function PeopleRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  // Kept while paging and searching, so one sheet can hold members from several pages.
  const [chosen, setChosen] = useState<Map<string, string>>(() => new Map());
  const onSelect = useCallback((members: Member[], selected: boolean) => {
    setChosen((current) => {
      const next = new Map(current);
      for (const member of members) {
        if (selected) next.set(member.id, member.name);
        else next.delete(member.id);
      }
      return next;
    });
  }, []);
  const canPrint = can(user.role, 'manage:badge:any');
  const extras = useMemo(
    () =>
      canPrint
        ? {
            selected: new Set(chosen.keys()),
            onSelect,
            rowActions: (member: Member, place: 'row' | 'card') => (
              <PrintCardLink memberId={member.id} name={member.name} compact={place === 'row'} />
            ),
          }
        : {},
    [canPrint, chosen, onSelect],
  );
  if (!can(user.role, 'read:member:any')) return <NoAccess area="People" />;

  const timeZone = shop.data?.timeZone;
  return (
    <>
      <PeopleNav user={user} />
      <PageHeading
        title="People"
        description="The shop's members and their roles, and the invitations still open. Open a member's name for their sign-offs and waiver."
      />
      {canPrint && (
        <BadgeSheetBar chosen={[...chosen].map(([id, name]) => ({ id, name }))} onClear={() => setChosen(new Map())} />
      )}
      <MembersPanel currentUserId={user.id} timeZone={timeZone} extras={extras} />
      <div className="grid grid-cols-1 gap-6 xl:grid-cols-2">
        <InviteForm />
        <OpenInvitations timeZone={timeZone} />
      </div>
    </>
  );
}
