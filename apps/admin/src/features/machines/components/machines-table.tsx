import { machineCategoryLabels, type MachineDetail } from '@chuckkey/core';
import { Link } from 'react-router-dom';
import { EmptyState } from '../../../components/ui/empty-state';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { paths } from '../../../config/paths';
import { useMachines } from '../api/get-machines';
import { groupByArea } from '../utils/group-by-area';

function sorted(machines: MachineDetail[]): MachineDetail[] {
  return groupByArea(machines).flatMap((group) => group.machines);
}

export function MachinesTable() {
  const machines = useMachines();

  if (machines.isPending) return <Spinner label="Loading the machines…" />;
  if (machines.isError) {
    return <QueryError error={machines.error} what="the machines" onRetry={() => void machines.refetch()} retrying={machines.isFetching} />;
  }
  if (machines.data.length === 0) {
    return <EmptyState title="No machines yet">Add the first one: its name, area, the trainings it needs and its safety checklist.</EmptyState>;
  }

  return (
    <Table caption="Machines">
      <THead>
        <Tr>
          <Th>Name</Th>
          <Th>Category</Th>
          <Th>Area</Th>
          <Th>Trainings needed</Th>
          <Th>Booking</Th>
          <Th>PIN</Th>
        </Tr>
      </THead>
      <TBody>
        {sorted(machines.data).map((machine) => (
          <Tr key={machine.id}>
            <Td>
              <Link to={paths.setupMachine.getHref(machine.id)} className="font-bold text-brand underline underline-offset-4">
                {machine.name}
              </Link>
            </Td>
            <Td>{machineCategoryLabels[machine.category]}</Td>
            <Td>{machine.area}</Td>
            <Td>{machine.trainings.length > 0 ? machine.trainings.map((training) => training.name).join(', ') : 'None'}</Td>
            <Td className="whitespace-nowrap">{machine.reservable ? 'Can be reserved' : 'Walk up only'}</Td>
            <Td>{machine.requiresPin ? 'Required' : 'No'}</Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
