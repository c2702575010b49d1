import { useQueryClient } from '@tanstack/react-query';
import { Alert } from '../../components/ui/alert';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { BadgePanel } from '../../features/badges/components/badge-panel';
import { PhotoPanel } from '../../features/badges/components/photo-panel';
import { PinForm } from '../../features/badges/components/pin-form';
import { calendarFeedKeys, useCalendarFeedStatus } from '../../features/calendar-feed/api/get-calendar-feed-status';
import { CalendarFeedPanel } from '../../features/calendar-feed/components/calendar-feed-panel';
import { CribMinePanel } from '../../features/crib/components/crib-mine-panel';
import { MyReservationsPanel } from '../../features/reservations/components/my-reservations-panel';
import { useShop } from '../../features/shop/api/get-shop';
import { SignOffList } from '../../features/sign-offs/components/sign-off-list';
import { useMemberWaiver } from '../../features/waivers/api/get-member-waiver';
import { WaiverPanel } from '../../features/waivers/components/waiver-panel';
import { useSignedInUser } from '../signed-in-user';

export default function MyRecordRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  const waiver = useMemberWaiver(user.id);
  const queryClient = useQueryClient();
  const feed = useCalendarFeedStatus();
  const timeZone = shop.data?.timeZone;
  const waiverMissing = Boolean(waiver.data?.current && !waiver.data.onFile);

  return (
    <>
      <PageHeading title="My record" description="What you are signed off on, your reservations and classes, what you have out from the crib, your badge and PIN, the shop's safety waiver, and your calendar feed." />
      {waiverMissing && (
        <Alert tone="warning" title="Your safety waiver is not on file">
          Stations clear you for no machine until you accept it.{' '}
          <a href="#waiver" className="font-bold text-brand underline underline-offset-4">
            Read and accept the waiver
          </a>
        </Alert>
      )}
      <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="flex flex-col gap-6">
          <Panel
            title="My sign-offs"
            description="Each sign-off says until when it counts and which machines ask for it. A machine that asks for several trainings opens once you hold all of them."
          >
            <SignOffList
              memberId={user.id}
              timeZone={timeZone}
              label="My sign-offs"
              empty="No sign-offs yet — ask an instructor about General shop safety"
            />
          </Panel>
          <MyReservationsPanel timeZone={timeZone} description="Machine time you reserved and the classes you are booked into. Reserve more on the Reserve page." />
          <CribMinePanel timeZone={timeZone} />
          <WaiverPanel memberId={user.id} name={user.name} timeZone={timeZone} />
        </div>
        <div className="flex flex-col gap-6">
          <BadgePanel memberId={user.id} timeZone={timeZone} />
          <PinForm />
          <PhotoPanel memberId={user.id} name={user.name} />
          <CalendarFeedPanel status={feed.data} timeZone={timeZone} onChanged={() => queryClient.invalidateQueries({ queryKey: calendarFeedKeys.all })} />
        </div>
      </div>
    </>
  );
}
