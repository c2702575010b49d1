import type { MaintenanceTask } from '@chuckkey/core';
import { useState } from 'react';
import { EmptyState } from '../../../components/ui/empty-state';
import { FilterBar } from '../../../components/ui/filter-bar';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { SortableThs, TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { TextField } from '../../../components/ui/text-field';
import { TextLink } from '../../../components/ui/text-link';
import { paths } from '../../../config/paths';
import { nameCollator, nextSort, sortRows, type ColumnComparers, type ColumnSort, type SortColumn } from '../../../lib/table-sort';
import { useMaintenance } from '../api/get-maintenance';
import { byUrgency, dueSortKey, everyWords, nextDueWords } from '../utils/maintenance-words';
import { BlockingMark, MaintenanceStatusBadge } from './maintenance-status';

type Field = 'machine' | 'task' | 'nextDue' | 'status';

const columns: readonly SortColumn<Field>[] = [
  { field: 'machine', label: 'Machine' },
  { field: 'task', label: 'Task' },
];
const laterColumns: readonly SortColumn<Field>[] = [
  { field: 'nextDue', label: 'Next due' },
  { field: 'status', label: 'Status' },
];

const compareDue = (a: MaintenanceTask, b: MaintenanceTask) => {
  const [dateA, hoursA] = dueSortKey(a);
  const [dateB, hoursB] = dueSortKey(b);
  return dateA - dateB || hoursA - hoursB;
};

const comparers: ColumnComparers<MaintenanceTask, Field> = {
  machine: (a, b) => nameCollator.compare(a.machine.name, b.machine.name),
  task: (a, b) => nameCollator.compare(a.name, b.name),
  nextDue: compareDue,
  status: byUrgency,
};

const tieBreak = (a: MaintenanceTask, b: MaintenanceTask) => nameCollator.compare(a.machine.name, b.machine.name) || nameCollator.compare(a.name, b.name);

function matches(task: MaintenanceTask, search: string): boolean {
  const words = search.toLocaleLowerCase().split(/\s+/).filter(Boolean);
  const text = `${task.machine.name} ${task.name}`.toLocaleLowerCase();
  return words.every((word) => text.includes(word));
}

/** Every active task of every machine; overdue first until someone sorts another way. */
export function MaintenanceTable() {
  const maintenance = useMaintenance();
  const [search, setSearch] = useState('');
  const [sort, setSort] = useState<ColumnSort<Field>>({ field: 'status', order: 'asc' });

  if (maintenance.isPending) return <Spinner label="Loading the maintenance tasks…" />;
  if (maintenance.isError) return <QueryError error={maintenance.error} what="the maintenance tasks" onRetry={() => void maintenance.refetch()} retrying={maintenance.isFetching} />;
  if (maintenance.data.length === 0) {
    return (
      <EmptyState title="No maintenance tasks yet">
        An admin adds a machine&apos;s recurring tasks on its maintenance page: choose the machine above and open it.
      </EmptyState>
    );
  }

  const rows = sortRows(
    maintenance.data.filter((task) => matches(task, search)),
    sort,
    comparers,
    tieBreak,
  );
  const onSort = (field: Field) => setSort(nextSort(sort, field));

  return (
    <div className="flex flex-col gap-4">
      <FilterBar label="Find maintenance tasks">
        <TextField label="Search" hint="A machine or a task" type="search" value={search} onChange={(event) => setSearch(event.target.value)} />
      </FilterBar>
      {rows.length === 0 ? (
        <EmptyState title="Nothing matches">Try a shorter search.</EmptyState>
      ) : (
        <Table caption="Maintenance tasks">
          <THead>
            <Tr>
              <SortableThs columns={columns} sortedField={sort.field} order={sort.order} onSort={onSort} />
              <Th>Every</Th>
              <SortableThs columns={laterColumns} sortedField={sort.field} order={sort.order} onSort={onSort} />
              <Th>Blocking</Th>
            </Tr>
          </THead>
          <TBody>
            {rows.map((task) => (
              <Tr key={task.id}>
                <Td>
                  <TextLink to={paths.upkeepMachine.getHref(task.machine.id)}>{task.machine.name}</TextLink>
                </Td>
                <Td className="font-bold">{task.name}</Td>
                <Td>{everyWords(task)}</Td>
                <Td>{nextDueWords(task)}</Td>
                <Td>
                  <MaintenanceStatusBadge status={task.status} />
                </Td>
                <Td>
                  <BlockingMark blocking={task.blocking} />
                </Td>
              </Tr>
            ))}
          </TBody>
        </Table>
      )}
    </div>
  );
}
