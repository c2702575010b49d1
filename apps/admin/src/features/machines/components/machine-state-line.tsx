import { boardStateIcons, lineIconSvg, type BoardMachine, type BoardState } from '@chuckkey/core';
import { machineStateDetail, machineStateLabels } from '../utils/machine-state';

// Colour never carries the state alone: the word says it and the icon tells the states apart.
const looks: Record<BoardState, string> = {
  available: 'bg-state-available text-white',
  in_use: 'bg-state-in-use text-white',
  reserved: 'bg-state-reserved text-white',
  tagged_out: 'stripes-tagged-out text-white',
  offline: 'border-y-2 border-dashed border-state-offline bg-white text-neutral-900',
};


/** A machine's live state under its nameplate's band: word, icon and colour, and one line of detail. */
export function MachineStateLine({ machine, time }: { machine: BoardMachine; time: (iso: string) => string }) {
  const detail = machineStateDetail(machine, time);
  return (
    <p className={`flex flex-col gap-0.5 px-3 py-2 ${looks[machine.state]}`}>
      <span className="flex items-center gap-2">
        <svg {...lineIconSvg} className="size-6 shrink-0">
          <path d={boardStateIcons[machine.state]} />
        </svg>
        <span className="text-lg font-bold">{machineStateLabels[machine.state]}</span>
      </span>
      {detail && <span className="break-words">{detail}</span>}
    </p>
  );
}
