import { can, type Training } from '@chuckkey/core';
import { useQueryClient } from '@tanstack/react-query';
import { useNavigate, useParams } from 'react-router-dom';
import { EmptyState } from '../../components/ui/empty-state';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { QueryError } from '../../components/ui/query-error';
import { Spinner } from '../../components/ui/spinner';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { machineKeys } from '../../features/machines/api/machine-keys';
import { useTrainings } from '../../features/trainings/api/get-trainings';
import { TrainingForm } from '../../features/trainings/components/training-form';
import { NoAccess } from '../components/no-access';
import type { SavedState } from '../components/saved-notice';
import { SetupNav } from '../components/setup-nav';
import { useSignedInUser } from '../signed-in-user';

function TrainingEditor({ training }: { training?: Training }) {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  return (
    <TrainingForm
      training={training}
      onCancel={() => navigate(paths.setupTrainings.getHref())}
      onSaved={async (saved) => {
        // Nameplates on the shop floor name the trainings each machine asks for.
        await queryClient.invalidateQueries({ queryKey: machineKeys.all });
        const state: SavedState = { saved: `${saved.name} is saved.` };
        navigate(paths.setupTrainings.getHref(), { state });
      }}
    />
  );
}

function ExistingTraining({ trainingId }: { trainingId: string }) {
  const trainings = useTrainings();
  if (trainings.isPending) return <Spinner label="Loading the training…" />;
  if (trainings.isError) {
    return <QueryError error={trainings.error} what="the training" onRetry={() => void trainings.refetch()} retrying={trainings.isFetching} />;
  }
  const training = trainings.data.find((candidate) => candidate.id === trainingId);
  if (!training) {
    return (
      <EmptyState title="There is no such training">
        It may have been removed. <TextLink to={paths.setupTrainings.getHref()}>Go back to the trainings</TextLink>.
      </EmptyState>
    );
  }
  return <TrainingEditor key={training.id} training={training} />;
}

export default function SetupTrainingEditRoute() {
  const user = useSignedInUser();
  const { trainingId } = useParams();
  if (!can(user.role, 'manage:training:any')) return <NoAccess area="Setup" />;
  const isNew = !trainingId;

  return (
    <>
      <SetupNav user={user} />
      <p>
        <TextLink to={paths.setupTrainings.getHref()}>Back to the trainings</TextLink>
      </p>
      <PageHeading title={isNew ? 'Add a training' : 'Edit training'} />
      <Panel title={isNew ? 'New training' : 'Training details'}>
        {isNew ? <TrainingEditor /> : <ExistingTraining trainingId={trainingId} />}
      </Panel>
    </>
  );
}
