import type { Training } from '@chuckkey/core';
import { Link } from 'react-router-dom';
import { EmptyState } from '../../../components/ui/empty-state';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { paths } from '../../../config/paths';
import { useTrainings } from '../api/get-trainings';

export function validityWords(months: number): string {
  if (months === 0) return 'Never lapses';
  return months === 1 ? '1 month' : `${months} months`;
}

function plural(count: number, one: string, many: string): string {
  return `${count} ${count === 1 ? one : many}`;
}

function TrainingLink({ training }: { training: Training }) {
  return (
    <Link to={paths.setupTraining.getHref(training.id)} className="font-bold text-brand underline underline-offset-4">
      {training.name}
    </Link>
  );
}

export function TrainingsTable() {
  const trainings = useTrainings();

  if (trainings.isPending) return <Spinner label="Loading trainings…" />;
  if (trainings.isError) {
    return <QueryError error={trainings.error} what="the trainings" onRetry={() => void trainings.refetch()} retrying={trainings.isFetching} />;
  }
  if (trainings.data.length === 0) {
    return (
      <EmptyState title="No trainings yet">
        Create the first one, for example General shop safety, then say which machines need it under Machines.
      </EmptyState>
    );
  }

  return (
    <Table caption="Trainings">
      <THead>
        <Tr>
          <Th>Name</Th>
          <Th>Valid for</Th>
          <Th>Checklist</Th>
          <Th>Needed for</Th>
          <Th>Status</Th>
        </Tr>
      </THead>
      <TBody>
        {trainings.data.map((training) => (
          <Tr key={training.id}>
            <Td>
              <TrainingLink training={training} />
            </Td>
            <Td className="whitespace-nowrap">{validityWords(training.validityMonths)}</Td>
            <Td className="whitespace-nowrap">{plural(training.checklist.length, 'item', 'items')}</Td>
            <Td className="whitespace-nowrap">{plural(training.machineIds.length, 'machine', 'machines')}</Td>
            <Td>{training.active ? 'Active' : 'Inactive'}</Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
