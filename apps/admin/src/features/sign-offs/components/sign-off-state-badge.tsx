import { signOffStateLabels, type SignOffState } from '@chuckkey/core';
import type { ReactNode } from 'react';
import { cn } from '../../../components/ui/cn';
import { BanIcon, CheckIcon, ClockIcon, CrossCircleIcon } from '../../../components/ui/icons';

const looks: Record<SignOffState, { className: string; icon: ReactNode }> = {
  valid: { className: 'border-success bg-success-soft text-success', icon: <CheckIcon className="size-4 shrink-0" /> },
  expiring: { className: 'border-warning bg-warning-soft text-warning', icon: <ClockIcon className="size-4 shrink-0" /> },
  expired: { className: 'border-danger bg-danger-soft text-danger', icon: <CrossCircleIcon className="size-4 shrink-0" /> },
  revoked: { className: 'border-neutral-600 bg-neutral-200 text-neutral-800', icon: <BanIcon className="size-4 shrink-0" /> },
};

/** The state in a word and an icon as well as a colour, so it reads without colour vision too. */
export function SignOffStateBadge({ state }: { state: SignOffState }) {
  const look = looks[state];
  return (
    <span className={cn('inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-sm font-bold whitespace-nowrap', look.className)}>
      {look.icon}
      {signOffStateLabels[state]}
    </span>
  );
}
