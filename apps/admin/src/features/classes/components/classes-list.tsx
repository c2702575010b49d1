import type { ClassDetail } from '@chuckkey/core';
import { EmptyState } from '../../../components/ui/empty-state';
import { TextLink } from '../../../components/ui/text-link';
import { spanLabel } from '../../../lib/shop-clock';
import { bookedLabel, upcomingOccurrences } from '../utils/class-plan';

interface ClassesListProps {
  classes: readonly ClassDetail[];
  timeZone: string;
  now: Date;
  classHref: (classId: string) => string;
}

/** The classes still to come, each with its next meeting and how many weeks it has left. */
export function ClassesList({ classes, timeZone, now, classHref }: ClassesListProps) {
  const coming = classes
    .map((cls) => ({ cls, upcoming: upcomingOccurrences(cls, now) }))
    .filter(({ cls, upcoming }) => cls.cancelledAt === null && upcoming.length > 0);
  if (coming.length === 0) {
    return <EmptyState title="No classes coming up">Hold a machine for a class with the form on this page; its meetings then appear here.</EmptyState>;
  }
  return (
    <ul aria-label="Upcoming classes" className="flex flex-col divide-y divide-neutral-200 rounded-lg border border-neutral-300 bg-white">
      {coming.map(({ cls, upcoming }) => {
        const next = upcoming[0];
        return (
          <li key={cls.id} className="flex flex-col gap-1 px-4 py-3">
            <TextLink to={classHref(cls.id)} className="text-lg">
              {cls.title}
            </TextLink>
            <span className="text-neutral-800">
              {cls.machineName}
              {cls.trainingName && ` · ${cls.trainingName}`}
            </span>
            {next && <span className="text-neutral-800">Next: {spanLabel(new Date(next.startsAt), new Date(next.endsAt), timeZone)}</span>}
            <span className="text-sm text-neutral-700">
              {upcoming.length === 1 ? '1 week left' : `${upcoming.length} weeks left`} · {bookedLabel(cls.memberCount, cls.capacity)}
            </span>
          </li>
        );
      })}
    </ul>
  );
}
