import type { ReactNode } from 'react';
import { cn } from '../../../components/ui/cn';
import { BanIcon, CheckIcon, ClockIcon, WarningIcon } from '../../../components/ui/icons';
import { stationStateLabels, type StationState } from '../utils/station-status';

const looks: Record<StationState, { className: string; icon: ReactNode }> = {
  paired: { className: 'border-success bg-success-soft text-success', icon: <CheckIcon className="size-4 shrink-0" /> },
  waiting: { className: 'border-brand bg-brand-soft text-brand', icon: <ClockIcon className="size-4 shrink-0" /> },
  'code-expired': { className: 'border-warning bg-warning-soft text-warning', icon: <WarningIcon className="size-4 shrink-0" /> },
  revoked: { className: 'border-neutral-600 bg-neutral-200 text-neutral-800', icon: <BanIcon className="size-4 shrink-0" /> },
};

/** The state in a word and an icon as well as a colour, so it reads without colour vision too. */
export function StationStateBadge({ state }: { state: StationState }) {
  const look = looks[state];
  return (
    <span className={cn('inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-sm font-bold whitespace-nowrap', look.className)}>
      {look.icon}
      {stationStateLabels[state]}
    </span>
  );
}
