import type { MachineDetail } from '@chuckkey/core';
import { useId } from 'react';
import { EmptyState } from '../../../components/ui/empty-state';
import { QueryError } from '../../../components/ui/query-error';
import { Spinner } from '../../../components/ui/spinner';
import { useMachines } from '../api/get-machines';
import { groupByArea, type AreaGroup } from '../utils/group-by-area';
import { Nameplate } from './nameplate';

function AreaSection({ group }: { group: AreaGroup<MachineDetail> }) {
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
            <Nameplate machine={machine} />
          </li>
        ))}
      </ul>
    </section>
  );
}

export function MachineFloor() {
  const machines = useMachines();

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

  return (
    <div className="flex flex-col gap-8">
      {groupByArea(machines.data).map((group) => (
        <AreaSection key={group.area} group={group} />
      ))}
    </div>
  );
}
