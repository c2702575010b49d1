import { can, type MachineDetail } from '@chuckkey/core';
import { useQueryClient } from '@tanstack/react-query';
import { useNavigate, useParams } from 'react-router-dom';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { QueryError } from '../../components/ui/query-error';
import { Spinner } from '../../components/ui/spinner';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { useMachine } from '../../features/machines/api/get-machine';
import { BookingRulesPanelBody } from '../../features/machines/components/booking-rules-form';
import { MachineForm } from '../../features/machines/components/machine-form';
import { useAreas } from '../../features/shop/api/get-areas';
import { trainingKeys } from '../../features/trainings/api/training-keys';
import { useTrainings } from '../../features/trainings/api/get-trainings';
import { NoAccess } from '../components/no-access';
import type { SavedState } from '../components/saved-notice';
import { SetupNav } from '../components/setup-nav';
import { useSignedInUser } from '../signed-in-user';

function MachineEditor({ machine }: { machine?: MachineDetail }) {
  const areas = useAreas();
  const trainings = useTrainings();
  const queryClient = useQueryClient();
  const navigate = useNavigate();

  if (areas.isPending || trainings.isPending) return <Spinner label="Loading the shop's areas and trainings…" />;
  if (areas.isError) return <QueryError error={areas.error} what="the areas" onRetry={() => void areas.refetch()} retrying={areas.isFetching} />;
  if (trainings.isError) {
    return <QueryError error={trainings.error} what="the trainings" onRetry={() => void trainings.refetch()} retrying={trainings.isFetching} />;
  }

  const back = () => navigate(paths.setupMachines.getHref());
  return (
    <MachineForm
      machine={machine}
      areas={areas.data}
      trainings={trainings.data}
      onCancel={back}
      onSaved={async (saved) => {
        // Which machines need a training shows on the trainings list too.
        await queryClient.invalidateQueries({ queryKey: trainingKeys.all });
        const state: SavedState = { saved: `${saved.name} is saved.` };
        navigate(paths.setupMachines.getHref(), { state });
      }}
    />
  );
}

function ExistingMachine({ machineId }: { machineId: string }) {
  const machine = useMachine(machineId);
  if (machine.isPending) return <Spinner label="Loading the machine…" />;
  if (machine.isError) {
    return <QueryError error={machine.error} what="the machine" onRetry={() => void machine.refetch()} retrying={machine.isFetching} />;
  }
  return (
    <>
      <Panel title="Machine details">
        <MachineEditor key={machine.data.id} machine={machine.data} />
      </Panel>
      <Panel title="Booking rules" description="How members reserve this machine ahead, and what a missed reservation costs them." className="mt-6">
        <BookingRulesPanelBody machineId={machine.data.id} machineName={machine.data.name} />
      </Panel>
    </>
  );
}

export default function SetupMachineEditRoute() {
  const user = useSignedInUser();
  const { machineId } = useParams();
  if (!can(user.role, 'manage:machine:any')) return <NoAccess area="Setup" />;
  const isNew = !machineId;

  return (
    <>
      <SetupNav user={user} />
      <p>
        <TextLink to={paths.setupMachines.getHref()}>Back to the machines</TextLink>
      </p>
      <PageHeading title={isNew ? 'Add a machine' : 'Edit machine'} />
      {isNew ? (
        <Panel title="New machine">
          <MachineEditor />
        </Panel>
      ) : (
        <ExistingMachine machineId={machineId} />
      )}
    </>
  );
}
