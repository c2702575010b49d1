import type { BoardMachine, BoardState } from '@chuckkey/core';
import type { ReactNode } from 'react';
import { machineStateDetail, machineStateLabels } from '../utils/machine-state';

// Colour never carries the state alone: the word says it and the icon tells the states apart.
const looks: Record<BoardState, string> = {
  available: 'bg-state-available text-white',
  in_use: 'bg-state-in-use text-white',
  reserved: 'bg-state-reserved text-white',
  tagged_out: 'stripes-tagged-out text-white',
  offline: 'border-y-2 border-dashed border-state-offline bg-white text-neutral-900',
};

const shapes: Record<BoardState, ReactNode> = {
  available: (
    <>
      <circle cx="12" cy="12" r="9" />
      <path d="M7.5 12.5l3 3 6-6.5" />
    </>
  ),
  // A three-jaw chuck seen from the tailstock: the spindle is turning.
  in_use: (
    <>
      <circle cx="12" cy="12" r="9" />
      <circle cx="12" cy="12" r="2.5" />
      <path d="M12 3v5.5M19.8 16.5l-4.8-2.8M4.2 16.5l4.8-2.8" />
    </>
  ),
  reserved: <path d="M6 3h12M6 21h12M8 3c0 5 8 5 8 9s-8 4-8 9M16 3c0 5-8 5-8 9s8 4 8 9" />,
  tagged_out: (
    <>
      <rect x="5" y="11" width="14" height="10" rx="1.5" />
      <path d="M8 11V8a4 4 0 0 1 8 0v3M12 15v2.5" />
    </>
  ),
  offline: <path d="M9 2.5v4M15 2.5v4M7 6.5h10v4a5 5 0 0 1-10 0zM12 15.5V21M3 3l18 18" />,
};

/** A machine's live state under its nameplate's band: word, icon and colour, and one line of detail. */
export function MachineStateLine({ machine, time }: { machine: BoardMachine; time: (iso: string) => string }) {
  const detail = machineStateDetail(machine, time);
  return (
    <p className={`flex flex-col gap-0.5 px-3 py-2 ${looks[machine.state]}`}>
      <span className="flex items-center gap-2">
        <svg
          viewBox="0 0 24 24"
          fill="none"
          stroke="currentColor"
          strokeWidth={2.25}
          strokeLinecap="round"
          strokeLinejoin="round"
          aria-hidden="true"
          focusable="false"
          className="size-6 shrink-0"
        >
          {shapes[machine.state]}
        </svg>
        <span className="text-lg font-bold">{machineStateLabels[machine.state]}</span>
      </span>
      {detail && <span className="break-words">{detail}</span>}
    </p>
  );
}
