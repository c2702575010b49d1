import { incidentStatusLabels, type IncidentStatus } from '@chuckkey/core';
import { cn } from '../../../components/ui/cn';

const tones: Record<IncidentStatus, string> = {
  open: 'border-warning bg-warning-soft',
  under_review: 'border-brand bg-brand-soft',
  closed: 'border-neutral-400 bg-neutral-100',
};

/** The status in words, with a tint that only repeats what the words say. */
export function IncidentStatusBadge({ status }: { status: IncidentStatus }) {
  return <span className={cn('inline-block rounded-full border px-2.5 py-0.5 text-sm font-bold text-neutral-900', tones[status])}>{incidentStatusLabels[status]}</span>;
}
