import { can, shopDate } from '@chuckkey/core';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { QueryError } from '../../components/ui/query-error';
import { Spinner } from '../../components/ui/spinner';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { useCreateClass } from '../../features/classes/api/create-class';
import { useClasses } from '../../features/classes/api/get-classes';
import { ClassHoldForm } from '../../features/classes/components/class-hold-form';
import { ClassesList } from '../../features/classes/components/classes-list';
import { useMachines } from '../../features/machines/api/get-machines';
import { reservationKeys } from '../../features/reservations/api/reservation-keys';
import { useShop } from '../../features/shop/api/get-shop';
import { useTrainings } from '../../features/trainings/api/get-trainings';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

const DAY_MS = 86_400_000;
/** Far enough ahead to see every remaining week of the longest class (26 weeks). */
const LOOK_AHEAD_DAYS = 27 * 7;

export default function TeachClassesRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  const machines = useMachines();
  const trainings = useTrainings();
  const create = useCreateClass();
  const queryClient = useQueryClient();
  // One range for the page's life, so that the list's query keeps one key.
  const [range] = useState(() => {
    const from = new Date();
    return { from: from.toISOString(), to: new Date(from.getTime() + LOOK_AHEAD_DAYS * DAY_MS).toISOString() };
  });
  const classes = useClasses(range.from, range.to);
  if (!can(user.role, 'manage:class:any')) return <NoAccess area="Classes" who="the shop's instructors and admins" />;

  const timeZone = shop.data?.timeZone;
  let list;
  if (classes.isError) list = <QueryError error={classes.error} what="the classes" onRetry={() => void classes.refetch()} retrying={classes.isFetching} />;
  else if (!classes.data || !timeZone) list = <Spinner label="Loading the classes…" />;
  else list = <ClassesList classes={classes.data.classes} timeZone={timeZone} now={new Date()} classHref={paths.teachClass.getHref} />;

  let form;
  if (machines.isError) form = <QueryError error={machines.error} what="the machines" onRetry={() => void machines.refetch()} retrying={machines.isFetching} />;
  else if (trainings.isError) form = <QueryError error={trainings.error} what="the trainings" onRetry={() => void trainings.refetch()} retrying={trainings.isFetching} />;
  else if (shop.isError) form = <QueryError error={shop.error} what="the shop's details" onRetry={() => void shop.refetch()} retrying={shop.isFetching} />;
  else if (!machines.data || !trainings.data || !timeZone) form = <Spinner label="Loading the machines…" />;
  else
    form = (
      <ClassHoldForm
        machines={machines.data}
        trainings={trainings.data.filter((training) => training.active)}
        timeZone={timeZone}
        today={shopDate(new Date(), timeZone)}
        onHold={async (body) => {
          const held = await create.mutateAsync(body);
          // The held meetings are taken time in every machine week and in the members' lists.
          await queryClient.invalidateQueries({ queryKey: reservationKeys.all });
          return held;
        }}
        classHref={paths.teachClass.getHref}
      />
    );

  return (
    <>
      <p>
        <TextLink to={paths.teach.getHref()}>Back to Teach</TextLink>
      </p>
      <PageHeading title="Classes" description="Hold a machine for a class, once or on the same day each week, and book members in." />
      <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
        <Panel title="Upcoming classes">{list}</Panel>
        <Panel title="Hold a machine for a class" description="Nobody can reserve the machine while the class holds it. Opening hours and closures apply.">
          {form}
        </Panel>
      </div>
    </>
  );
}
