import { can } from '@chuckkey/core';
import { useSearchParams } from 'react-router-dom';
import { PageHeading } from '../../components/ui/page-heading';
import { useShop } from '../../features/shop/api/get-shop';
import { SignOffReport } from '../../features/sign-offs/components/sign-off-report';
import { NoAccess } from '../components/no-access';
import { PeopleNav } from '../components/people-nav';
import { useSignedInUser } from '../signed-in-user';

export default function SignOffReportRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  const [searchParams] = useSearchParams();
  if (!can(user.role, 'report:sign-off:any')) return <NoAccess area="the sign-off report" />;

  const status = searchParams.get('status') === 'expired' ? 'expired' : 'expiring';
  return (
    <>
      <PeopleNav user={user} />
      <PageHeading
        title="Sign-offs to renew"
        description="Sign-offs that lapse in the next 30 days, and those that already have. Members get an e-mail 30 and 7 days before."
      />
      <SignOffReport key={status} status={status} timeZone={shop.data?.timeZone} />
    </>
  );
}
