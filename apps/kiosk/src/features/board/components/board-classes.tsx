import type { BoardClass } from '@chuckkey/core';
import { formatShopMoment } from '../utils/board-text';

interface BoardClassesProps {
  classes: readonly BoardClass[];
  now: Date;
  timeZone: string;
}

/** The footer strip: sign-off classes coming up, so members see when they can get signed off. */
export function BoardClasses({ classes, now, timeZone }: BoardClassesProps) {
  return (
    <footer className="flex min-w-0 items-center gap-[1.5vw] overflow-hidden bg-surface-raised px-[2.5vw] py-[1vh] text-board-fact whitespace-nowrap">
      <h2 className="font-bold">Sign-off classes coming up</h2>
      {classes.length > 0 ? (
        <ul className="flex min-w-0 gap-[2vw] overflow-hidden">
          {classes.map((item) => (
            <li key={item.id} className="truncate">
              <time dateTime={item.startsAt} className="font-bold tabular-nums">
                {formatShopMoment(new Date(item.startsAt), now, timeZone)}
              </time>{' '}
              {item.name}
            </li>
          ))}
        </ul>
      ) : (
        <p className="truncate text-ink-muted">None scheduled yet — ask an instructor when the next one is.</p>
      )}
    </footer>
  );
}
