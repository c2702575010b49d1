import type { ReactNode } from 'react';
import { cn } from '../../../components/ui/cn';
import { CheckIcon, ClockIcon, WarningIcon } from '../../../components/ui/icons';
import { dueOf, type DueState } from '../utils/crib-checkouts-rows';

const looks: Record<DueState, { className: string; icon: ReactNode }> = {
  overdue: { className: 'border-danger bg-danger-soft text-danger', icon: <WarningIcon className="size-4 shrink-0" /> },
  due_soon: { className: 'border-warning bg-warning-soft text-warning', icon: <ClockIcon className="size-4 shrink-0" /> },
  on_time: { className: 'border-success bg-success-soft text-success', icon: <CheckIcon className="size-4 shrink-0" /> },
  none: { className: 'border-neutral-600 bg-neutral-200 text-neutral-800', icon: null },
};

/** Overdue or not in words and an icon as well as a colour, so it reads without colour vision too. */
export function CribCheckoutsDueBadge({ dueAt, now }: { dueAt: string | null; now: Date }) {
  const due = dueOf(dueAt, now);
  const look = looks[due.state];
  return (
    <span className={cn('inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-sm font-bold whitespace-nowrap', look.className)}>
      {look.icon}
      {due.words}
    </span>
  );
}
