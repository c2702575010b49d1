import { paths } from '../../config/paths';
import { TrainingsTable } from '../../features/trainings/components/trainings-table';
import { SetupListPage } from '../components/setup-list-page';

export default function SetupTrainingsRoute() {
  return (
    <SetupListPage
      permission="manage:training:any"
      title="Trainings"
      description="The courses instructors sign members off on: the practical checklist they tick, and how long a sign-off counts."
      addHref={paths.setupTrainingNew.getHref()}
      addLabel="Add a training"
    >
      <TrainingsTable />
    </SetupListPage>
  );
}
