import { can } from '@chuckkey/core';
import { useSearchParams } from 'react-router-dom';
import { PageHeading } from '../../components/ui/page-heading';
import { QueryError } from '../../components/ui/query-error';
import { Spinner } from '../../components/ui/spinner';
import { useShop } from '../../features/shop/api/get-shop';
import { useUsageReport } from '../../features/usage/api/get-usage-report';
import { RangePicker } from '../../features/usage/components/range-picker';
import { UsageView } from '../../features/usage/components/usage-view';
import { readRange, shopToday, type DateRange } from '../../features/usage/utils/date-range';
import { rangeLabel } from '../../features/usage/utils/usage-format';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

function UsageReports({ timeZone }: { timeZone: string }) {
  const [searchParams, setSearchParams] = useSearchParams();
  const today = shopToday(new Date(), timeZone);
  const range = readRange(searchParams, today);
  const machines = useUsageReport(range, 'machine');
  const members = useUsageReport(range, 'member');
  const choose = (next: DateRange) => setSearchParams({ from: next.from, to: next.to });
  const failed = machines.error ?? members.error;

  return (
    <div className="flex flex-col gap-6">
      <RangePicker range={range} today={today} onChange={choose} />
      <p role="status" className="text-neutral-800">
        {machines.isFetching || members.isFetching ? `Loading ${rangeLabel(range)}…` : `Showing ${rangeLabel(range)}, on the shop's calendar.`}
      </p>
      {failed ? (
        <QueryError
          error={failed}
          what="the usage"
          retrying={machines.isFetching || members.isFetching}
          onRetry={() => {
            void machines.refetch();
            void members.refetch();
          }}
        />
      ) : machines.data?.groupBy === 'machine' && members.data?.groupBy === 'member' ? (
        <UsageView range={{ from: machines.data.from, to: machines.data.to }} machines={machines.data} members={members.data} />
      ) : (
        <Spinner label="Loading the usage…" />
      )}
    </div>
  );
}

export default function UsageRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  if (!can(user.role, 'read:report:any')) return <NoAccess area="the usage review" />;

  return (
    <div className="flex flex-col gap-6">
      <PageHeading title="Usage" description="How the shop was used in the days you choose: machine hours, busy times, members, reservations, refused scans and sign-offs." />
      {shop.error ? (
        <QueryError error={shop.error} what="the shop's details" onRetry={() => void shop.refetch()} retrying={shop.isFetching} />
      ) : shop.data ? (
        <UsageReports timeZone={shop.data.timeZone} />
      ) : (
        <Spinner label="Loading the usage…" />
      )}
    </div>
  );
}
