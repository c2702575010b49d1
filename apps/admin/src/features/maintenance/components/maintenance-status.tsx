import type { MaintenanceStatus } from '@chuckkey/core';
import { CheckIcon, ClockIcon, WarningIcon } from '../../../components/ui/icons';
import { statusWords } from '../utils/maintenance-words';

const looks: Record<MaintenanceStatus, { className: string; Icon: typeof CheckIcon }> = {
  ok: { className: 'border-success bg-success-soft text-success', Icon: CheckIcon },
  due: { className: 'border-warning bg-warning-soft text-warning', Icon: ClockIcon },
  overdue: { className: 'border-danger bg-danger-soft text-danger', Icon: WarningIcon },
};

/** The status as a word, an icon and a colour, so no one of them has to carry it alone. */
export function MaintenanceStatusBadge({ status }: { status: MaintenanceStatus }) {
  const { className, Icon } = looks[status];
  return (
    <span className={`inline-flex items-center gap-1.5 rounded-full border px-2.5 py-0.5 text-sm font-bold whitespace-nowrap ${className}`}>
      <Icon className="size-4 shrink-0" aria-hidden="true" />
      {statusWords[status]}
    </span>
  );
}

/** Marks a task that stops machine use while it is overdue. */
export function BlockingMark({ blocking }: { blocking: boolean }) {
  return blocking ? <span className="font-bold">Stops use when overdue</span> : <span className="text-neutral-700">No</span>;
}
