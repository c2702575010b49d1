import { can } from '@chuckkey/core';
import { useLocation, useParams } from 'react-router-dom';
import { MemberPhoto } from '../../components/member-photo';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { PrintCardLink } from '../../features/badges/components/badge-print';
import { useShop } from '../../features/shop/api/get-shop';
import { useMemberSignOffs } from '../../features/sign-offs/api/get-member-sign-offs';
import { SignOffList } from '../../features/sign-offs/components/sign-off-list';
import { MemberWaiverPanel } from '../../features/waivers/components/member-waiver-panel';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

/** Links into this page carry the member's name; the sign-offs carry it too when the page is reloaded. */
function nameFromState(state: unknown): string | undefined {
  if (state && typeof state === 'object' && 'name' in state && typeof state.name === 'string') return state.name;
  return undefined;
}

export default function MemberRecordRoute() {
  const { memberId = '' } = useParams();
  const location = useLocation();
  const user = useSignedInUser();
  const shop = useShop();
  const signOffs = useMemberSignOffs(memberId);
  if (!can(user.role, 'read:sign-off:any')) return <NoAccess area="members' records" who="the shop's instructors and admins" />;

  const name = nameFromState(location.state) ?? signOffs.data?.[0]?.memberName;
  const timeZone = shop.data?.timeZone;
  const isAdmin = can(user.role, 'manage:badge:any');

  return (
    <>
      <p>
        <TextLink to={paths.teach.getHref()}>Back to Teach</TextLink>
      </p>
      <div className="flex items-start gap-4">
        <MemberPhoto memberId={memberId} name={name ?? 'this member'} />
        <PageHeading title={name ? `${name}'s record` : "Member's record"} description="Sign-offs, newest first, with when each lapses." />
      </div>
      <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Panel title="Sign-offs">
          <SignOffList
            memberId={memberId}
            timeZone={timeZone}
            canRevoke={can(user.role, 'revoke:sign-off:any')}
            label={name ? `${name}'s sign-offs` : 'Sign-offs'}
            empty={`No sign-offs yet. Sign ${name ?? 'them'} off under Teach after their practical check.`}
          />
        </Panel>
        {isAdmin && (
          <div className="flex flex-col gap-6">
            <Panel title="Badge card" description="The member's card as a PDF at ID-1 size, to print at 100 %.">
              <PrintCardLink memberId={memberId} name={name ?? 'this member'} />
            </Panel>
            <MemberWaiverPanel memberId={memberId} timeZone={timeZone} />
          </div>
        )}
      </div>
    </>
  );
}
