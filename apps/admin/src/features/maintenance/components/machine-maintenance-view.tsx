import { can, type MaintenanceTask, type Role } from '@chuckkey/core';
import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { PlusIcon } from '../../../components/ui/icons';
import { PageHeading } from '../../../components/ui/page-heading';
import { Panel } from '../../../components/ui/panel';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { ActionsTh, TBody, THead, Table, Td, Th, Tr } from '../../../components/ui/table';
import { formatDateTime } from '../../../lib/format';
import { useMachineMaintenance } from '../api/get-machine-maintenance';
import { everyWords, hoursText, nextDueWords } from '../utils/maintenance-words';
import { MaintenanceCompleteDialog } from './maintenance-complete-dialog';
import { BlockingMark, MaintenanceStatusBadge } from './maintenance-status';
import { MaintenanceTaskDialog } from './maintenance-task-dialog';

interface MachineMaintenanceViewProps {
  machineId: string;
  role: Role;
  timeZone: string | undefined;
}

/** One machine's tasks, with marking them done (instructors and admins) and setting them up (admins), then its history. */
export function MachineMaintenanceView({ machineId, role, timeZone }: MachineMaintenanceViewProps) {
  const view = useMachineMaintenance(machineId);
  const [editing, setEditing] = useState<{ task: MaintenanceTask | null } | null>(null);
  const [completing, setCompleting] = useState<MaintenanceTask | null>(null);
  const [said, setSaid] = useState<string | null>(null);
  const canManage = can(role, 'manage:maintenance:any');
  const canComplete = can(role, 'complete:maintenance:any');

  if (view.isPending) return <Spinner label="Loading the machine's maintenance…" />;
  if (view.isError) return <QueryError error={view.error} what="the machine's maintenance" onRetry={() => void view.refetch()} retrying={view.isFetching} />;
  const { machine, tasks, history } = view.data;

  return (
    <>
      <PageHeading
        title={`Maintenance · ${machine.name}`}
        description={`The machine's recurring tasks and the work done on it. Its meter reads ${hoursText(machine.meterHours)}.`}
        actions={
          canManage && (
            <Button onClick={() => setEditing({ task: null })}>
              <PlusIcon />
              Add task
            </Button>
          )
        }
      />
      <Alert tone="warning">Lock out the machine before maintenance work; follow the shop&apos;s procedures.</Alert>
      {said && (
        <Alert tone="success" className="mt-4">
          {said}
        </Alert>
      )}
      <div className="mt-6 flex flex-col gap-6">
        <Panel title="Tasks">
          {tasks.length === 0 ? (
            <EmptyState title="No tasks for this machine">{canManage ? 'Add the machine’s recurring tasks with “Add task”.' : 'An admin sets up the machine’s recurring tasks.'}</EmptyState>
          ) : (
            <Table caption={`Maintenance tasks of ${machine.name}`}>
              <THead>
                <Tr>
                  <Th>Task</Th>
                  <Th>Every</Th>
                  <Th>Next due</Th>
                  <Th>Status</Th>
                  <Th>Blocking</Th>
                  <Th>Last done</Th>
                  <ActionsTh />
                </Tr>
              </THead>
              <TBody>
                {tasks.map((task) => (
                  <Tr key={task.id}>
                    <Td>
                      <span className="flex flex-col">
                        <span className="font-bold">{task.name}</span>
                        {task.instructions && <span className="max-w-prose text-sm text-neutral-700">{task.instructions}</span>}
                      </span>
                    </Td>
                    <Td>{everyWords(task)}</Td>
                    <Td>{task.active ? nextDueWords(task) : '—'}</Td>
                    <Td>{task.active ? <MaintenanceStatusBadge status={task.status} /> : <span className="text-neutral-700">Inactive</span>}</Td>
                    <Td>
                      <BlockingMark blocking={task.blocking} />
                    </Td>
                    <Td className="whitespace-nowrap">{task.lastDone ? `${formatDateTime(task.lastDone.doneAt, timeZone)} at ${hoursText(task.lastDone.meterHours)}` : 'Not yet'}</Td>
                    <Td>
                      <span className="flex flex-wrap gap-2">
                        {canComplete && task.active && (
                          <Button variant="secondary" onClick={() => setCompleting(task)} aria-label={`Mark done: ${task.name}`}>
                            Mark done
                          </Button>
                        )}
                        {canManage && (
                          <Button variant="quiet" onClick={() => setEditing({ task })} aria-label={`Edit ${task.name}`}>
                            Edit
                          </Button>
                        )}
                      </span>
                    </Td>
                  </Tr>
                ))}
              </TBody>
            </Table>
          )}
        </Panel>
        <Panel title="History">
          {history.length === 0 ? (
            <EmptyState title="Nothing recorded yet">Each time someone marks a task done, it is kept here with the meter reading and their note.</EmptyState>
          ) : (
            <Table caption={`Maintenance history of ${machine.name}`}>
              <THead>
                <Tr>
                  <Th>Done</Th>
                  <Th>Task</Th>
                  <Th>Meter</Th>
                  <Th>By</Th>
                  <Th>Note</Th>
                </Tr>
              </THead>
              <TBody>
                {history.map((entry) => (
                  <Tr key={entry.id}>
                    <Td className="whitespace-nowrap">{formatDateTime(entry.doneAt, timeZone)}</Td>
                    <Td>{entry.taskName}</Td>
                    <Td className="whitespace-nowrap">{hoursText(entry.meterHours)}</Td>
                    <Td>{entry.doneBy?.name ?? 'A former member'}</Td>
                    <Td className="max-w-prose">{entry.note || <span className="text-neutral-700">No note</span>}</Td>
                  </Tr>
                ))}
              </TBody>
            </Table>
          )}
        </Panel>
      </div>
      <MaintenanceTaskDialog
        editing={editing}
        machineId={machine.id}
        machineName={machine.name}
        onClose={() => setEditing(null)}
        onSaved={(task) => {
          setEditing(null);
          setSaid(`Saved ${task.name}.`);
        }}
      />
      <MaintenanceCompleteDialog
        task={completing}
        onClose={() => setCompleting(null)}
        onDone={(task) => {
          setCompleting(null);
          setSaid(`Marked done: ${task.name}.`);
        }}
      />
    </>
  );
}
