import type { BoardMachine, LinkStatus, MachineDetail } from '@chuckkey/core';
import { useId, type ReactNode } from 'react';
import { EmptyState } from '../../../components/ui/empty-state';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { formatTimeOrDateTime } from '../../../lib/format';
import { useMachineStates } from '../api/get-machine-states';
import { useMachines } from '../api/get-machines';
import { useLiveMachines } from '../hooks/use-live-machines';
import { groupByArea, type AreaGroup } from '../utils/group-by-area';
import { statesById, supervisorLine } from '../utils/machine-state';
import { Nameplate } from './nameplate';

/** What a person can do about one machine, shown on its plate (the floor itself stays about machines). */
export type MachineAction = (machine: MachineDetail, live: BoardMachine | undefined) => ReactNode;

interface AreaSectionProps {
  group: AreaGroup<MachineDetail>;
  states: Map<string, BoardMachine>;
  time: (iso: string) => string;
  action: MachineAction | undefined;
}

function AreaSection({ group, states, time, action }: AreaSectionProps) {
  const headingId = useId();
  const count = group.machines.length;
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-3">
      <h2 id={headingId} className="flex items-baseline gap-2 text-xl font-bold text-neutral-900">
        {group.area}
        <span className="text-base font-normal text-neutral-700">
          {count} {count === 1 ? 'machine' : 'machines'}
        </span>
      </h2>
      <ul className="grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-3 xl:grid-cols-4">
        {group.machines.map((machine) => (
          <li key={machine.id} className="grid">
            <Nameplate machine={machine} live={states.get(machine.id)} time={time} action={action?.(machine, states.get(machine.id))} />
          </li>
        ))}
      </ul>
    </section>
  );
}

const linkWords: Record<LinkStatus, string> = {
  connecting: 'Connecting to live updates…',
  connected: 'Live: states change here as they change on the floor.',
  reconnecting: 'Reconnecting… the states shown may be out of date.',
};

/** Whether the states follow the floor as it changes; the words change only when that does. */
function LinkLine({ status, supervisor }: { status: LinkStatus; supervisor: string | null }) {
  return (
    <div className="flex flex-wrap items-center gap-x-6 gap-y-1 text-neutral-700">
      <p role="status" className="flex items-center gap-2">
        <span
          aria-hidden="true"
          className={`inline-block size-2.5 rounded-full ${status === 'connected' ? 'bg-state-available' : 'bg-state-offline'}`}
        />
        {linkWords[status]}
      </p>
      {supervisor !== null && <p className="font-bold text-neutral-900">{supervisor}</p>}
    </div>
  );
}

export function MachineFloor({ action }: { action?: MachineAction } = {}) {
  const machines = useMachines();
  const board = useMachineStates();
  const link = useLiveMachines();

  if (machines.isPending) return <Spinner label="Loading the machines…" />;
  if (machines.isError) {
    return (
      <QueryError error={machines.error} what="the machines" onRetry={() => void machines.refetch()} retrying={machines.isFetching} />
    );
  }
  if (machines.data.length === 0) {
    return (
      <EmptyState title="No machines yet">
        Machines appear here, grouped by the shop&apos;s areas, as soon as an admin adds them to the shop.
      </EmptyState>
    );
  }

  const states = statesById(board.data?.areas ?? []);
  const timeZone = board.data?.shop.timeZone;
  const time = (iso: string) => formatTimeOrDateTime(iso, timeZone);
  const supervisor = board.data ? supervisorLine(board.data.supervisorOnDuty) : null;

  return (
    <div className="flex flex-col gap-8">
      <LinkLine status={link} supervisor={supervisor} />
      {board.isError && (
        <QueryError error={board.error} what="the machines’ states" onRetry={() => void board.refetch()} retrying={board.isFetching} />
      )}
      {groupByArea(machines.data).map((group) => (
        <AreaSection key={group.area} group={group} states={states} time={time} action={action} />
      ))}
    </div>
  );
}
