import { can } from '@chuckkey/core';
import { Link } from 'react-router-dom';
import { ButtonLink } from '../../components/ui/button';
import { EmptyState } from '../../components/ui/empty-state';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { QueryError } from '../../components/ui/query-error';
import { Spinner } from '../../components/ui/spinner';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { useShop } from '../../features/shop/api/get-shop';
import { CandidateSearch } from '../../features/sign-offs/components/candidate-search';
import { SignOffForm } from '../../features/sign-offs/components/sign-off-form';
import { useTrainings } from '../../features/trainings/api/get-trainings';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

export default function TeachRoute() {
  const user = useSignedInUser();
  const shop = useShop();
  const trainings = useTrainings();
  if (!can(user.role, 'create:sign-off:any')) return <NoAccess area="Teach" who="the shop's instructors and admins" />;

  const active = trainings.data?.filter((training) => training.active) ?? [];
  let form;
  if (trainings.isPending || shop.isPending) form = <Spinner label="Loading the trainings…" />;
  else if (trainings.isError)
    form = <QueryError error={trainings.error} what="the trainings" onRetry={() => void trainings.refetch()} retrying={trainings.isFetching} />;
  else if (shop.isError) form = <QueryError error={shop.error} what="the shop's details" onRetry={() => void shop.refetch()} retrying={shop.isFetching} />;
  else if (active.length === 0)
    form = (
      <EmptyState title="No trainings to sign off yet">
        {can(user.role, 'manage:training:any') ? (
          <>
            Create one under <TextLink to={paths.setupTrainings.getHref()}>Setup, Trainings</TextLink>: its practical checklist is what you tick here.
          </>
        ) : (
          'An admin creates trainings and their practical checklists; ask one to add the training you teach.'
        )}
      </EmptyState>
    );
  else form = <SignOffForm trainings={active} timeZone={shop.data.timeZone} currentUserId={user.id} />;

  return (
    <>
      <PageHeading
        title="Teach"
        description="Sign members off after their practical check, and look up what they hold."
        actions={<ButtonLink to={paths.teachClasses.getHref()}>Classes</ButtonLink>}
      />
      <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Panel title="Sign off a member" description="Find the member, choose the training, tick what you saw, choose the level.">
          {form}
        </Panel>
        <Panel title="Members' records" description="Their sign-offs, with the dates they lapse; revoke one there if you must.">
          <CandidateSearch
            label="Find a member's record"
            renderResult={(member) => (
              <Link
                to={paths.memberRecord.getHref(member.id)}
                state={{ name: member.name }}
                className="flex min-h-11 flex-col px-4 py-3 hover:bg-brand-soft"
              >
                <span className="font-bold text-brand underline underline-offset-4">{member.name}</span>
                <span className="break-all text-neutral-800">
                  {member.email}
                  {!member.active && ' · inactive'}
                </span>
              </Link>
            )}
          />
        </Panel>
      </div>
    </>
  );
}
