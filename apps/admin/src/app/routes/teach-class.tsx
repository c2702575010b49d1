import { can, type TeachMember } from '@chuckkey/core';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate, useParams } from 'react-router-dom';
import { Alert } from '../../components/ui/alert';
import { Button } from '../../components/ui/button';
import { ConfirmDialog } from '../../components/ui/confirm-dialog';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { QueryError } from '../../components/ui/query-error';
import { Spinner } from '../../components/ui/spinner';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { errorMessage } from '../../lib/api-client';
import { useCancelClass } from '../../features/classes/api/cancel-class';
import { useCancelClassOccurrence } from '../../features/classes/api/cancel-class-occurrence';
import { useClass } from '../../features/classes/api/get-class';
import { useSetClassMembers } from '../../features/classes/api/set-class-members';
import { ClassMembers } from '../../features/classes/components/class-members';
import { ClassOccurrences } from '../../features/classes/components/class-occurrences';
import { bookedLabel, upcomingOccurrences } from '../../features/classes/utils/class-plan';
import { reservationKeys } from '../../features/reservations/api/reservation-keys';
import { useShop } from '../../features/shop/api/get-shop';
import { CandidateSearch } from '../../features/sign-offs/components/candidate-search';
import { NoAccess } from '../components/no-access';
import { useSignedInUser } from '../signed-in-user';

export default function TeachClassRoute() {
  const { classId = '' } = useParams();
  const user = useSignedInUser();
  const navigate = useNavigate();
  const shop = useShop();
  const cls = useClass(classId);
  const setMembers = useSetClassMembers(classId);
  const cancelOccurrence = useCancelClassOccurrence(classId);
  const cancelClass = useCancelClass(classId);
  const [confirming, setConfirming] = useState(false);
  const queryClient = useQueryClient();
  // Meetings are taken time in the machine's week and appear in booked members' lists.
  const refreshReservations = () => queryClient.invalidateQueries({ queryKey: reservationKeys.all });
  const [added, setAdded] = useState<string | null>(null);
  if (!can(user.role, 'manage:class:any')) return <NoAccess area="Classes" who="the shop's instructors and admins" />;

  const back = (
    <p>
      <TextLink to={paths.teachClasses.getHref()}>Back to Classes</TextLink>
    </p>
  );
  const timeZone = shop.data?.timeZone;
  if (cls.isError)
    return (
      <>
        {back}
        <QueryError error={cls.error} what="the class" onRetry={() => void cls.refetch()} retrying={cls.isFetching} />
      </>
    );
  if (!cls.data || !timeZone) return <Spinner label="Loading the class…" />;

  const current = cls.data;
  const now = new Date();
  const members = current.members ?? [];
  const memberIds = members.map((member) => member.id);
  const mayCancel = current.instructor.id === user.id || can(user.role, 'cancel:class:any');
  const stillToCome = upcomingOccurrences(current, now).length;
  const full = current.capacity !== null && members.length >= current.capacity;

  const addMember = (member: TeachMember) => {
    setAdded(null);
    setMembers.mutate([...memberIds, member.id], {
      onSuccess: () => {
        setAdded(`${member.name} is booked into the class.`);
        void refreshReservations();
      },
    });
  };

  return (
    <>
      {back}
      <PageHeading
        title={current.title}
        description={
          <>
            {current.machineName}
            {current.trainingName && ` · ${current.trainingName}`} · held by {current.instructor.firstName} · {bookedLabel(current.memberCount, current.capacity)}
            {current.cancelledAt && ' · cancelled'}
          </>
        }
      />
      <div className="grid grid-cols-1 items-start gap-6 lg:grid-cols-2">
        <Panel title="Meetings" description={`Times are the shop's (${timeZone}).`}>
          <ClassOccurrences
            occurrences={current.occurrences}
            timeZone={timeZone}
            now={now}
            canCancel={mayCancel && !current.cancelledAt}
            onCancel={async (reservationId) => {
              await cancelOccurrence.mutateAsync(reservationId);
              await refreshReservations();
            }}
          />
          {mayCancel && !current.cancelledAt && stillToCome > 0 && (
            <div className="mt-4 border-t border-neutral-200 pt-4">
              <Button variant="danger" onClick={() => setConfirming(true)}>
                Cancel the whole class
              </Button>
            </div>
          )}
        </Panel>
        <Panel title="Members" description="Members booked in see every meeting in their reservations and calendar feed.">
          <div className="flex flex-col gap-4">
            {added && <Alert tone="success">{added}</Alert>}
            <ClassMembers
              members={members}
              pending={setMembers.isPending}
              error={setMembers.error}
              onRemove={(memberId) => {
                setAdded(null);
                setMembers.mutate(memberIds.filter((id) => id !== memberId), { onSuccess: () => void refreshReservations() });
              }}
            />
            {!current.cancelledAt &&
              (full ? (
                <p className="text-neutral-800">The class is full. Remove someone, or hold a class with more places, to book another member.</p>
              ) : (
                <CandidateSearch
                  label="Find a member to book"
                  renderResult={(member) => {
                    const booked = memberIds.includes(member.id);
                    return (
                      <div className="flex flex-wrap items-center justify-between gap-2 px-4 py-2">
                        <span className="flex flex-col">
                          <span className="font-bold text-neutral-900">{member.name}</span>
                          <span className="break-all text-sm text-neutral-700">
                            {member.email}
                            {!member.active && ' · inactive'}
                          </span>
                        </span>
                        <Button
                          variant="secondary"
                          aria-label={booked ? `${member.name} is booked` : `Book ${member.name} into the class`}
                          disabled={booked || !member.active || setMembers.isPending}
                          onClick={() => addMember(member)}
                        >
                          {booked ? 'Booked' : 'Book'}
                        </Button>
                      </div>
                    );
                  }}
                />
              ))}
          </div>
        </Panel>
      </div>
      <ConfirmDialog
        open={confirming}
        title="Cancel the whole class?"
        confirmLabel="Cancel the class"
        confirmVariant="danger"
        pending={cancelClass.isPending}
        error={cancelClass.error ? errorMessage(cancelClass.error) : null}
        onConfirm={() =>
          cancelClass.mutate(undefined, {
            onSuccess: () => {
              setConfirming(false);
              void refreshReservations();
              void navigate(paths.teachClasses.getHref());
            },
          })
        }
        onCancel={() => {
          setConfirming(false);
          cancelClass.reset();
        }}
      >
        {`Every meeting still to come (${stillToCome}) is cancelled and the ${current.machineName} is free again then. Booked members see the class as cancelled.`}
      </ConfirmDialog>
    </>
  );
}
