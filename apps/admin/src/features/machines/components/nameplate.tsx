import { machineCategoryLabels, type BoardMachine, type MachineDetail } from '@chuckkey/core';
import { useId, type ReactNode } from 'react';
import { formatHours } from '../../../lib/format';
import { MachineStateLine } from './machine-state-line';

function Rivet() {
  return <span aria-hidden="true" className="size-2 shrink-0 rounded-full bg-neutral-500 ring-1 ring-neutral-900" />;
}

interface NameplateProps {
  machine: MachineDetail;
  /** The machine's live state, once known. */
  live?: BoardMachine | undefined;
  /** Writes an instant on the shop's clock. */
  time: (iso: string) => string;
  /** What a person can do about the machine, at the foot of the plate. */
  action?: ReactNode;
}

/** The machine as its riveted maker's plate: name stamped in capitals on a band, its state and the facts below. */
export function Nameplate({ machine, live, time, action }: NameplateProps) {
  const nameId = useId();
  return (
    <article aria-labelledby={nameId} className="flex flex-col overflow-hidden rounded-md border-2 border-neutral-800 bg-white">
      <div className="flex items-center gap-2 bg-neutral-800 px-2.5 py-1.5">
        <Rivet />
        <h3 id={nameId} className="min-w-0 flex-1 text-sm font-bold tracking-[0.12em] break-words text-white uppercase">
          {machine.name}
        </h3>
        <Rivet />
      </div>
      {live && <MachineStateLine machine={live} time={time} />}
      <dl className="flex flex-1 flex-col gap-2 px-3 py-3">
        <div>
          <dt className="sr-only">Category</dt>
          <dd className="text-lg font-bold text-neutral-900">{machineCategoryLabels[machine.category]}</dd>
        </div>
        <div className="flex flex-col gap-0.5 border-t border-neutral-200 pt-2">
          <dt className="text-neutral-700">Trainings needed</dt>
          <dd className="text-neutral-900">
            {machine.trainings.length > 0 ? (
              <ul className="flex flex-col">
                {machine.trainings.map((training) => (
                  <li key={training.id} className="font-bold">
                    {training.name}
                  </li>
                ))}
              </ul>
            ) : (
              'None'
            )}
          </dd>
        </div>
        <div className="flex items-baseline justify-between gap-3 border-t border-neutral-200 pt-2">
          <dt className="text-neutral-700">Meter</dt>
          <dd className="font-bold text-neutral-900 tabular-nums">{formatHours(machine.meterHours)}</dd>
        </div>
        <div className="flex items-baseline justify-between gap-3">
          <dt className="text-neutral-700">Booking</dt>
          <dd className="text-neutral-900">{machine.reservable ? 'Can be reserved' : 'Walk up only'}</dd>
        </div>
        {machine.requiresPin && (
          <div className="flex items-baseline justify-between gap-3">
            <dt className="text-neutral-700">At the station</dt>
            <dd className="text-neutral-900">Badge and PIN</dd>
          </div>
        )}
      </dl>
      {action && <div className="border-t border-neutral-200 px-3 py-2">{action}</div>}
    </article>
  );
}
