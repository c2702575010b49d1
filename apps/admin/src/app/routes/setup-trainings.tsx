import { can } from '@chuckkey/core';
import { ButtonLink } from '../../components/ui/button';
import { PlusIcon } from '../../components/ui/icons';
import { PageHeading } from '../../components/ui/page-heading';
import { paths } from '../../config/paths';
import { TrainingsTable } from '../../features/trainings/components/trainings-table';
import { NoAccess } from '../components/no-access';
import { SavedNotice } from '../components/saved-notice';
import { SetupNav } from '../components/setup-nav';
import { useSignedInUser } from '../signed-in-user';

export default function SetupTrainingsRoute() {
  const user = useSignedInUser();
  if (!can(user.role, 'manage:training:any')) return <NoAccess area="Setup" />;
  return (
    <>
      <SetupNav user={user} />
      <PageHeading
        title="Trainings"
        description="The courses instructors sign members off on: the practical checklist they tick, and how long a sign-off counts."
        actions={
          <ButtonLink to={paths.setupTrainingNew.getHref()} variant="primary">
            <PlusIcon />
            Add a training
          </ButtonLink>
        }
      />
      <SavedNotice />
      <TrainingsTable />
    </>
  );
}
